/**
 * Thorough examination under LOLER 1998 reg. 9 (intervals from memory, REFERENCES.md §4): at least
 * every 6 months for accessories and for equipment that lifts people, every 12 months for other
 * lifting equipment — unless an examination scheme says otherwise, in which case the planner enters
 * the scheme's due date.
 */
export type ExaminedKind = "equipment" | "accessory" | "lifts-people";

export interface Examination {
  item: string;
  kind: ExaminedKind;
  /** ISO date of the last thorough examination. */
  lastExamined: string;
  /** ISO date from an examination scheme; overrides the statutory interval. */
  schemeDueDate?: string;
}

export interface ExaminationResult extends Examination {
  dueDate: string;
  /** "after-lift": examined after the planned lift, so it cannot cover it. */
  status: "in-date" | "due-soon" | "expired" | "after-lift";
}

export const INTERVAL_MONTHS: Record<ExaminedKind, number> = { equipment: 12, accessory: 6, "lifts-people": 6 };
/** Heftwise policy: an examination falling due within 30 days of the lift is flagged. */
export const DUE_SOON_DAYS = 30;

const DAY_MS = 86_400_000;
const parse = (iso: string) => Date.parse(`${iso}T00:00:00Z`);

export function addMonths(iso: string, months: number): string {
  const [y, m, d] = iso.split("-").map(Number);
  const target = new Date(Date.UTC(y, m - 1 + months, 1));
  const lastDay = new Date(Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0)).getUTCDate();
  target.setUTCDate(Math.min(d, lastDay));
  return target.toISOString().slice(0, 10);
}

export function checkExamination(exam: Examination, liftDate: string): ExaminationResult {
  const dueDate = exam.schemeDueDate ?? addMonths(exam.lastExamined, INTERVAL_MONTHS[exam.kind]);
  const daysLeft = (parse(dueDate) - parse(liftDate)) / DAY_MS;
  // An examination after the lift says nothing of the equipment on the day; the one before it is
  // what covers the lift. Due on the lift date itself is still in date that day; any later is expired.
  const status =
    parse(exam.lastExamined) > parse(liftDate)
      ? "after-lift"
      : daysLeft < 0
        ? "expired"
        : daysLeft <= DUE_SOON_DAYS
          ? "due-soon"
          : "in-date";
  return { ...exam, dueDate, status };
}
