import { BANDS, type Band } from "./types";

/** The worse of several bands; `clear` when there are none. */
export function worstBand(bands: readonly Band[]): Band {
  let worst = 0;
  for (const band of bands) worst = Math.max(worst, BANDS.indexOf(band));
  return BANDS[worst];
}

/** At least `floor`: used where a warning (a long carry, say) must lift the band. */
export function atLeast(band: Band, floor: Band): Band {
  return worstBand([band, floor]);
}

/**
 * Heftwise policy for an index (load ÷ limit), NIOSH's published thresholds 1 and 3 included:
 *   index ≤ 1 clear; ≤ `watchUpTo` watch; ≤ `actUpTo` act; above stop.
 * A null index (no valid limit) is `stop`.
 */
export interface IndexThresholds {
  watchUpTo: number;
  actUpTo: number;
}

/** NIOSH lifting index: 1.0 (nominal) and 3.0 (nearly all workers at risk) are published; 2.0 is ours. */
export const NIOSH_THRESHOLDS: IndexThresholds = { watchUpTo: 2, actUpTo: 3 };

/** Guideline-weight filter and guideline forces: the figures are a filter, not limits, so Heftwise
 * asks for redesign at half as much again and stops at twice the guideline. */
export const GUIDELINE_THRESHOLDS: IndexThresholds = { watchUpTo: 1.5, actUpTo: 2 };

export function bandForIndex(index: number | null, thresholds: IndexThresholds): Band {
  if (index === null || !Number.isFinite(index)) return "stop";
  if (index <= 1) return "clear";
  if (index <= thresholds.watchUpTo) return "watch";
  if (index <= thresholds.actUpTo) return "act";
  return "stop";
}
