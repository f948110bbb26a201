/** Dates as a UK site reads them (common practice, no published source: day-month-year, 24-hour clock). */
import { describe, expect, it } from "vitest";
import { parseUkDate, ukDate, ukDateTime, ukToday } from "@/lib/dates";

describe("UK dates", () => {
  it("writes calendar dates day-month-year without moving them across a time zone", () => {
    expect(ukDate("2027-03-09")).toBe("09-03-2027");
    expect(ukDate(null)).toBe("—");
  });
  it("writes instants in UK time on the 24-hour clock, summer time included", () => {
    expect(ukDateTime(new Date("2027-01-11T14:05:00Z"))).toBe("11-01-2027 14:05");
    // British Summer Time: one hour ahead of UTC, and the calendar day can change.
    expect(ukDateTime(new Date("2027-07-01T23:30:00Z"))).toBe("02-07-2027 00:30");
    expect(ukDate(new Date("2027-07-01T23:30:00Z"))).toBe("02-07-2027");
    expect(ukDateTime(new Date("2027-03-28T00:59:00Z"))).toBe("28-03-2027 00:59");
    expect(ukDateTime(new Date("2027-03-28T01:00:00Z"))).toBe("28-03-2027 02:00");
  });
  it("knows today's date in the UK", () => {
    expect(ukToday(new Date("2027-07-01T23:30:00Z"))).toBe("2027-07-02");
  });
  it("reads a date typed day first, as a UK site writes it, and refuses one that does not exist", () => {
    for (const typed of ["9-3-2027", "09-03-2027", "09/03/2027", "9.3.27", "09 03 2027", " 9 / 3 / 2027 "])
      expect(parseUkDate(typed), typed).toBe("2027-03-09");
    expect(parseUkDate("29-02-2028")).toBe("2028-02-29");
    for (const bad of ["29-02-2027", "31-04-2027", "2027-03-09", "03-09", "9th March", "13-13-2027", ""])
      expect(parseUkDate(bad), bad).toBeNull();
  });
});
