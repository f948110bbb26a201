/**
 * Frequency multiplier (FM) of the Revised NIOSH Lifting Equation, and the duration category it is
 * read at.
 *
 * Table 5 of the NIOSH Applications Manual (Pub. 94-110): rows up to 10 lifts/min read in the
 * publication; rows 11 to 15 are the widely reproduced values, recalled from memory
 * (see shared REFERENCES.md §1). Between rows the manual's practice is linear interpolation
 * between rows of the same duration and vertical-height column; Heftwise does the same, except
 * towards a zero cell: above a column's last non-zero row the table gives no basis, so FM is 0
 * there (Heftwise policy, conservative). Frequencies below 0.2 lifts/min are taken as 0.2.
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

/** Index of each column's last row with a non-zero multiplier. */
const LAST_NON_ZERO_ROW: readonly number[] = [0, 1, 2, 3, 4, 5].map((col) => {
  let last = 0;
  for (let i = 0; i < ROWS.length; i++) if (TABLE[i][col] > 0) last = i;
  return last;
});

/**
 * Recovery time the duration categories require after the work period, as a multiple of the work
 * time: short (≤ 1 h) at least 1.2 ×, moderate (1–2 h) at least 0.3 ×. Categories [pub, Pub. 94-110];
 * ratios recalled from memory (REFERENCES.md §1).
 */
export const RECOVERY_RATIO = { short: 1.2, moderate: 0.3 } as const;

/**
 * Duration category of the manual: short ≤ 1 h, moderate ≤ 2 h, long ≤ 8 h (and beyond, with a
 * warning) — each only when the recovery that must follow it does. Where it does not, or where the
 * recovery is not stated, the next longer category applies (Heftwise policy: nothing is assumed).
 */
export function durationBand(hours: number, recoveryHours?: number): DurationBand {
  const recovery = recoveryHours ?? 0;
  if (hours <= 1 && recovery >= RECOVERY_RATIO.short * hours) return "short";
  if (hours <= 2 && recovery >= RECOVERY_RATIO.moderate * hours) return "moderate";
  return "long";
}

/** The category the duration alone would give, before the recovery is checked. */
export function nominalDurationBand(hours: number): DurationBand {
  return hours <= 1 ? "short" : hours <= 2 ? "moderate" : "long";
}

export const DURATION_LABELS: Record<DurationBand, string> = { short: "≤ 1 h", moderate: "1–2 h", long: "2–8 h" };

function column(duration: DurationBand, highVertical: boolean): number {
  const base = duration === "short" ? 0 : duration === "moderate" ? 2 : 4;
  return base + (highVertical ? 1 : 0);
}

/**
 * FM for `liftsPerMinute` at the given duration; `highVertical` is V ≥ 75 cm (≥ 30 in).
 * Monotone: never rises with frequency or with a longer duration band.
 */
export function frequencyMultiplier(liftsPerMinute: number, duration: DurationBand, highVertical: boolean): number {
  const f = Math.max(liftsPerMinute, MIN_FREQUENCY);
  if (f > MAX_FREQUENCY) return 0;
  const col = column(duration, highVertical);
  if (f > ROWS[LAST_NON_ZERO_ROW[col]]) return 0;
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

/**
 * Why FM is 0 for this frequency, naming the Table 5 cell; called only when it is.
 * `vLabel` names the V column in the request's units ("V < 75 cm").
 */
export function zeroFrequencyExplanation(
  liftsPerMinute: number,
  duration: DurationBand,
  highVertical: boolean,
  vLabel: string,
): string {
  const f = Math.max(liftsPerMinute, MIN_FREQUENCY);
  const cell = `${DURATION_LABELS[duration]}, ${vLabel}`;
  if (f > MAX_FREQUENCY)
    return `${trim(f)}/min is beyond the last row of Table 5 (15/min): FM is 0 for every duration.`;
  const col = column(duration, highVertical);
  const last = ROWS[LAST_NON_ZERO_ROW[col]];
  const zeroRow = ROWS[LAST_NON_ZERO_ROW[col] + 1];
  if (ROWS.includes(f as (typeof ROWS)[number]))
    return `Table 5 gives FM 0 at ${trim(f)}/min for ${cell}: the equation does not accept lifting this often for this long.`;
  return `${trim(f)}/min lies between ${trim(last)}/min, the last row of Table 5 with a multiplier for ${cell}, and ${trim(zeroRow)}/min, where it is 0: the table ends there, so FM is taken as 0 (Heftwise policy) rather than interpolated.`;
}

const trim = (x: number) => String(Math.round(x * 100) / 100);
