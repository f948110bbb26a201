/** When reminders fall due (Heftwise policy: the organisation's lead times, then overdue). */
import { describe, expect, it } from "vitest";
import { approvalIsWaiting, daysBetween, reviewReminderKind, ukDate, ukToday } from "@/assessments/reminders/schedule";

describe("review reminders", () => {
  const leads = [30, 7];
  it("none while the review date is beyond the longest lead time", () => {
    expect(reviewReminderKind("2027-03-01", "2027-01-01", leads)).toBeNull();
  });
  it("the nearest lead time reached is the one due, so a late run sends one reminder, not a burst", () => {
    expect(reviewReminderKind("2027-01-31", "2027-01-01", leads)).toBe("review-due-30");
    expect(reviewReminderKind("2027-01-20", "2027-01-01", leads)).toBe("review-due-30");
    expect(reviewReminderKind("2027-01-08", "2027-01-01", leads)).toBe("review-due-7");
    expect(reviewReminderKind("2027-01-01", "2027-01-01", leads)).toBe("review-due-7");
  });
  it("overdue from the day after the review date", () => {
    expect(reviewReminderKind("2026-12-31", "2027-01-01", leads)).toBe("review-overdue");
  });
  it("lead times in any order", () => {
    expect(reviewReminderKind("2027-01-05", "2027-01-01", [7, 60, 30])).toBe("review-due-7");
  });
});

describe("UK calendar days", () => {
  it("today is the UK's date, not UTC's, across midnight in summer time", () => {
    // 23:30 UTC on 30 June is 00:30 on 1 July in London (BST).
    expect(ukToday(new Date("2027-06-30T23:30:00Z"))).toBe("2027-07-01");
    expect(ukToday(new Date("2027-01-31T23:30:00Z"))).toBe("2027-01-31");
  });
  it("counts whole days and writes dates day-month-year", () => {
    expect(daysBetween("2027-03-27", "2027-03-29")).toBe(2);
    expect(ukDate("2027-03-09")).toBe("09-03-2027");
  });
  it("an approver is reminded once the request has waited the organisation's days", () => {
    const submitted = new Date("2027-01-01T09:00:00Z");
    expect(approvalIsWaiting(submitted, new Date("2027-01-04T08:59:00Z"), 3)).toBe(false);
    expect(approvalIsWaiting(submitted, new Date("2027-01-04T09:00:00Z"), 3)).toBe(true);
  });
});
