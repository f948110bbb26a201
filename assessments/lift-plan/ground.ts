/**
 * Ground bearing under an outrigger mat: pressure = outrigger force ÷ mat area (1 kN/m² = 1 kPa)
 * [pub, mechanics; REFERENCES.md §7], against an allowable bearing pressure the planner enters
 * (from a ground investigation or the site's records) or a presumed value for the ground type.
 *
 * Presumed allowable bearing values, BS 8004:1986 Table 1 (withdrawn; widely reproduced), recalled
 * from memory. Heftwise takes the lower end of each range (conservative); a type with only an upper
 * bound ("loose", "soft") or none has no presumed value, and the planner must enter one.
 * Heftwise policy for the band: up to 80 % of the allowable clear, up to 100 % watch (little margin:
 * level firm mats, no voids), above it stop; no allowable value at all: stop (cannot judge).
 */
export const GROUND_TYPES = {
  "dense-gravel": { label: "dense gravel, or dense sand and gravel", presumedKpa: 600, range: "> 600 kPa" },
  "medium-dense-gravel": {
    label: "medium dense gravel, or medium dense sand and gravel",
    presumedKpa: 200,
    range: "200–600 kPa",
  },
  "loose-gravel": { label: "loose gravel, or loose sand and gravel", presumedKpa: null, range: "< 200 kPa" },
  "compact-sand": { label: "compact sand", presumedKpa: 300, range: "> 300 kPa" },
  "medium-dense-sand": { label: "medium dense sand", presumedKpa: 100, range: "100–300 kPa" },
  "loose-sand": { label: "loose sand", presumedKpa: null, range: "< 100 kPa" },
  "very-stiff-clay": { label: "very stiff boulder clays and hard clays", presumedKpa: 300, range: "300–600 kPa" },
  "stiff-clay": { label: "stiff clays", presumedKpa: 150, range: "150–300 kPa" },
  "firm-clay": { label: "firm clays", presumedKpa: 75, range: "75–150 kPa" },
  "soft-clay": { label: "soft clays and silts", presumedKpa: null, range: "< 75 kPa" },
  "very-soft-clay": { label: "very soft clays and silts", presumedKpa: null, range: "not applicable" },
} as const satisfies Record<string, { label: string; presumedKpa: number | null; range: string }>;
export type GroundType = keyof typeof GROUND_TYPES;
export const GROUND_TYPE_KEYS = Object.keys(GROUND_TYPES) as [GroundType, ...GroundType[]];

export const GROUND_SOURCE =
  "BS 8004:1986 Table 1, presumed allowable bearing values (withdrawn; from memory), lower end of each range";
export const BEARING_MARGIN = 0.8;

export interface GroundBearing {
  /** The machine maker's maximum outrigger force for the lift (kN). */
  outriggerForceKn: number;
  matLengthM: number;
  matWidthM: number;
  /** Allowable bearing pressure entered by the planner (kPa); governs when given. */
  allowableKpa?: number;
  ground?: GroundType;
}

export interface GroundBearingResult {
  pressureKpa: number;
  allowableKpa: number | null;
  allowableFrom: "entered" | "presumed" | null;
  /** Side of the smallest square mat that keeps the pressure within the allowable (m, up to 0.05 m). */
  smallestSquareMatM: number | null;
  ratio: number | null;
}

export function checkGroundBearing(g: GroundBearing): GroundBearingResult {
  const pressureKpa = g.outriggerForceKn / (g.matLengthM * g.matWidthM);
  const presumed = g.ground ? GROUND_TYPES[g.ground].presumedKpa : null;
  const allowableKpa = g.allowableKpa ?? presumed;
  const allowableFrom = g.allowableKpa !== undefined ? "entered" : presumed !== null ? "presumed" : null;
  const smallest = allowableKpa ? Math.ceil(Math.sqrt(g.outriggerForceKn / allowableKpa) * 20) / 20 : null;
  return {
    pressureKpa,
    allowableKpa,
    allowableFrom,
    smallestSquareMatM: smallest,
    ratio: allowableKpa ? pressureKpa / allowableKpa : null,
  };
}
