/**
 * Dates as a UK site reads them: day-month-year, times on the 24-hour clock, in UK time
 * (Europe/London, summer time included). Pure; used on the server, in the browser, in e-mails and
 * in the pack. Stored values stay ISO (YYYY-MM-DD, UTC instants): only what is shown changes.
 */
export const UK_ZONE = "Europe/London";

const dateParts = new Intl.DateTimeFormat("en-GB", {
  timeZone: UK_ZONE,
  day: "2-digit",
  month: "2-digit",
  year: "numeric",
});
const timeParts = new Intl.DateTimeFormat("en-GB", {
  timeZone: UK_ZONE,
  hour: "2-digit",
  minute: "2-digit",
  hourCycle: "h23",
});

/** "09-03-2027" from an instant (its UK calendar day) or a calendar date "2027-03-09". */
export function ukDate(value: Date | string | null | undefined): string {
  if (value == null) return "—";
  if (typeof value === "string") {
    const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
    return m ? `${m[3]}-${m[2]}-${m[1]}` : value;
  }
  return dateParts.format(value).replaceAll("/", "-");
}

/** "09-03-2027 14:05": an instant in UK time, 24-hour clock. */
export function ukDateTime(value: Date | null | undefined): string {
  return value == null ? "—" : `${ukDate(value)} ${timeParts.format(value)}`;
}

/** Today's calendar date in the UK, as YYYY-MM-DD. */
export function ukToday(now: Date): string {
  return new Intl.DateTimeFormat("en-CA", { timeZone: UK_ZONE }).format(now);
}
