/** The wizard's steps, in order (a plain module: the server page reads it too). */
export const STEPS = [
  { key: "scope", label: "Scope" },
  { key: "line", label: "Near the line" },
  { key: "sequence", label: "Sequence of work" },
  { key: "loads", label: "Loads & lifts" },
  { key: "hazards", label: "Hazards & controls" },
  { key: "people", label: "People, plant & PPE" },
  { key: "ground", label: "Permits, services & digging" },
  { key: "emergency", label: "Emergency & environment" },
  { key: "review", label: "Review & submit" },
] as const;
export type StepKey = (typeof STEPS)[number]["key"];
