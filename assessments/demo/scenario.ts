/**
 * The invented demo scenario: Brackenfold Lineside Ltd, a contractor working for the (invented)
 * Wendmoor Railway on its Hollin Vale branch. Every company, person and place here is made up.
 */
import type { Role } from "@/db/schema";

export const DEMO_ORGANISATION = "Brackenfold Lineside Ltd";
export const DEMO_PASSWORD = "hollin-vale-demo";

export const DEMO_USERS: { name: string; email: string; role: Role }[] = [
  { name: "Morwenna Achterberg", email: "admin@brackenfold.example", role: "admin" },
  { name: "Idris Pennock", email: "adviser@brackenfold.example", role: "adviser" },
  { name: "Ruth Okonjo-Vale", email: "approver@brackenfold.example", role: "approver" },
  { name: "Dafydd Strand", email: "foreman@brackenfold.example", role: "foreman" },
];

export const DEMO_JOBS = [
  {
    name: "Hollin Vale loop: new location cabinet and equipment base",
    client: "Wendmoor Railway Infrastructure",
    location: "Hollin Vale, up side of the branch, beside the loop points",
    lineReference: "WHV (Wendmoor – Hollin Vale branch)",
    mileage: "14m 22ch",
    accessPoint: "Gorsey Lane access gate, 14m 30ch, up side; van parking on the hardstanding",
    nearestHospital: "Hollin Vale General Hospital, emergency department, Marsh Road (8 km)",
    emergencyArrangements:
      "Person in charge calls 999 and the signaller; first-aider and kit in the welfare van at the access gate.",
    siteContactName: "Tamsin Greyholt",
    siteContactPhone: "07700 900418",
  },
  {
    name: "Carrowby cutting: troughing route renewal",
    client: "Wendmoor Railway Infrastructure",
    location: "Carrowby cutting, down cess, 200 m route from the footbridge",
    lineReference: "WHV (Wendmoor – Hollin Vale branch)",
    mileage: "17m 05ch – 17m 15ch",
    accessPoint: "Carrowby footbridge steps, 17m 04ch, down side",
    nearestHospital: "St Aldwyn's Hospital, emergency department, Carrowby Road (11 km)",
    emergencyArrangements: "Nearest road access at the footbridge; meet the ambulance at Carrowby Road lay-by.",
    siteContactName: "Owain Ferriday",
    siteContactPhone: "07700 900733",
  },
];

type Grip = "good" | "fair" | "poor";
type Source = "weighed" | "datasheet" | "estimated";

export const DEMO_COMPONENTS: {
  name: string;
  massKg: number;
  lengthMm: number;
  widthMm: number;
  heightMm: number;
  grip: Grip;
  massSource: Source;
  notes?: string;
}[] = [
  {
    name: "Modular equipment base: leg section",
    massKg: 18,
    lengthMm: 600,
    widthMm: 150,
    heightMm: 150,
    grip: "fair",
    massSource: "datasheet",
  },
  {
    name: "Modular equipment base: top frame",
    massKg: 24,
    lengthMm: 900,
    widthMm: 600,
    heightMm: 80,
    grip: "poor",
    massSource: "datasheet",
    notes: "Sharp edges at the cleats: gloves",
  },
  {
    name: "Modular equipment base: ground screw",
    massKg: 22,
    lengthMm: 1500,
    widthMm: 110,
    heightMm: 110,
    grip: "fair",
    massSource: "datasheet",
  },
  {
    name: "Concrete cable trough, 1 m",
    massKg: 42,
    lengthMm: 1000,
    widthMm: 250,
    heightMm: 200,
    grip: "poor",
    massSource: "datasheet",
    notes: "Two-person lift or lifting tongs",
  },
  {
    name: "Concrete trough lid, 1 m",
    massKg: 14,
    lengthMm: 1000,
    widthMm: 250,
    heightMm: 50,
    grip: "poor",
    massSource: "weighed",
  },
  {
    name: "GRP cable trough, 1 m",
    massKg: 9,
    lengthMm: 1000,
    widthMm: 250,
    heightMm: 200,
    grip: "fair",
    massSource: "datasheet",
  },
  {
    name: "Location cabinet, two-door, pre-assembled",
    massKg: 380,
    lengthMm: 1200,
    widthMm: 650,
    heightMm: 1600,
    grip: "poor",
    massSource: "datasheet",
    notes: "Lift with equipment only; four lifting eyes on the roof",
  },
  {
    name: "Precast chamber ring, 900 mm",
    massKg: 640,
    lengthMm: 1100,
    widthMm: 1100,
    heightMm: 500,
    grip: "poor",
    massSource: "datasheet",
    notes: "Three-leg chain sling on cast-in anchors",
  },
  {
    name: "Armoured cable drum, 100 m",
    massKg: 160,
    lengthMm: 800,
    widthMm: 500,
    heightMm: 800,
    grip: "poor",
    massSource: "estimated",
    notes: "Roll on a drum trailer; do not carry",
  },
  {
    name: "Signal post base plate",
    massKg: 28,
    lengthMm: 500,
    widthMm: 500,
    heightMm: 25,
    grip: "poor",
    massSource: "weighed",
  },
  {
    name: "Galvanised walkway panel",
    massKg: 19,
    lengthMm: 1200,
    widthMm: 600,
    heightMm: 40,
    grip: "fair",
    massSource: "datasheet",
  },
  {
    name: "Sealed battery set with carry handles",
    massKg: 31,
    lengthMm: 520,
    widthMm: 240,
    heightMm: 220,
    grip: "good",
    massSource: "datasheet",
  },
  {
    name: "Axle counter head kit",
    massKg: 6,
    lengthMm: 400,
    widthMm: 300,
    heightMm: 200,
    grip: "good",
    massSource: "datasheet",
  },
  {
    name: "Route marker post",
    massKg: 12,
    lengthMm: 1200,
    widthMm: 100,
    heightMm: 100,
    grip: "fair",
    massSource: "estimated",
  },
];

/** The demo lift team (invented people; competence references in an invented scheme). */
export const DEMO_LIFT_TEAM = {
  appointedPerson: { name: "Gwenllian Marsh", competenceRef: "LFT-AP-2291" },
  liftSupervisor: { name: "Tobias Renwick", competenceRef: "LFT-SV-4410" },
  operator: { name: "Kit Abernethy", competenceRef: "LFT-OP-7783" },
  slingerSignaller: { name: "Priya Holloway", competenceRef: "LFT-SS-1207" },
};
/**
 * The demo lift's date and the thorough examinations of its equipment, counted from the day the demo
 * is seeded so that they stay plausible whenever it runs: the lift seven weeks ahead, the crane
 * examined 170 days ago (12-monthly) and the slings 60 days ago (6-monthly), both in date for it.
 */
export function demoLiftSchedule(seededOn = new Date()) {
  const day = (offset: number) => new Date(seededOn.getTime() + offset * 86_400_000).toISOString().slice(0, 10);
  return {
    liftDate: day(49),
    examinations: [
      { item: "Lorry-loader crane HV-LL2", kind: "equipment" as const, lastExamined: day(-170) },
      { item: "Chain slings, set 14", kind: "accessory" as const, lastExamined: day(-60) },
    ],
  };
}

/** The demo's arrangement for working beside the line at Hollin Vale (invented people and references). */
export const DEMO_LINESIDE = {
  responsibleName: "Nerys Caldwell",
  responsibleCompetence: "SSOW-PL 3318",
  planningRef: "WHV-SSOW-2026-0417",
  accessPoint: "Gorsey Lane access gate, 14m 30ch, up side",
  positionsOfSafety:
    "Behind the temporary fence at any point along the base position; the cess walkway beyond the fence line is the position of safety on the walk in.",
};
