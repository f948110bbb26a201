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

/**
 * Starting text for work beside the line. The arrangement is a typical one for the job; the person
 * responsible, references and positions of safety are the adviser's to fill from the site and the
 * infrastructure manager's planning — the review refuses submission until they are.
 */
const nearTheLine = (
  protection: NonNullable<Content["lineside"]["protection"]>,
  protectionDetail: string,
): Content["lineside"] => ({
  nearLine: "near",
  protection,
  protectionDetail,
  responsibleName: "",
  responsibleCompetence: "",
  planningRef: "",
  accessPoint: "",
  walkingRoute:
    "From the access point along the cess walkway to the site; no walking on the ballast shoulder or between the rails.",
  positionsOfSafety: "",
  limits:
    "Nothing carried or placed within 3 m of the nearest rail; long items carried parallel to the line, on the side away from it.",
});
const permitToDig = (): Content["permits"][number] => ({
  kind: "dig",
  description: "",
  reference: "",
  issuedBy: "",
  validFrom: "",
  validTo: "",
});
const buriedServicesChecks = (): Content["buriedServices"] => ({
  recordsObtained: false,
  recordsRef: "",
  scanned: false,
  scannedBy: "",
  scanDate: "",
  trialHoles: "",
  handDigWithinM: 0.5,
  rule: "Hand tools only within 0.5 m of a located service; stop and tell the supervisor on finding anything not on the records or the scan.",
});
const siteEnvironment = (): Content["environment"] => ({
  spoilAndWaste: "Spoil bagged and taken back to the van; nothing left in the cess or the drainage.",
  spillKit: "In the van at the access point; the supervisor knows how to use it.",
  backfill: "",
  noiseAndDust: "Powered tools used in short spells; water on cutting to keep dust down.",
  welfare: "Welfare van at the access point: toilet, hand washing, hot water, shelter.",
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
      scope: {
        summary: "Install a modular equipment base by hand on ground screws, ready for a lineside cabinet.",
        startDate: "",
        durationShifts: 1,
      },
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
          filter: {
            sex: "male",
            zone: "knuckle-to-elbow",
            reach: "close",
            frequency: 0.5,
            twistDeg: 0,
            teamSize: 1,
            carryDistanceM: 40,
            durationHours: 1,
          },
        },
        {
          id: id("t", 2),
          description: "Lift a ground screw from the ground into the driver",
          componentId: c("Modular equipment base: ground screw"),
          quantity: 1,
          operation: "lift",
          niosh: closeLift(10, 90, 0.2),
          filter: {
            sex: "male",
            zone: "floor-to-lower-leg",
            reach: "close",
            frequency: 0.2,
            twistDeg: 30,
            teamSize: 1,
          },
        },
        {
          id: id("t", 3),
          description: "Lift the top frame onto the legs as a pair",
          componentId: c("Modular equipment base: top frame"),
          quantity: 1,
          operation: "team-lift",
          filter: {
            sex: "male",
            zone: "knuckle-to-elbow",
            reach: "extended",
            frequency: 0.1,
            twistDeg: 0,
            teamSize: 2,
          },
        },
      ],
      hazards: standardHazards(),
      people: standardPeople(),
      lineside: nearTheLine(
        "fenced",
        "Temporary fence between the base position and the line, erected before work and kept in place throughout.",
      ),
      permits: [permitToDig()],
      buriedServices: buriedServicesChecks(),
      environment: siteEnvironment(),
    }),
  },
  {
    id: "trough-route",
    name: "Laying a cable trough route",
    description: "Concrete troughs delivered by track trolley, placed by two people, lids carried and fitted.",
    build: (c) => ({
      ...emptyContent(),
      scope: {
        summary: "Lay a concrete cable trough route in the cess, with lids, from a trolley run along the track.",
        startDate: "",
        durationShifts: 3,
      },
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
          push: {
            mass: 6 * 42 + 60,
            gradient: 0.02,
            sex: "male",
            teamSize: 2,
            distanceM: 150,
            surface: "rail",
            braked: true,
            brakeOperator: "",
          },
        },
        {
          id: id("t", 2),
          description: "Lift a trough from the trolley into the cess as a pair",
          componentId: c("Concrete cable trough, 1 m"),
          quantity: 1,
          operation: "team-lift",
          filter: {
            sex: "male",
            zone: "lower-leg-to-knuckle",
            reach: "close",
            frequency: 1,
            twistDeg: 60,
            teamSize: 2,
          },
        },
        {
          id: id("t", 3),
          description: "Carry a lid from the stack and fit it",
          componentId: c("Concrete trough lid, 1 m"),
          quantity: 1,
          operation: "carry",
          filter: {
            sex: "male",
            zone: "knuckle-to-elbow",
            reach: "close",
            frequency: 1,
            twistDeg: 0,
            teamSize: 1,
            carryDistanceM: 8,
            durationHours: 3,
          },
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
      lineside: nearTheLine(
        "line-blockage",
        "The trolley runs and the troughs are placed only within the line blockage; the gang is clear of the line before it is given back.",
      ),
      environment: siteEnvironment(),
    }),
  },
  {
    id: "cabinet-crane",
    name: "Placing a cabinet with a lorry-loader crane",
    description: "A pre-assembled location cabinet and a chamber ring set with the lorry-loader crane.",
    build: (c) => ({
      ...emptyContent(),
      scope: {
        summary:
          "Place a pre-assembled location cabinet on its base and set a precast chamber ring, both with the lorry-loader crane.",
        startDate: "",
        durationShifts: 1,
      },
      sequence: [
        {
          id: id("s", 1),
          text: "Position and set up the lorry-loader on the hardstanding; outriggers on spreader mats.",
        },
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
            groundBearingNotes:
              "Hardstanding of stiff clay under the road-stone; mats on level ground, checked for voids.",
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
              {
                item: "Master link and shackle 3.25 t at the hook",
                kind: "shackle",
                wllKg: 3250,
                carries: "whole-load",
              },
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
      lineside: nearTheLine(
        "line-blockage",
        "Lifts made only within the line blockage; the crane's slew limited away from the line throughout.",
      ),
      environment: siteEnvironment(),
    }),
  },
  {
    id: "lineside-base",
    name: "Lineside equipment base and cable chamber",
    description:
      "Parts run in on a track trolley, carried down the cess, passed into the chamber excavation; the chamber ring set with the lorry-loader.",
    build: (c) => ({
      ...emptyContent(),
      scope: {
        summary:
          "Build a modular equipment base and set a precast cable chamber beside the line: parts run in on a braked track trolley from the access point, carried down the cess, passed down into the excavation; the chamber ring lifted in with the lorry-loader crane from the access road.",
        startDate: "",
        durationShifts: 2,
      },
      sequence: [
        { id: id("s", 1), text: "Brief the gang at the access point; check the trolley's brake before loading." },
        { id: id("s", 2), text: "Run the loaded trolley to the site; the named person works the brake throughout." },
        { id: id("s", 3), text: "Carry the leg sections down the cess to the base position." },
        {
          id: id("s", 4),
          text: "Pass the trough sections down into the chamber excavation to the person standing in it.",
        },
        { id: id("s", 5), text: "Set the chamber ring with the lorry-loader crane from the access road." },
      ],
      tasks: [
        {
          id: id("t", 1),
          description: "Run the loaded track trolley from the access point to the site",
          componentId: c("Modular equipment base: leg section"),
          quantity: 8,
          operation: "push",
          push: {
            mass: 8 * 18 + 80,
            gradient: -1 / 200,
            sex: "male",
            teamSize: 2,
            distanceM: 20,
            surface: "rail",
            braked: true,
            brakeOperator: "",
          },
          conditions: ["poor-light"],
        },
        {
          id: id("t", 2),
          description: "Carry leg sections down the cess to the base position",
          componentId: c("Modular equipment base: leg section"),
          quantity: 1,
          operation: "carry",
          filter: {
            sex: "male",
            zone: "knuckle-to-elbow",
            reach: "close",
            frequency: 0.5,
            twistDeg: 0,
            teamSize: 1,
            carryDistanceM: 10,
            durationHours: 1,
          },
          conditions: ["uneven-ground", "slope-or-steps"],
        },
        {
          id: id("t", 3),
          description: "Pass trough sections down into the chamber excavation as a pair",
          componentId: c("GRP cable trough, 1 m"),
          quantity: 1,
          operation: "team-lift",
          filter: {
            sex: "male",
            zone: "below-standing-level",
            reach: "extended",
            frequency: 0.5,
            twistDeg: 0,
            teamSize: 2,
          },
        },
        {
          id: id("t", 4),
          description: "Set the chamber ring in the excavation with the lorry-loader",
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
            factors: { nearOpenLine: true },
            examinations: [],
            wind: { inServiceLimitMs: 12, forecastMs: 5 },
            people: {},
            exclusionZoneM: 6,
            groundBearingNotes: "Access road verge of firm clay: mats on level ground, checked for voids.",
            groundBearing: { outriggerForceKn: 100, matLengthM: 1.2, matWidthM: 1.2, ground: "firm-clay" },
            accessories: [
              { item: "Cast-in anchor 1.3 t, one per leg", kind: "eyebolt", wllKg: 1300, carries: "one-leg" },
            ],
          },
        },
      ],
      hazards: [
        ...standardHazards(),
        {
          id: id("h", 3),
          hazard: "Trolley running away on the down gradient",
          whoIsAtRisk: "Gang, anyone on the line ahead",
          likelihoodBefore: 2,
          severityBefore: 5,
          controls: [
            {
              text: "Braked trolley only; brake tested before loading; one named person works it throughout",
              level: "engineering",
            },
            { text: "Trolley never left unattended; scotched and braked when stopped", level: "administrative" },
          ],
          likelihoodAfter: 1,
          severityAfter: 5,
        },
        {
          id: id("h", 4),
          hazard: "Falling into the chamber excavation, or the sides collapsing",
          whoIsAtRisk: "Gang at the excavation",
          likelihoodBefore: 3,
          severityBefore: 4,
          controls: [
            { text: "Edge protection round the excavation; trench box or battered sides", level: "engineering" },
            { text: "Excavation inspected before each shift; ladder access only", level: "administrative" },
          ],
          likelihoodAfter: 1,
          severityAfter: 4,
        },
      ],
      people: {
        ...standardPeople(),
        roles: [
          ...standardPeople().roles,
          { role: "Trolley brake operator", name: "", competence: "" },
          { role: "Appointed person", name: "", competence: "" },
        ],
        plant: [
          "Braked track trolley",
          "Lorry-loader crane",
          "Three-leg chain sling",
          "Outrigger mats 1.2 m",
          "Trench box",
        ],
      },
      lineside: nearTheLine(
        "possession",
        "The trolley runs within the possession, between its limits; the base and chamber work continue behind the fence after it is given back.",
      ),
      permits: [permitToDig()],
      buriedServices: buriedServicesChecks(),
      excavation: {
        present: true,
        depthM: 1.2,
        support: "trench-box",
        supportDetail: "Trench box set as the excavation is dug; spoil kept at least 1 m back from the edge.",
        edgeProtection: "Barriers on all sides; covered with boards when left.",
        inspection: "",
        accessEgress: "Ladder inside the trench box, tied off, one metre above the edge.",
        lowering:
          "Trough sections passed down to a second person standing in the excavation; the chamber ring lowered by the lorry-loader only.",
      },
      environment: siteEnvironment(),
    }),
  },
];

export function findTemplate(templateId: string): Template | undefined {
  return TEMPLATES.find((t) => t.id === templateId);
}
