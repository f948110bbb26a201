/** The lift-plan engine against published check values (REFERENCES.md §4) and its own policy. */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { scoreUnknown } from "@/assessments/rules";
import { addMonths, checkExamination } from "@/assessments/lift-plan/examinations";
import { scoreLift, type LiftRequest } from "@/assessments/lift-plan/lift";
import { legTension, modeFactor } from "@/assessments/lift-plan/sling";

describe("leg tension T = W / (n·cos β) — suppliers' published checks [pub, REFERENCES.md §4]", () => {
  it("1000 lb on 2 legs at 30° from vertical → 577 lb per leg; at 45° → 707 lb", () => {
    expect(legTension(1000, 2, 30)).toBeCloseTo(577, 0);
    expect(legTension(1000, 2, 45)).toBeCloseTo(707, 0);
  });
  it("10 000 lb on 2 legs at 90/60/45/30° from horizontal → 5 000 / 5 775 / 7 070 / 10 000 lb (published values rounded)", () => {
    expect(legTension(10_000, 2, 0)).toBeCloseTo(5000, 6);
    expect(Math.abs(legTension(10_000, 2, 30) - 5775)).toBeLessThan(2);
    expect(Math.abs(legTension(10_000, 2, 45) - 7070)).toBeLessThan(2);
    expect(legTension(10_000, 2, 60)).toBeCloseTo(10_000, 6);
  });
  it("a 4-leg sling is taken as only 3 legs sharing [pub]", () => {
    expect(legTension(3000, 4, 0)).toBeCloseTo(1000, 10);
    expect(legTension(3000, 4, 0)).toBe(legTension(3000, 3, 0));
  });
});

describe("mode factors, uniform-load method — EN 818-4 as in suppliers' tables [pub]", () => {
  it.each([
    [1, 0, "straight", 1.0],
    [1, 0, "choked", 0.8],
    [2, 45, "straight", 1.4],
    [2, 60, "straight", 1.0],
    [3, 45, "straight", 2.1],
    [3, 60, "straight", 1.5],
    [4, 30, "straight", 2.1],
    [4, 50, "straight", 1.5],
  ] as const)("%i leg(s) at %i°, %s: %f", (legs, angle, hitch, factor) =>
    expect(modeFactor(legs, angle, hitch)).toBeCloseTo(factor, 10),
  );

  it("grade 8 chain, 10 mm (single leg 3.15 t): the factors give the published 2-leg 4.25 / 3.15 t and 3–4-leg 6.70 / 4.75 t within the tables' rounding to preferred numbers (4 %)", () => {
    const single = 3150;
    const within = (computed: number, published: number) =>
      expect(Math.abs(computed - published) / published).toBeLessThan(0.04);
    within(single * modeFactor(2, 45, "straight"), 4250);
    expect(single * modeFactor(2, 60, "straight")).toBe(3150);
    within(single * modeFactor(4, 45, "straight"), 6700);
    within(single * modeFactor(4, 60, "straight"), 4750);
  });
});

const plan = (over: Partial<LiftRequest> = {}): LiftRequest => ({
  method: "lift",
  load: 380,
  riggingMass: 25,
  hookBlockMass: 15,
  ratedCapacity: 1200,
  radiusM: 6,
  maxRadiusM: 9,
  sling: { legs: 4, angleFromVerticalDeg: 30, legWll: 1000, markedWll: 2100 },
  groundBearing: { outriggerForceKn: 100, matLengthM: 1.2, matWidthM: 1.2, ground: "stiff-clay" },
  liftDate: "2027-03-10",
  examinations: [
    { item: "Lorry-loader crane", kind: "equipment", lastExamined: "2026-09-01" },
    { item: "4-leg chain sling", kind: "accessory", lastExamined: "2026-12-01" },
  ],
  people: {
    appointedPerson: { name: "A. P.", competenceRef: "CPCS A61" },
    liftSupervisor: { name: "L. S.", competenceRef: "CPCS A62" },
    operator: { name: "O. P.", competenceRef: "CPCS A17" },
    slingerSignaller: { name: "S. S.", competenceRef: "CPCS A40" },
  },
  ...over,
});

describe("a lift plan", () => {
  it("hook load = load + rigging + hook block; utilisation against the rated capacity at the radius", () => {
    const r = scoreLift(plan());
    expect(r.hookLoad).toBe(420);
    expect(r.utilisation).toBeCloseTo(0.35, 10);
    expect(r.slingLoad).toBe(405);
    expect(r.legTension).toBeCloseTo(405 / (3 * Math.cos(Math.PI / 6)), 10);
    expect(r.slingWll).toBeCloseTo(2100, 10);
    expect(r.slingOk).toBe(true);
    expect(r.category).toBe("basic");
    expect(r.band).toBe("clear");
    expect(r.missing).toEqual([]);
  });

  it.each([
    [700, "clear"],
    [1000, "watch"],
    [1150, "act"],
    [1250, "stop"],
  ])("hook load %i kg of 1 200 kg rated → %s (Heftwise thresholds 75 / 90 / 100 %)", (hookLoad, band) => {
    const r = scoreLift(plan({ load: hookLoad - 40, sling: { legs: 4, angleFromVerticalDeg: 30, legWll: 2000 } }));
    expect(r.band).toBe(band);
  });

  it("utilisation above 50 % makes a lift standard; above 90 % complex", () => {
    expect(scoreLift(plan({ load: 700 })).category).toBe("standard");
    expect(scoreLift(plan({ load: 1100, sling: { legs: 4, angleFromVerticalDeg: 30, legWll: 2000 } })).category).toBe(
      "complex",
    );
  });

  it("any complicating answer makes a lift complex, with the reasons listed", () => {
    const r = scoreLift(plan({ factors: { nearOverheadLines: true, overPeople: true } }));
    expect(r.category).toBe("complex");
    expect(r.categoryReasons).toEqual([
      "load passes over people or occupied areas",
      "near overhead lines or overhead line equipment",
    ]);
  });

  it("a sling leg over its WLL fails the accessories and stops the lift", () => {
    const r = scoreLift(plan({ sling: { legs: 2, angleFromVerticalDeg: 60, legWll: 300 } }));
    expect(r.legTension).toBeCloseTo(405, 6);
    expect(r.slingOk).toBe(false);
    expect(r.band).toBe("stop");
  });

  it("a radius beyond the machine's maximum stops the lift", () => {
    expect(scoreLift(plan({ radiusM: 10 })).band).toBe("stop");
  });

  it("wind above the in-service limit stops; close to it warns; a large sail area warns of down-rating", () => {
    expect(scoreLift(plan({ wind: { inServiceLimitMs: 9, forecastMs: 10 } })).band).toBe("stop");
    const near = scoreLift(plan({ wind: { inServiceLimitMs: 9, forecastMs: 8, largeSailArea: true } }));
    expect(near.band).toBe("watch");
    expect(near.warnings.map((w) => w.field)).toEqual(
      expect.arrayContaining(["wind.forecastMs", "wind.largeSailArea"]),
    );
  });

  it("without an appointed person the plan lists it as missing and warns it cannot be approved", () => {
    const r = scoreLift(plan({ people: { operator: { name: "O", competenceRef: "x" } } }));
    expect(r.missing).toEqual(expect.arrayContaining(["appointed person", "lift supervisor", "slinger/signaller"]));
    expect(r.warnings.map((w) => w.field)).toContain("people.appointedPerson");
  });
});

describe("thorough examination — LOLER 1998 reg. 9: 12 months for equipment, 6 for accessories and equipment lifting people [from memory]", () => {
  it("due dates", () => {
    expect(
      checkExamination({ item: "crane", kind: "equipment", lastExamined: "2026-03-15" }, "2026-06-01").dueDate,
    ).toBe("2027-03-15");
    expect(
      checkExamination({ item: "sling", kind: "accessory", lastExamined: "2026-03-15" }, "2026-06-01").dueDate,
    ).toBe("2026-09-15");
    expect(
      checkExamination({ item: "MEWP", kind: "lifts-people", lastExamined: "2026-08-31" }, "2026-09-01").dueDate,
    ).toBe("2027-02-28");
    expect(addMonths("2027-08-31", 6)).toBe("2028-02-29");
  });
  it("an examination expired on the lift date stops the lift", () => {
    const r = scoreLift(plan({ liftDate: "2027-06-02" }));
    expect(r.examinations.find((e) => e.kind === "accessory")!.status).toBe("expired");
    expect(r.band).toBe("stop");
  });
  it("one due within 30 days of the lift is flagged", () => {
    const r = scoreLift(plan({ liftDate: "2027-05-15" }));
    expect(r.examinations.find((e) => e.kind === "accessory")!.status).toBe("due-soon");
    expect(r.band).toBe("watch");
  });
  it("an examination scheme's due date overrides the interval", () => {
    expect(
      checkExamination(
        { item: "crane", kind: "equipment", lastExamined: "2026-01-01", schemeDueDate: "2026-04-01" },
        "2026-05-01",
      ).status,
    ).toBe("expired");
  });
});

describe("bad input gets a clear error", () => {
  const bad = (over: Record<string, unknown>) => {
    const result = scoreUnknown({ ...plan(), ...over });
    if (!("error" in result)) throw new Error("expected an error");
    return result.error.issues;
  };
  it("β above 60° is refused", () => {
    expect(bad({ sling: { legs: 2, angleFromVerticalDeg: 65, legWll: 1000 } })).toEqual([
      {
        path: "sling.angleFromVerticalDeg",
        message: "must be at most 60° from vertical: wider angles are not permitted",
      },
    ]);
  });
  it("negative masses and zero legs are refused, each by name", () => {
    const issues = bad({ riggingMass: -5, sling: { legs: 0, angleFromVerticalDeg: 30, legWll: 1000 } });
    expect(issues.map((i) => i.path).sort()).toEqual(["riggingMass", "sling.legs"]);
  });
  it("an impossible date is refused", () => {
    expect(bad({ liftDate: "2027-02-30" })[0].path).toBe("liftDate");
  });
});

describe("properties", () => {
  const angle = fc.double({ min: 0, max: 60, noNaN: true });
  const legs = fc.integer({ min: 1, max: 4 });
  const load = fc.double({ min: 1, max: 50_000, noNaN: true });
  it("tension grows as the angle widens", () =>
    fc.assert(
      fc.property(
        load,
        legs,
        angle,
        angle,
        (w, n, a, b) =>
          void expect(legTension(w, n, Math.max(a, b))).toBeGreaterThanOrEqual(legTension(w, n, Math.min(a, b)) - 1e-9),
      ),
    ));
  it("tension is never below W / n", () =>
    fc.assert(
      fc.property(
        load,
        legs,
        angle,
        (w, n, a) => void expect(legTension(w, n, a)).toBeGreaterThanOrEqual(w / n - 1e-9),
      ),
    ));
});
