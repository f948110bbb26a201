/**
 * Dates as a UK site reads them: day-month-year, times on the 24-hour clock, in UK time
 * (Europe/London, summer time included). Pure; used on the server, in the browser, in e-mails and
 * in the pack. Stored values stay ISO (YYYY-MM-DD, UTC instants): only what is shown changes.
 */
export const UK_ZONE = "Europe/London";

/**
 * A UK-time formatter built at first use, not when the module loads: one with a time zone costs the
 * phone a noticeable moment to set up, and most screens that import this module show no date at once.
 */
function ukFormat(options: Intl.DateTimeFormatOptions): () => Intl.DateTimeFormat {
  let format: Intl.DateTimeFormat | undefined;
  return () => (format ??= new Intl.DateTimeFormat("en-GB", { timeZone: UK_ZONE, ...options }));
}
const dateFormat = ukFormat({ day: "2-digit", month: "2-digit", year: "numeric" });
const timeFormat = ukFormat({ hour: "2-digit", minute: "2-digit", hourCycle: "h23" });

/** "09-03-2027" from an instant (its UK calendar day) or a calendar date "2027-03-09". */
export function ukDate(value: Date | string | null | undefined): string {
  if (value == null) return "—";
  if (typeof value === "string") {
    const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
    return m ? `${m[3]}-${m[2]}-${m[1]}` : value;
  }
  return dateFormat().format(value).replaceAll("/", "-");
}

/** "09-03-2027 14:05": an instant in UK time, 24-hour clock. */
export function ukDateTime(value: Date | null | undefined): string {
  return value == null ? "—" : `${ukDate(value)} ${timeFormat().format(value)}`;
}

/** Today's calendar date in the UK, as YYYY-MM-DD. */
export function ukToday(now: Date): string {
  return new Intl.DateTimeFormat("en-CA", { timeZone: UK_ZONE }).format(now);
}

/**
 * A date typed as a UK site writes it, day first: "9-3-2027", "09/03/2027", "9.3.27", "09 03 2027".
 * Returns YYYY-MM-DD, or null when it is not a real calendar date. A two-digit year is this century.
 */
export function parseUkDate(text: string): string | null {
  const m = /^\s*(\d{1,2})\s*[-/. ]\s*(\d{1,2})\s*[-/. ]\s*(\d{2}|\d{4})\s*$/.exec(text);
  if (!m) return null;
  const year = m[3].length === 2 ? 2000 + Number(m[3]) : Number(m[3]);
  const iso = `${String(year).padStart(4, "0")}-${m[2].padStart(2, "0")}-${m[1].padStart(2, "0")}`;
  const date = new Date(`${iso}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().startsWith(iso) ? iso : null;
}
