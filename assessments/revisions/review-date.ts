/**
 * Which review dates a revision accepts. No zod here: the wizard's submit step shows the range while
 * the page loads; the schema that applies the same rule (schemas.ts) loads when first needed.
 */

/** Latest review date accepted, in years from today: Heftwise policy (DEVELOPERS.md, "Review dates"). */
export const REVIEW_WITHIN_YEARS = 3;

/** The range of review dates accepted on a given day (UTC), as YYYY-MM-DD: after today, up to the policy's limit. */
export function reviewDateRange(now = new Date()) {
  const today = now.toISOString().slice(0, 10);
  const latest = new Date(`${today}T00:00:00Z`);
  latest.setUTCFullYear(latest.getUTCFullYear() + REVIEW_WITHIN_YEARS);
  const earliest = new Date(`${today}T00:00:00Z`);
  earliest.setUTCDate(earliest.getUTCDate() + 1);
  return { earliest: earliest.toISOString().slice(0, 10), latest: latest.toISOString().slice(0, 10) };
}

/** What is wrong with a review date (YYYY-MM-DD), or null: a real calendar date, after today, not too far off. */
export function reviewDateProblem(value: string, now = new Date()): string | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(value)) return "Choose a review date";
  const date = new Date(`${value}T00:00:00Z`);
  if (Number.isNaN(date.getTime()) || date.toISOString().slice(0, 10) !== value) return "Choose a date that exists";
  const { earliest, latest } = reviewDateRange(now);
  if (value < earliest) return "The review date must be after today";
  if (value > latest) return `Choose a review date within ${REVIEW_WITHIN_YEARS} years`;
  return null;
}
