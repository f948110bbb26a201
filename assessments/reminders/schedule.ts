/**
 * When a revision's reminder is due (pure). Review reminders go before the review date at each of
 * the organisation's lead times (the nearest lead time already reached is the one due, so a job that
 * did not run for a while sends one reminder, not a burst), and once the date has passed. Dates are
 * calendar days in the UK (Europe/London), where the work is.
 */
import { ukDate, ukToday } from "@/lib/dates";

export { ukDate, ukToday };

/** Whole days from `from` to `to`, both YYYY-MM-DD. */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

/** The review reminder due today for a review date, or null. */
export function reviewReminderKind(reviewDate: string, today: string, leadDays: readonly number[]): string | null {
  const days = daysBetween(today, reviewDate);
  if (days < 0) return "review-overdue";
  const lead = [...leadDays].sort((a, b) => a - b).find((d) => days <= d);
  return lead === undefined ? null : `review-due-${lead}`;
}

/** Whether a review request submitted at `submittedAt` has waited long enough to remind its approver. */
export const approvalIsWaiting = (submittedAt: Date, now: Date, waitDays: number) =>
  now.getTime() - submittedAt.getTime() >= waitDays * 86_400_000;
