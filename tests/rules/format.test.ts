import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fmt } from "@/assessments/rules/format";

describe("fmt", () => {
  it.each([
    [14.337, "14.34"],
    [1.5, "1.5"],
    [2, "2"],
    [0.05, "0.05"],
    [-0.001, "0"],
    [-3.456, "-3.46"],
    [1e12, "1000000000000"],
  ])("%f → %s", (x, s) => expect(fmt(x)).toBe(s));
  it("agrees with rounding to 2 dp for any number", () =>
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        (x) => void expect(Number(fmt(x))).toBeCloseTo(Math.round(x * 100) / 100, 9),
      ),
    ));
});
