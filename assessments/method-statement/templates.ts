/**
 * Starting points for common jobs. Components are named as in the load register; a template's
 * task whose component is not in the organisation's register starts without one.
 * The figures are typical site values to be checked and changed by the adviser, not data.
 */
import { emptyContent, type Content, type Task } from "./content";

export interface Template {
  id: string;
  name: string;
  description: string;
  build: (componentId: (name: string) => string | null) => Content;
}

const id = (prefix: string, n: number) => `${prefix}-${n}`;
const standardHazards = (): Content["hazards"] => [
  {
    id: id("h", 1),
    hazard: "Uneven ballast and cess underfoot while carrying",
    whoIsAtRisk: "Operatives carrying loads",
    likelihoodBefore: 4,
    severityBefore: 3,
    controls: [
      { text: "Walk the route first; clear or mark trip hazards", level: "administrative" },
      { text: "Use the cess walkway boards where laid", level: "engineering" },
      { text: "Safety boots with ankle support", level: "ppe" },
    ],
    likelihoodAfter: 2,
    severityAfter: 3,
  },
  {
    id: id("h", 2),
    hazard: "Trapped fingers when placing sections",
    whoIsAtRisk: "Operatives placing components",
    likelihoodBefore: 3,
    severityBefore: 3,
    controls: [
      { text: "Place on timber bearers, then remove the bearers with a bar", level: "engineering" },
      { text: "Cut-resistant gloves", level: "ppe" },
    ],
    likelihoodAfter: 2,
    severityAfter: 2,
  },
];
const standardPeople = (): Content["people"] => ({
  roles: [
    { role: "Person in charge", name: "", competence: "" },
    { role: "Operative", name: "", competence: "" },
  ],
  plant: [],
  ppe: ["Hi-vis clothing", "Safety helmet", "Safety boots", "Gloves", "Eye protection"],
});

const closeLift = (v1: number, v2: number, frequency: number): NonNullable<Task["niosh"]> => ({
  origin: { h: 30, v: v1, a: 0 },
  destination: { h: 35, v: v2, a: 30 },
  frequency,
  durationHours: 1,
  // Lifts between spells of screw-driving and fitting: the lifting equation's short category.
  recoveryHours: 2,
  coupling: "fair",
  controlAtDestination: true,
});

export const TEMPLATES: Template[] = [
  {
    id: "equipment-base",
    name: "Modular equipment base installed by hand",
    description: "Ground screws, leg sections and a top frame carried from the van and assembled by hand.",
    build: (c) => ({
      ...emptyContent(),
      scope: { summary: "Install a modular equipment base by hand on ground screws, ready for a lineside cabinet.", startDate: "", durationShifts: 1 },
      sequence: [
        { id: id("s", 1), text: "Brief the gang at the access point; walk the route to the site." },
        { id: id("s", 2), text: "Carry the ground screws and leg sections from the van to the site." },
        { id: id("s", 3), text: "Install the ground screws with the powered driver." },
        { id: id("s", 4), text: "Fit the leg sections, then lift the top frame on as a pair." },
      ],
      tasks: [
        {
          id: id("t", 1),
          description: "Carry leg sections from the van to the base position",
          componentId: c("Modular equipment base: leg section"),
          quantity: 1,
          operation: "carry",
          filter: { sex: "male", zone: "knuckle-to-elbow", reach: "close", frequency: 0.5, twistDeg: 0, teamSize: 1, carryDistanceM: 40, durationHours: 1 },
        },
        {
          id: id("t", 2),
          description: "Lift a ground screw from the ground into the driver",
          componentId: c("Modular equipment base: ground screw"),
          quantity: 1,
          operation: "lift",
          niosh: closeLift(10, 90, 0.2),
          filter: { sex: "male", zone: "floor-to-lower-leg", reach: "close", frequency: 0.2, twistDeg: 30, teamSize: 1 },
        },
        {
          id: id("t", 3),
          description: "Lift the top frame onto the legs as a pair",
          componentId: c("Modular equipment base: top frame"),
          quantity: 1,
          operation: "team-lift",
          filter: { sex: "male", zone: "knuckle-to-elbow", reach: "extended", frequency: 0.1, twistDeg: 0, teamSize: 2 },
        },
      ],
      hazards: standardHazards(),
      people: standardPeople(),
    }),
  },
  {
    id: "trough-route",
    name: "Laying a cable trough route",
    description: "Concrete troughs delivered by track trolley, placed by two people, lids carried and fitted.",
    build: (c) => ({
      ...emptyContent(),
      scope: { summary: "Lay a concrete cable trough route in the cess, with lids, from a trolley run along the track.", startDate: "", durationShifts: 3 },
      sequence: [
        { id: id("s", 1), text: "Set up the trolley at the access point under the line blockage." },
        { id: id("s", 2), text: "Push the loaded trolley to the work area." },
        { id: id("s", 3), text: "Lift troughs from the trolley into position in pairs." },
        { id: id("s", 4), text: "Carry and fit the lids." },
      ],
      tasks: [
        {
          id: id("t", 1),
          description: "Push the trolley loaded with six troughs",
          componentId: c("Concrete cable trough, 1 m"),
          quantity: 6,
          operation: "push",
          push: { mass: 6 * 42 + 60, gradient: 0.02, sex: "male", teamSize: 2, distanceM: 150, surface: "rail", braked: true, brakeOperator: "" },
        },
        {
          id: id("t", 2),
          description: "Lift a trough from the trolley into the cess as a pair",
          componentId: c("Concrete cable trough, 1 m"),
          quantity: 1,
          operation: "team-lift",
          filter: { sex: "male", zone: "lower-leg-to-knuckle", reach: "close", frequency: 1, twistDeg: 60, teamSize: 2 },
        },
        {
          id: id("t", 3),
          description: "Carry a lid from the stack and fit it",
          componentId: c("Concrete trough lid, 1 m"),
          quantity: 1,
          operation: "carry",
          filter: { sex: "male", zone: "knuckle-to-elbow", reach: "close", frequency: 1, twistDeg: 0, teamSize: 1, carryDistanceM: 8, durationHours: 3 },
        },
      ],
      hazards: [
        ...standardHazards(),
        {
          id: id("h", 3),
          hazard: "Trolley runaway on the gradient",
          whoIsAtRisk: "Gang and anyone on the line",
          likelihoodBefore: 2,
          severityBefore: 5,
          controls: [
            { text: "Trolley with a working brake; brake tested before use", level: "engineering" },
            { text: "Scotch the wheels whenever the trolley is left", level: "administrative" },
          ],
          likelihoodAfter: 1,
          severityAfter: 5,
        },
      ],
      people: standardPeople(),
    }),
  },
  {
    id: "cabinet-crane",
    name: "Placing a cabinet with a lorry-loader crane",
    description: "A pre-assembled location cabinet and a chamber ring set with the lorry-loader crane.",
    build: (c) => ({
      ...emptyContent(),
      scope: { summary: "Place a pre-assembled location cabinet on its base and set a precast chamber ring, both with the lorry-loader crane.", startDate: "", durationShifts: 1 },
      sequence: [
        { id: id("s", 1), text: "Position and set up the lorry-loader on the hardstanding; outriggers on spreader mats." },
        { id: id("s", 2), text: "Set out the exclusion zone; brief the lift team." },
        { id: id("s", 3), text: "Lift the chamber ring into the excavation." },
        { id: id("s", 4), text: "Lift the cabinet onto its base; bolt down before releasing the slings." },
      ],
      tasks: [
        {
          id: id("t", 1),
          description: "Lift the location cabinet onto its base",
          componentId: c("Location cabinet, two-door, pre-assembled"),
          quantity: 1,
          operation: "equipment",
          lift: {
            riggingMass: 25,
            hookBlockMass: 15,
            ratedCapacity: 1200,
            radiusM: 6,
            maxRadiusM: 9,
            sling: { legs: 4, angleFromVerticalDeg: 30, legWll: 1000, hitch: "straight", markedWll: 2100 },
            factors: { nearOpenLine: true },
            examinations: [],
            wind: { inServiceLimitMs: 12, forecastMs: 5, largeSailArea: true },
            people: {},
            exclusionZoneM: 8,
            groundBearingNotes: "Hardstanding of stiff clay under the road-stone; mats on level ground, checked for voids.",
            groundBearing: { outriggerForceKn: 110, matLengthM: 1.2, matWidthM: 1.2, ground: "stiff-clay" },
            accessories: [{ item: "Bow shackle 2 t in each leg", kind: "shackle", wllKg: 2000, carries: "one-leg" }],
          },
        },
        {
          id: id("t", 2),
          description: "Set the chamber ring in the excavation",
          componentId: c("Precast chamber ring, 900 mm"),
          quantity: 1,
          operation: "equipment",
          lift: {
            riggingMass: 30,
            hookBlockMass: 15,
            ratedCapacity: 1000,
            radiusM: 5,
            maxRadiusM: 9,
            sling: { legs: 3, angleFromVerticalDeg: 35, legWll: 1120, hitch: "straight", markedWll: 2350 },
            factors: {},
            examinations: [],
            wind: { inServiceLimitMs: 12, forecastMs: 5 },
            people: {},
            exclusionZoneM: 6,
            groundBearingNotes: "Outrigger on the cess side stands on the compacted access track.",
            groundBearing: { outriggerForceKn: 140, matLengthM: 1.2, matWidthM: 1.2, ground: "stiff-clay" },
            accessories: [
              { item: "Master link and shackle 3.25 t at the hook", kind: "shackle", wllKg: 3250, carries: "whole-load" },
              { item: "Cast-in anchor 1.3 t, one per leg", kind: "eyebolt", wllKg: 1300, carries: "one-leg" },
            ],
          },
        },
      ],
      hazards: [
        {
          id: id("h", 1),
          hazard: "Load swinging into the open line",
          whoIsAtRisk: "Lift team, trains",
          likelihoodBefore: 2,
          severityBefore: 5,
          controls: [
            { text: "Slew away from the line; rated capacity limiter set with slew restriction", level: "engineering" },
            { text: "Tag lines on the load; lift only with the line blocked or protected", level: "administrative" },
          ],
          likelihoodAfter: 1,
          severityAfter: 5,
        },
      ],
      people: {
        roles: [
          { role: "Appointed person", name: "", competence: "" },
          { role: "Lift supervisor", name: "", competence: "" },
          { role: "Crane operator", name: "", competence: "" },
          { role: "Slinger/signaller", name: "", competence: "" },
        ],
        plant: ["Lorry-loader crane", "Four-leg chain sling", "Three-leg chain sling", "Spreader mats"],
        ppe: ["Hi-vis clothing", "Safety helmet with chin strap", "Safety boots", "Rigger gloves"],
      },
    }),
  },
];

export function findTemplate(templateId: string): Template | undefined {
  return TEMPLATES.find((t) => t.id === templateId);
}
