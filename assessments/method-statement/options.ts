/**
 * The choices an assessment offers — operations, control levels, lineside protection, permits,
 * excavation support — and their wording. No zod here: the wizard's screens import these while the
 * page loads, and the schemas that check the same choices (content.ts) load when first needed.
 */
export const OPERATIONS = ["lift", "team-lift", "carry", "push", "equipment"] as const;
export type Operation = (typeof OPERATIONS)[number];
export const OPERATION_LABELS: Record<Operation, string> = {
  lift: "Lift or lower by one person",
  "team-lift": "Team lift",
  carry: "Carry",
  push: "Push or pull on wheels",
  equipment: "Lift with equipment",
};

export const CONTROL_LEVELS = ["eliminate", "substitute", "engineering", "administrative", "ppe"] as const;
export const CONTROL_LEVEL_LABELS: Record<(typeof CONTROL_LEVELS)[number], string> = {
  eliminate: "Eliminate",
  substitute: "Substitute",
  engineering: "Engineering control",
  administrative: "Administrative control",
  ppe: "PPE",
};

export const NEAR_LINE = ["not-near", "near", "on"] as const;
export const NEAR_LINE_LABELS: Record<(typeof NEAR_LINE)[number], string> = {
  "not-near": "Not on or near the line",
  near: "Near the line (beside it, within the distance where protection is needed)",
  on: "On the line",
};
export const PROTECTION_ARRANGEMENTS = [
  "fenced",
  "distance",
  "line-blockage",
  "possession",
  "warning-system",
  "other",
] as const;
export type ProtectionArrangement = (typeof PROTECTION_ARRANGEMENTS)[number];
export const PROTECTION_LABELS: Record<ProtectionArrangement, string> = {
  fenced: "Separated from the line by a fence or barrier",
  distance: "Separated from the line by distance, to a marked limit",
  "line-blockage": "Line blockage: no trains on the line while the work is done",
  possession: "Possession: the line handed over for engineering work",
  "warning-system":
    "Warning of approaching trains (lookouts or a warning system): the gang goes to a position of safety",
  other: "Another arrangement, described below",
};
export const PERMIT_KINDS = ["dig", "hot-work", "electrical", "confined-space", "other"] as const;
export const PERMIT_LABELS: Record<(typeof PERMIT_KINDS)[number], string> = {
  dig: "Permit to dig",
  "hot-work": "Hot work permit",
  electrical: "Permit for work on or near electrical equipment",
  "confined-space": "Confined space entry permit",
  other: "Other permit",
};
export const EXCAVATION_SUPPORT = ["battered", "trench-box", "sheeting", "stepped", "shallow", "other"] as const;
export const SUPPORT_LABELS: Record<(typeof EXCAVATION_SUPPORT)[number], string> = {
  battered: "Sides battered back to a safe angle",
  "trench-box": "Trench box or drag box",
  sheeting: "Trench sheets and props",
  stepped: "Sides stepped (benched)",
  shallow: "Shallow, stable ground: no support, by the competent person's decision",
  other: "Other support, described",
};

/** Risk rating of a hazard row: likelihood × severity, 1–25. */
export const riskRating = (likelihood: number, severity: number) => likelihood * severity;
