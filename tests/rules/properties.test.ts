/** Properties every valid input must keep (fast-check). */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { score } from "@/assessments/rules";
import { scoreFilter, ZONES } from "@/assessments/rules/filter";
import { scoreNiosh, type NioshRequest } from "@/assessments/rules/niosh";
import { scoreComposite } from "@/assessments/rules/niosh-composite";
import { scorePush } from "@/assessments/rules/push";

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const position = fc.record({ h: num(0, 80), v: num(0, 200), a: num(0, 180) });
const coupling = fc.constantFrom("good" as const, "fair" as const, "poor" as const);

const niosh = fc.record({
  method: fc.constant("niosh" as const),
  units: fc.constantFrom("metric" as const, "us" as const),
  load: num(0.1, 200),
  origin: position,
  destination: position,
  frequency: num(0, 20),
  durationHours: num(0.1, 12),
  coupling,
  controlAtDestination: fc.boolean(),
});
const filter = fc.record({
  method: fc.constant("filter" as const),
  sex: fc.constantFrom("male" as const, "female" as const),
  zone: fc.constantFrom(...ZONES),
  reach: fc.constantFrom("close" as const, "extended" as const),
  load: num(0.1, 200),
  frequency: num(0, 20),
  twistDeg: num(0, 180),
  teamSize: fc.integer({ min: 1, max: 6 }),
  carryDistanceM: fc.option(num(0, 100), { nil: undefined }),
  durationHours: fc.option(num(0.1, 12), { nil: undefined }),
});
const push = fc.record({
  method: fc.constant("push" as const),
  mass: num(1, 2000),
  gradient: num(-0.3, 0.3),
  rollingCoefficient: fc.option(num(0, 0.2), { nil: undefined }),
  sex: fc.constantFrom("male" as const, "female" as const),
  teamSize: fc.integer({ min: 1, max: 6 }),
  distanceM: fc.option(num(0, 100), { nil: undefined }),
  measuredForceN: fc.option(num(1, 2000), { nil: undefined }),
});

/** Every number anywhere in a result is finite and not negative. */
function assertSaneNumbers(value: unknown, path = "result"): void {
  if (typeof value === "number") {
    expect(Number.isFinite(value), `${path} is ${value}`).toBe(true);
    if (!path.endsWith("gradient") && !path.endsWith("slopeAngleDeg")) expect(value, path).toBeGreaterThanOrEqual(0);
  } else if (value && typeof value === "object")
    for (const [k, v] of Object.entries(value)) assertSaneNumbers(v, `${path}.${k}`);
}

describe("no NaN, infinity or negative number for any valid input", () => {
  it("niosh", () => fc.assert(fc.property(niosh, (r) => void assertSaneNumbers(score(r)))));
  it("filter", () => fc.assert(fc.property(filter, (r) => void assertSaneNumbers(score(r)))));
  it("push", () => fc.assert(fc.property(push, (r) => void assertSaneNumbers(score(r)))));
  it("composite", () =>
    fc.assert(
      fc.property(
        fc.array(niosh, { minLength: 2, maxLength: 10 }),
        num(0.1, 12),
        (tasks, durationHours) =>
          void assertSaneNumbers(
            scoreComposite({
              method: "niosh-composite",
              units: "metric",
              durationHours,
              tasks: tasks.map((t, i) => ({ ...t, id: `t${i}` })),
            }),
          ),
      ),
    ));
});

const index = (r: { index: number | null }) => r.index ?? Infinity;

describe("a heavier load never lowers an index", () => {
  it("niosh", () =>
    fc.assert(
      fc.property(
        niosh,
        num(0, 100),
        (r, extra) =>
          void expect(index(scoreNiosh({ ...r, load: r.load + extra }))).toBeGreaterThanOrEqual(index(scoreNiosh(r))),
      ),
    ));
  it("filter", () =>
    fc.assert(
      fc.property(
        filter,
        num(0, 100),
        (r, extra) =>
          void expect(index(scoreFilter({ ...r, load: r.load + extra }))).toBeGreaterThanOrEqual(index(scoreFilter(r))),
      ),
    ));
  it("push", () =>
    fc.assert(
      fc.property(
        push,
        num(0, 500),
        (r, extra) =>
          void expect(
            scorePush({ ...r, mass: r.mass + extra, gradient: Math.abs(r.gradient) }).index,
          ).toBeGreaterThanOrEqual(scorePush({ ...r, gradient: Math.abs(r.gradient) }).index),
      ),
    ));
});

describe("more frequent, further, more twisted or longer never raises a limit", () => {
  const rwl = (r: NioshRequest) => scoreNiosh(r).origin.rwl;
  it("niosh: frequency", () =>
    fc.assert(
      fc.property(
        niosh,
        num(0, 10),
        (r, d) => void expect(rwl({ ...r, frequency: r.frequency + d })).toBeLessThanOrEqual(rwl(r) + 1e-12),
      ),
    ));
  it("niosh: horizontal reach", () =>
    fc.assert(
      fc.property(
        niosh,
        num(0, 30),
        (r, d) =>
          void expect(rwl({ ...r, origin: { ...r.origin, h: r.origin.h + d } })).toBeLessThanOrEqual(rwl(r) + 1e-12),
      ),
    ));
  it("niosh: twist", () =>
    fc.assert(
      fc.property(
        niosh,
        num(0, 90),
        (r, d) =>
          void expect(rwl({ ...r, origin: { ...r.origin, a: Math.min(180, r.origin.a + d) } })).toBeLessThanOrEqual(
            rwl(r) + 1e-12,
          ),
      ),
    ));
  it("niosh: duration", () =>
    fc.assert(
      fc.property(
        niosh,
        num(0, 8),
        (r, d) => void expect(rwl({ ...r, durationHours: r.durationHours + d })).toBeLessThanOrEqual(rwl(r) + 1e-12),
      ),
    ));
  const guideline = (r: Parameters<typeof scoreFilter>[0]) => scoreFilter(r).guideline;
  it("filter: frequency", () =>
    fc.assert(
      fc.property(
        filter,
        num(0, 10),
        (r, d) => void expect(guideline({ ...r, frequency: r.frequency + d })).toBeLessThanOrEqual(guideline(r)),
      ),
    ));
  it("filter: reach", () =>
    fc.assert(
      fc.property(
        filter,
        (r) =>
          void expect(guideline({ ...r, reach: "extended" })).toBeLessThanOrEqual(guideline({ ...r, reach: "close" })),
      ),
    ));
  it("filter: twist", () =>
    fc.assert(
      fc.property(
        filter,
        num(0, 90),
        (r, d) =>
          void expect(guideline({ ...r, twistDeg: Math.min(180, r.twistDeg + d) })).toBeLessThanOrEqual(guideline(r)),
      ),
    ));
});

describe("metric and US results of the same task agree within rounding", () => {
  // Kept inside both equations' ranges and away from the column splits (75 cm vs 30 in = 76.2 cm),
  // where the two published equations differ by design.
  const CM_PER_IN = 2.54;
  const LB_PER_KG = 2.20462;
  const inRange = fc.record({ h: num(26, 60), v: num(0, 74), a: num(0, 130) });
  it("lifting indices within 6 %", () =>
    fc.assert(
      fc.property(
        inRange,
        num(0, 100),
        num(1, 40),
        num(0.2, 8),
        num(0.1, 8),
        coupling,
        (origin, rise, load, frequency, durationHours, c) => {
          const destination = { ...origin, v: Math.min(74, origin.v + rise) };
          const metric = scoreNiosh({
            method: "niosh",
            units: "metric",
            load,
            origin,
            destination,
            frequency,
            durationHours,
            coupling: c,
            controlAtDestination: true,
          });
          const toIn = (p: typeof origin) => ({ h: p.h / CM_PER_IN, v: p.v / CM_PER_IN, a: p.a });
          const us = scoreNiosh({
            method: "niosh",
            units: "us",
            load: load * LB_PER_KG,
            origin: toIn(origin),
            destination: toIn(destination),
            frequency,
            durationHours,
            coupling: c,
            controlAtDestination: true,
          });
          expect(Math.abs(us.li! - metric.li!) / metric.li!).toBeLessThan(0.06);
        },
      ),
    ));
});
