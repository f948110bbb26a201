/** Masses from CSV cells: read exactly or refused with a reason, never guessed (a mass is a safety value). */
import { describe, expect, it } from "vitest";
import { formulaNote, neutraliseFormula, parseCsvNumber } from "@/assessments/load-register/csv-cells";

describe("numbers in CSV cells", () => {
  it.each([
    ["12", 12],
    ["12.5", 12.5],
    ["0.125", 0.125],
    ["12,5", 12.5],
    ["0,125", 0.125],
    ["1,2500", 1.25],
    ["1250", 1250],
    ["  42 ", 42],
    ["", null],
  ])("%j → %j", (cell, value) => expect(parseCsvNumber(cell)).toEqual({ value }));

  it.each([
    ["1,250", /could mean 1250 or 1.250/],
    ["1.250", /could mean 1250 or 1.250/],
    ["12.500", /could mean 12500 or 12.500/],
    ["1,250.5", /thousands separators/],
    ["1 250", /thousands separators/],
    ["12 kg", /without the unit/],
    ["0x1F", /not a number/],
    ["1e3", /not a number/],
    ["+12", /not a number/],
    ["-12", /not a number/],
    ["Infinity", /not a number/],
    ["12,5,0", /not a number/],
  ])("%j is refused with a reason", (cell, message) => {
    const r = parseCsvNumber(cell);
    expect("error" in r && r.error).toMatch(message);
  });
});

describe("spreadsheet formula cells", () => {
  it.each(['=HYPERLINK("x")', "+44 7700", "-1", "@SUM(A1)"])("%j is noted and neutralised for export", (text) => {
    expect(formulaNote(text)).toMatch(/formula/);
    expect(neutraliseFormula(text)).toBe(`'${text}`);
  });
  it("plain text is left alone", () => {
    expect(formulaNote("Trough lid 1 m")).toBeNull();
    expect(neutraliseFormula("Trough lid 1 m")).toBe("Trough lid 1 m");
  });
});
