/**
 * Ground bearing under outrigger mats and accessories, against REFERENCES.md §7: pressure = force ÷
 * mat area [pub, mechanics]; presumed values from BS 8004:1986 Table 1 [memory]; bands Heftwise policy.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { scoreUnknown } from "@/assessments/rules";
import { checkGroundBearing, GROUND_TYPE_KEYS, GROUND_TYPES, type GroundType } from "@/assessments/lift-plan/ground";
import { scoreLift, type LiftRequest } from "@/assessments/lift-plan/lift";
import { BANDS } from "@/assessments/rules/types";

const plan = (over: Partial<LiftRequest> = {}): LiftRequest => ({
  method: "lift",
  load: 380,
  riggingMass: 25,
  hookBlockMass: 15,
  ratedCapacity: 1200,
  sling: { legs: 4, angleFromVerticalDeg: 30, legWll: 1000, markedWll: 2100 },
  groundBearing: { outriggerForceKn: 100, matLengthM: 1.2, matWidthM: 1.2, ground: "stiff-clay" },
  ...over,
});

describe("pressure under the mat (1 kN/m² = 1 kPa) [calc, REFERENCES.md §7]", () => {
  it("100 kN on a 1.0 m × 1.0 m mat is 100 kPa; on 1.2 m × 1.2 m, 69 kPa", () => {
    expect(
      checkGroundBearing({ outriggerForceKn: 100, matLengthM: 1, matWidthM: 1, allowableKpa: 150 }).pressureKpa,
    ).toBeCloseTo(100, 10);
    expect(
      checkGroundBearing({ outriggerForceKn: 100, matLengthM: 1.2, matWidthM: 1.2, allowableKpa: 150 }).pressureKpa,
    ).toBeCloseTo(69.4, 1);
  });
  it("the smallest square mat within 75 kPa for 100 kN is 1.2 m (√(100/75) = 1.155 m, up to the next 0.05 m)", () => {
    expect(
      checkGroundBearing({ outriggerForceKn: 100, matLengthM: 1, matWidthM: 1, ground: "firm-clay" })
        .smallestSquareMatM,
    ).toBe(1.2);
  });
});

describe("presumed allowable bearing values — BS 8004:1986 Table 1 (from memory), lower end of each range", () => {
  it.each([
    ["dense-gravel", 600],
    ["medium-dense-gravel", 200],
    ["compact-sand", 300],
    ["medium-dense-sand", 100],
    ["very-stiff-clay", 300],
    ["stiff-clay", 150],
    ["firm-clay", 75],
  ] as const)("%s: %i kPa", (ground, kpa) => expect(GROUND_TYPES[ground].presumedKpa).toBe(kpa));
  it.each(["loose-gravel", "loose-sand", "soft-clay", "very-soft-clay"] as const)(
    "%s has no presumed value: Stop until the planner enters one",
    (ground) => {
      const r = scoreLift(plan({ groundBearing: { outriggerForceKn: 20, matLengthM: 2, matWidthM: 2, ground } }));
      expect(r.band).toBe("stop");
      expect(r.warnings.find((w) => w.field === "groundBearing.allowableKpa")?.cannotJudge).toBe(true);
    },
  );
});

describe("bands (Heftwise policy: ≤ 80 % clear, ≤ 100 % watch, above stop)", () => {
  it("69 kPa on stiff clay (150 kPa) is Clear; the plan reports groundPressureKpa", () => {
    const r = scoreLift(plan());
    expect(r.groundPressureKpa).toBeCloseTo(69.4, 1);
    expect(r.band).toBe("clear");
  });
  it("100 kN on 1.0 m × 1.0 m on firm clay (75 kPa) is over: Stop, and the what-if mat size is named", () => {
    const r = scoreLift(
      plan({ groundBearing: { outriggerForceKn: 100, matLengthM: 1, matWidthM: 1, ground: "firm-clay" } }),
    );
    expect(r.band).toBe("stop");
    expect(r.warnings.find((w) => w.field === "groundBearing.matLengthM")?.message).toContain("1.2 m × 1.2 m");
  });
  it("without a ground bearing check the plan cannot be submitted", () => {
    expect(scoreLift(plan({ groundBearing: undefined })).missing).toContain(
      "ground bearing check (outrigger force and mat size)",
    );
  });
  it("softer ground never gives a better band (property)", () => {
    const softness = (g: GroundType) => -(GROUND_TYPES[g].presumedKpa ?? -1);
    fc.assert(
      fc.property(
        fc.constantFrom(...GROUND_TYPE_KEYS),
        fc.constantFrom(...GROUND_TYPE_KEYS),
        fc.double({ min: 5, max: 300, noNaN: true }),
        (a, b, force) => {
          const [firm, soft] = softness(a) <= softness(b) ? [a, b] : [b, a];
          const band = (ground: GroundType) =>
            BANDS.indexOf(
              scoreLift(plan({ groundBearing: { outriggerForceKn: force, matLengthM: 1, matWidthM: 1, ground } })).band,
            );
          expect(band(soft)).toBeGreaterThanOrEqual(band(firm));
        },
      ),
    );
  });
});

describe("accessories, each against the load it carries", () => {
  it("a shackle in one leg carries the leg tension; one at the hook the whole sling load", () => {
    const r = scoreLift(
      plan({
        accessories: [
          { item: "Leg shackle", kind: "shackle", wllKg: 200, carries: "one-leg" },
          { item: "Hook shackle", kind: "shackle", wllKg: 500, carries: "whole-load" },
        ],
      }),
    );
    expect(r.accessoryChecks[0].carriesKg).toBeCloseTo(r.legTension, 10);
    expect(r.accessoryChecks[0].ok).toBe(true);
    expect(r.accessoryChecks[1].carriesKg).toBe(405);
    expect(r.band).toBe("clear");
  });
  it("an accessory over its WLL stops the lift", () => {
    const r = scoreLift(
      plan({ accessories: [{ item: "Lifting beam 0.3 t", kind: "lifting-beam", wllKg: 300, carries: "whole-load" }] }),
    );
    expect(r.band).toBe("stop");
    expect(r.warnings.map((w) => w.field)).toContain("accessories.0.wllKg");
  });
});

describe("bad input gets a field message, never a guess", () => {
  it.each([
    [{ outriggerForceKn: 100, matLengthM: 0, matWidthM: 1, ground: "stiff-clay" }, "groundBearing.matLengthM"],
    [{ outriggerForceKn: 100, matLengthM: 1, matWidthM: 1 }, "groundBearing.allowableKpa"],
    [{ outriggerForceKn: 100, matLengthM: 1, matWidthM: 1, ground: "peat" }, "groundBearing.ground"],
  ])("%o → %s", (groundBearing, path) => {
    const r = scoreUnknown({ ...plan(), groundBearing });
    expect("error" in r && r.error.issues.map((i) => i.path)).toContain(path);
  });
});
