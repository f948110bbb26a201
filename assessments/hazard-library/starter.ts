/**
 * The starter library: the common hazards of lineside installation work, with controls by the
 * hierarchy of control, in Heftwise's own words. A starting point for an organisation's own library,
 * to be checked against its procedures and the infrastructure manager's rules; ratings are typical
 * values for the adviser to change, not data.
 */
import type { LibraryEntryInput } from "./schemas";

export const STARTER_HAZARDS: LibraryEntryInput[] = [
  {
    hazard: "Striking a buried cable or pipe while digging",
    whoIsAtRisk: "Anyone digging or near the excavation",
    likelihoodBefore: 3,
    severityBefore: 5,
    controls: [
      { text: "Route the excavation clear of services shown on the records", level: "eliminate" },
      {
        text: "Scan with a cable locating tool before and during digging; trial holes by hand beside each located service",
        level: "engineering",
      },
      {
        text: "Service records obtained and a permit to dig issued before breaking ground; hand-dig within the set distance of a located service",
        level: "administrative",
      },
      { text: "Insulated hand tools for digging near a located cable", level: "ppe" },
    ],
    likelihoodAfter: 1,
    severityAfter: 5,
  },
  {
    hazard: "Excavation sides collapsing, or a person falling into the excavation",
    whoIsAtRisk: "Gang at the excavation, passers-by",
    likelihoodBefore: 3,
    severityBefore: 4,
    controls: [
      {
        text: "Trench box or sides battered back to a safe angle; spoil kept back from the edge",
        level: "engineering",
      },
      { text: "Edge protection and barriers round the excavation; covered when left", level: "engineering" },
      {
        text: "Inspected before each shift and after rain or anything that could weaken it; ladder access only",
        level: "administrative",
      },
    ],
    likelihoodAfter: 1,
    severityAfter: 4,
  },
  {
    hazard: "Being struck by a train while working near an open line",
    whoIsAtRisk: "Everyone on site",
    likelihoodBefore: 2,
    severityBefore: 5,
    controls: [
      { text: "Do the work with the line closed to traffic where the work allows", level: "eliminate" },
      { text: "A fence or barrier between the work and the line", level: "engineering" },
      {
        text: "Safe system of work planned by the responsible person and briefed; positions of safety known; nothing carried beyond the marked limit",
        level: "administrative",
      },
      { text: "High-visibility clothing to the infrastructure manager's standard", level: "ppe" },
    ],
    likelihoodAfter: 1,
    severityAfter: 5,
  },
  {
    hazard: "A track trolley running away, or trapping hands and feet",
    whoIsAtRisk: "Gang, anyone on the line ahead",
    likelihoodBefore: 2,
    severityBefore: 5,
    controls: [
      { text: "Braked trolleys only; brake tested before loading", level: "engineering" },
      {
        text: "One named person works the brake; the trolley is never left unattended and is scotched when stopped",
        level: "administrative",
      },
      { text: "Safety boots with toe protection; gloves", level: "ppe" },
    ],
    likelihoodAfter: 1,
    severityAfter: 4,
  },
  {
    hazard: "Handling heavy or awkward items: troughs, lids, base sections",
    whoIsAtRisk: "Operatives handling the loads",
    likelihoodBefore: 4,
    severityBefore: 3,
    controls: [
      { text: "Lighter or sectional parts where they exist (plastic troughs, split lids)", level: "substitute" },
      { text: "Lifting aids: trough and lid lifters, sack trucks, the crane for anything heavy", level: "engineering" },
      {
        text: "Team lifts planned and called by one person; loads scored in this assessment and briefed",
        level: "administrative",
      },
      { text: "Gloves with grip; safety boots", level: "ppe" },
    ],
    likelihoodAfter: 2,
    severityAfter: 3,
  },
  {
    hazard: "Weather: heat, cold, rain, high wind or lightning",
    whoIsAtRisk: "Everyone on site",
    likelihoodBefore: 3,
    severityBefore: 3,
    controls: [
      { text: "Stop-work limits set for wind (panels and lifts) and for lightning", level: "administrative" },
      {
        text: "Breaks, drinks and warm clothing planned for the forecast; shelter in the welfare van",
        level: "administrative",
      },
      { text: "Waterproofs, thermal layers and gloves with grip", level: "ppe" },
    ],
    likelihoodAfter: 2,
    severityAfter: 2,
  },
  {
    hazard: "Vermin, needles and sharp debris in old troughs and chambers",
    whoIsAtRisk: "Operatives opening troughs and chambers",
    likelihoodBefore: 3,
    severityBefore: 3,
    controls: [
      {
        text: "Lift lids with a lid lifter; look before reaching in; clear debris with a tool, not by hand",
        level: "engineering",
      },
      {
        text: "Wash hands before eating; cover cuts; know the signs of infection carried by rats",
        level: "administrative",
      },
      { text: "Cut-resistant gloves; eye protection", level: "ppe" },
    ],
    likelihoodAfter: 1,
    severityAfter: 3,
  },
  {
    hazard: "Slips and trips on ballast and in the cess while carrying",
    whoIsAtRisk: "Operatives carrying loads",
    likelihoodBefore: 4,
    severityBefore: 3,
    controls: [
      { text: "Walkway boards where the cess is soft or broken", level: "engineering" },
      { text: "Walk the route first; clear or mark trip hazards; light it after dark", level: "administrative" },
      { text: "Safety boots with ankle support", level: "ppe" },
    ],
    likelihoodAfter: 2,
    severityAfter: 3,
  },
];
