/**
 * Frequency multiplier (FM) of the Revised NIOSH Lifting Equation.
 *
 * Table 5 of the NIOSH Applications Manual (Pub. 94-110): rows up to 10 lifts/min read in the
 * publication; rows 11 to 15 are the widely reproduced values, recalled from memory
 * (see shared REFERENCES.md §1). Between rows the manual's practice is linear interpolation
 * between rows of the same duration and vertical-height column; Heftwise does the same.
 * Frequencies below 0.2 lifts/min are taken as 0.2; above 15 lifts/min FM is 0.
 */

export type DurationBand = "short" | "moderate" | "long";

/** Lifts per minute of each row. */
const ROWS = [0.2, 0.5, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15] as const;

/** Columns: [short V<75, short V≥75, moderate V<75, moderate V≥75, long V<75, long V≥75]. */
const TABLE: readonly (readonly number[])[] = [
  [1.0, 1.0, 0.95, 0.95, 0.85, 0.85],
  [0.97, 0.97, 0.92, 0.92, 0.81, 0.81],
  [0.94, 0.94, 0.88, 0.88, 0.75, 0.75],
  [0.91, 0.91, 0.84, 0.84, 0.65, 0.65],
  [0.88, 0.88, 0.79, 0.79, 0.55, 0.55],
  [0.84, 0.84, 0.72, 0.72, 0.45, 0.45],
  [0.8, 0.8, 0.6, 0.6, 0.35, 0.35],
  [0.75, 0.75, 0.5, 0.5, 0.27, 0.27],
  [0.7, 0.7, 0.42, 0.42, 0.22, 0.22],
  [0.6, 0.6, 0.35, 0.35, 0.18, 0.18],
  [0.52, 0.52, 0.3, 0.3, 0.0, 0.15],
  [0.45, 0.45, 0.26, 0.26, 0.0, 0.13],
  [0.41, 0.41, 0.0, 0.23, 0.0, 0.0],
  [0.37, 0.37, 0.0, 0.21, 0.0, 0.0],
  [0.0, 0.34, 0.0, 0.0, 0.0, 0.0],
  [0.0, 0.31, 0.0, 0.0, 0.0, 0.0],
  [0.0, 0.28, 0.0, 0.0, 0.0, 0.0],
];

export const MIN_FREQUENCY = 0.2;
export const MAX_FREQUENCY = 15;

/** Duration category of the manual: short ≤ 1 h, moderate ≤ 2 h, long ≤ 8 h (and beyond, with a warning). */
export function durationBand(hours: number): DurationBand {
  if (hours <= 1) return "short";
  if (hours <= 2) return "moderate";
  return "long";
}

function column(duration: DurationBand, highVertical: boolean): number {
  const base = duration === "short" ? 0 : duration === "moderate" ? 2 : 4;
  return base + (highVertical ? 1 : 0);
}

/**
 * FM for `liftsPerMinute` at the given duration; `highVertical` is V ≥ 75 cm (≥ 30 in).
 * Monotone: never rises with frequency or with a longer duration band.
 */
export function frequencyMultiplier(
  liftsPerMinute: number,
  duration: DurationBand,
  highVertical: boolean,
): number {
  const f = Math.max(liftsPerMinute, MIN_FREQUENCY);
  if (f > MAX_FREQUENCY) return 0;
  const col = column(duration, highVertical);
  for (let i = 1; i < ROWS.length; i++) {
    if (f <= ROWS[i]) {
      const f0 = ROWS[i - 1];
      const f1 = ROWS[i];
      const m0 = TABLE[i - 1][col];
      const m1 = TABLE[i][col];
      return m0 + ((f - f0) / (f1 - f0)) * (m1 - m0);
    }
  }
  return TABLE[0][col];
}
