/**
 * Invariants of the whole engine, as properties over generated inputs (fast-check), inputs outside
 * each method's range included:
 * - a heavier load, a higher frequency, more twist, a longer carry, a steeper gradient (either way)
 *   or a larger utilisation never gives a better band;
 * - a result carrying a warning that the method cannot judge the operation is never Clear;
 * - every what-if suggestion, applied and re-scored, gives the band it claims;
 * - a task's band is never better than the worst of the methods that apply to it.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { BANDS, type Band } from "@/assessments/rules/types";
import { scoreFilter, ZONES, type FilterRequest } from "@/assessments/rules/filter";
import { scoreNiosh, type NioshRequest } from "@/assessments/rules/niosh";
import { scoreComposite, type CompositeRequest } from "@/assessments/rules/niosh-composite";
import { scorePush, SURFACES, type PushRequest } from "@/assessments/rules/push";
import { scoreLift, type LiftRequest } from "@/assessments/lift-plan/lift";
import { HITCHES } from "@/assessments/lift-plan/sling";
import { GROUND_TYPE_KEYS } from "@/assessments/lift-plan/ground";
import { CONDITIONS, type Condition } from "@/assessments/rules/conditions";
import { rateTask, scoreTask, type RegisterEntry } from "@/assessments/method-statement/score-task";
import { applyChange } from "@/assessments/method-statement/what-if";
import { taskSchema, type Task } from "@/assessments/method-statement/content";

const rank = (b: Band | null) => BANDS.indexOf(b ?? "stop");
const notBetter = (after: Band, before: Band) =>
  expect(rank(after), `${after} after, ${before} before`).toBeGreaterThanOrEqual(rank(before));
const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const coupling = fc.constantFrom("good" as const, "fair" as const, "poor" as const);
const sex = fc.constantFrom("male" as const, "female" as const);
// Hand positions reach beyond the equation on every side: H past 63 cm, V below 0 and above 175 cm, twist past 135°.
const position = fc.record({ h: num(0, 80), v: num(-60, 200), a: num(0, 180) });
const conditions = fc.option(fc.subarray([...CONDITIONS]), { nil: undefined });

const niosh: fc.Arbitrary<NioshRequest> = fc.record({
  method: fc.constant("niosh" as const),
  units: fc.constantFrom("metric" as const, "us" as const),
  load: num(0.1, 60),
  origin: position,
  destination: position,
  frequency: num(0, 17),
  durationHours: num(0.1, 10),
  recoveryHours: fc.option(num(0, 6), { nil: undefined }),
  coupling,
  controlAtDestination: fc.boolean(),
  conditions,
});
const filter: fc.Arbitrary<FilterRequest> = fc.record({
  method: fc.constant("filter" as const),
  sex,
  zone: fc.constantFrom(...ZONES),
  reach: fc.constantFrom("close" as const, "extended" as const),
  load: num(0.1, 120),
  frequency: num(0, 15),
  twistDeg: num(0, 180),
  teamSize: fc.integer({ min: 1, max: 6 }),
  carryDistanceM: fc.option(num(0, 80), { nil: undefined }),
  durationHours: fc.option(num(0.1, 10), { nil: undefined }),
  conditions,
});
const push: fc.Arbitrary<PushRequest> = fc.record({
  method: fc.constant("push" as const),
  mass: num(1, 1500),
  gradient: num(-0.3, 0.3),
  rollingCoefficient: fc.option(num(0, 0.2), { nil: undefined }),
  sex,
  teamSize: fc.integer({ min: 1, max: 6 }),
  distanceM: fc.option(num(0, 100), { nil: undefined }),
  measuredForceN: fc.option(num(1, 800), { nil: undefined }),
  surface: fc.option(fc.constantFrom(...SURFACES), { nil: undefined }),
  braked: fc.option(fc.boolean(), { nil: undefined }),
  brakeOperator: fc.option(fc.constantFrom("", "Ganger"), { nil: undefined }),
  conditions,
});
const isoDay = (offset: number) => new Date(Date.UTC(2027, 0, 1) + offset * 86_400_000).toISOString().slice(0, 10);
const lift: fc.Arbitrary<LiftRequest> = fc
  .record({
    load: num(10, 5000),
    riggingMass: num(0, 100),
    hookBlockMass: num(0, 50),
    ratedCapacity: num(100, 8000),
    legs: fc.integer({ min: 1, max: 4 }),
    angle: num(0, 60),
    legWll: num(100, 5000),
    hitch: fc.constantFrom(...HITCHES),
    markedWll: fc.option(num(100, 10_000), { nil: undefined }),
    examinedOffset: fc.option(fc.integer({ min: -500, max: 30 }), { nil: undefined }),
    wind: fc.option(fc.record({ inServiceLimitMs: num(5, 20), forecastMs: num(0, 25) }), { nil: undefined }),
    groundBearing: fc.option(
      fc.record({
        outriggerForceKn: num(5, 300),
        matLengthM: num(0.3, 2.5),
        matWidthM: num(0.3, 2.5),
        ground: fc.constantFrom(...GROUND_TYPE_KEYS),
        allowableKpa: fc.option(num(30, 800), { nil: undefined }),
      }),
      { nil: undefined },
    ),
    accessoryWll: fc.option(num(50, 6000), { nil: undefined }),
  })
  .map((x) => ({
    method: "lift" as const,
    load: x.load,
    riggingMass: x.riggingMass,
    hookBlockMass: x.hookBlockMass,
    ratedCapacity: x.ratedCapacity,
    sling: {
      legs: x.hitch === "basket" || x.hitch.startsWith("endless") ? 1 : x.legs,
      angleFromVerticalDeg: x.angle,
      legWll: x.legWll,
      hitch: x.hitch,
      markedWll: x.markedWll,
    },
    liftDate: isoDay(0),
    examinations:
      x.examinedOffset === undefined
        ? []
        : [{ item: "Crane", kind: "equipment" as const, lastExamined: isoDay(x.examinedOffset) }],
    wind: x.wind,
    groundBearing: x.groundBearing,
    accessories:
      x.accessoryWll === undefined
        ? undefined
        : [{ item: "Shackle", kind: "shackle" as const, wllKg: x.accessoryWll, carries: "whole-load" as const }],
  }));

describe("a worse input never gives a better band", () => {
  it("niosh: heavier, more frequent, more twisted at either end", () =>
    fc.assert(
      fc.property(niosh, num(0, 30), num(0, 5), num(0, 60), fc.boolean(), (r, extra, df, da, atOrigin) => {
        const before = scoreNiosh(r).band;
        notBetter(scoreNiosh({ ...r, load: r.load + extra }).band, before);
        notBetter(scoreNiosh({ ...r, frequency: r.frequency + df }).band, before);
        const end = atOrigin ? "origin" : "destination";
        notBetter(scoreNiosh({ ...r, [end]: { ...r[end], a: Math.min(180, r[end].a + da) } }).band, before);
      }),
    ));
  it("filter: heavier, more frequent, more twisted, carried further", () =>
    fc.assert(
      fc.property(filter, num(0, 40), num(0, 5), num(0, 90), num(0, 40), (r, extra, df, da, dc) => {
        const before = scoreFilter(r).band;
        notBetter(scoreFilter({ ...r, load: r.load + extra }).band, before);
        notBetter(scoreFilter({ ...r, frequency: r.frequency + df }).band, before);
        notBetter(scoreFilter({ ...r, twistDeg: Math.min(180, r.twistDeg + da) }).band, before);
        notBetter(
          scoreFilter({ ...r, carryDistanceM: (r.carryDistanceM ?? 0) + dc }).band,
          scoreFilter({ ...r, carryDistanceM: r.carryDistanceM ?? 0 }).band,
        );
      }),
    ));
  it("push: heavier, a steeper gradient in the same direction (up or down), further", () =>
    fc.assert(
      fc.property(push, num(0, 500), num(0, 0.2), num(0, 50), (r, extra, steeper, further) => {
        const before = scorePush(r).band;
        notBetter(scorePush({ ...r, mass: r.mass + extra }).band, before);
        const g = r.gradient;
        notBetter(
          scorePush({ ...r, gradient: g >= 0 ? Math.min(1, g + steeper) : Math.max(-1, g - steeper) }).band,
          before,
        );
        notBetter(
          scorePush({ ...r, distanceM: (r.distanceM ?? 0) + further }).band,
          scorePush({ ...r, distanceM: r.distanceM ?? 0 }).band,
        );
      }),
    ));
  it("lift plan: a larger utilisation (heavier load or a smaller rated capacity)", () =>
    fc.assert(
      fc.property(lift, num(0, 1000), num(0, 0.9), (r, extra, cut) => {
        const before = scoreLift(r).band;
        notBetter(scoreLift({ ...r, load: r.load + extra }).band, before);
        notBetter(scoreLift({ ...r, ratedCapacity: r.ratedCapacity * (1 - cut) }).band, before);
      }),
    ));
  it("composite: a heavier or more frequent task", () =>
    fc.assert(
      fc.property(
        fc.array(niosh, { minLength: 2, maxLength: 5 }),
        num(0.1, 9),
        fc.option(num(0, 4), { nil: undefined }),
        num(0, 20),
        num(0, 4),
        (tasks, durationHours, recoveryHours, extra, df) => {
          const req: CompositeRequest = {
            method: "niosh-composite",
            units: "metric",
            durationHours,
            recoveryHours,
            tasks: tasks.map((t, i) => ({ ...t, id: `t${i}` })),
          };
          const before = scoreComposite(req).band;
          const bump = (f: (t: CompositeRequest["tasks"][number]) => CompositeRequest["tasks"][number]) => ({
            ...req,
            tasks: [f(req.tasks[0]), ...req.tasks.slice(1)],
          });
          notBetter(scoreComposite(bump((t) => ({ ...t, load: t.load + extra }))).band, before);
          notBetter(scoreComposite(bump((t) => ({ ...t, frequency: t.frequency + df }))).band, before);
        },
      ),
    ));
});

describe("lineside: a deeper excavation or an added working condition never gives a better band", () => {
  it("niosh: hands further below the standing surface at either end", () =>
    fc.assert(
      fc.property(niosh, num(0, 100), fc.boolean(), (r, deeper, atOrigin) => {
        const end = atOrigin ? "origin" : "destination";
        const below = { ...r, [end]: { ...r[end], v: -Math.abs(r[end].v) - 1 } };
        notBetter(
          scoreNiosh({ ...below, [end]: { ...below[end], v: below[end].v - deeper } }).band,
          scoreNiosh(below).band,
        );
        expect(scoreNiosh(below).band).not.toBe("clear");
      }),
    ));
  const add = (c: Condition[] | undefined, x: Condition) => [...new Set([...(c ?? []), x])];
  it("each method: a condition added", () =>
    fc.assert(
      fc.property(niosh, filter, push, fc.constantFrom(...CONDITIONS), (n, f, p, c) => {
        notBetter(scoreNiosh({ ...n, conditions: add(n.conditions, c) }).band, scoreNiosh(n).band);
        notBetter(scoreFilter({ ...f, conditions: add(f.conditions, c) }).band, scoreFilter(f).band);
        notBetter(scorePush({ ...p, conditions: add(p.conditions, c) }).band, scorePush(p).band);
        expect(scoreFilter({ ...f, conditions: [c] }).band).not.toBe("clear");
      }),
    ));
});

describe("a result that says the method cannot judge the operation is never Clear", () => {
  const check = (r: { band: Band; warnings: { cannotJudge?: true }[] }) => {
    if (r.warnings.some((w) => w.cannotJudge)) expect(r.band).not.toBe("clear");
  };
  it("niosh", () => fc.assert(fc.property(niosh, (r) => check(scoreNiosh(r)))));
  it("filter", () => fc.assert(fc.property(filter, (r) => check(scoreFilter(r)))));
  it("push", () => fc.assert(fc.property(push, (r) => check(scorePush(r)))));
  it("lift plan", () => fc.assert(fc.property(lift, (r) => check(scoreLift(r)))));
  it("composite", () =>
    fc.assert(
      fc.property(fc.array(niosh, { minLength: 2, maxLength: 5 }), num(0.1, 9), (tasks, durationHours) =>
        check(
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

// Tasks as the wizard records them, with a component from the load register.
const COMPONENT_ID = "00000000-0000-4000-8000-000000000001";
const component: fc.Arbitrary<RegisterEntry> = fc.record({
  id: fc.constant(COMPONENT_ID),
  name: fc.constant("Part"),
  massKg: num(0.5, 80),
  grip: coupling,
  massSource: fc.constantFrom("weighed" as const, "datasheet" as const, "estimated" as const),
});
const metricPosition = fc.record({ h: num(0, 80), v: num(-60, 200), a: num(0, 180) });
const filterInputs = fc.record({
  sex,
  zone: fc.constantFrom(...ZONES),
  reach: fc.constantFrom("close" as const, "extended" as const),
  frequency: num(0, 14),
  twistDeg: num(0, 180),
  teamSize: fc.integer({ min: 1, max: 5 }),
  carryDistanceM: fc.option(num(1, 60), { nil: undefined }),
  durationHours: fc.option(num(0.1, 8), { nil: undefined }),
});
const task: fc.Arbitrary<Task> = fc
  .record({
    operation: fc.constantFrom(
      "lift" as const,
      "team-lift" as const,
      "carry" as const,
      "push" as const,
      "equipment" as const,
    ),
    quantity: fc.integer({ min: 1, max: 4 }),
    niosh: fc.record({
      origin: metricPosition,
      destination: metricPosition,
      frequency: num(0, 14),
      durationHours: num(0.1, 8),
      recoveryHours: fc.option(num(0, 4), { nil: undefined }),
      coupling,
      controlAtDestination: fc.boolean(),
    }),
    filter: filterInputs,
    push: push.map((p) => ({ ...p, method: undefined })),
    lift: lift.map((l) => ({ ...l, method: undefined, load: undefined })),
  })
  .chain((x) => conditions.map((c) => ({ ...x, conditions: x.operation === "equipment" ? undefined : c })))
  .map((x) => ({
    id: "t1",
    description: "",
    componentId: COMPONENT_ID,
    quantity: x.quantity,
    operation: x.operation,
    niosh: x.operation === "lift" ? x.niosh : undefined,
    filter: x.operation === "lift" || x.operation === "team-lift" || x.operation === "carry" ? x.filter : undefined,
    push: x.operation === "push" ? x.push : undefined,
    lift: x.operation === "equipment" ? x.lift : undefined,
    conditions: x.conditions,
  }))
  .filter((t) => taskSchema.safeParse(t).success);

describe("tasks", () => {
  it("a task's band is never better than the worst of the methods that apply to it", () =>
    fc.assert(
      fc.property(task, component, (t, c) => {
        const s = rateTask(t, c);
        for (const r of Object.values(s.results)) notBetter(s.band!, r.band);
      }),
    ));

  it("every what-if suggestion, applied and re-scored, gives the band it claims, better than the task's own", () =>
    fc.assert(
      fc.property(task, component, (t, c) => {
        const s = scoreTask(t, c);
        if (!s.whatIf) return;
        for (const suggestion of s.whatIf.suggestions) {
          expect(rateTask(...applyChange(t, c, suggestion.change)).band, suggestion.text).toBe(suggestion.band);
          expect(rank(suggestion.band)).toBeLessThan(rank(s.band));
        }
        if (s.whatIf.together) {
          let applied: [Task, RegisterEntry | undefined] = [t, c];
          for (const change of s.whatIf.together.changes) applied = applyChange(...applied, change);
          expect(rateTask(...applied).band).toBe(s.whatIf.together.band);
        }
        expect(s.whatIf.reachesClear).toBe(
          s.band === "clear" ||
            s.whatIf.suggestions.some((x) => x.band === "clear") ||
            s.whatIf.together?.band === "clear",
        );
      }),
      { numRuns: 200 },
    ));
});
