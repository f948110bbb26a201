/**
 * The engine at the edges of each method: inputs where a method cannot judge the operation, or
 * where an input used to be dropped, must never come back Clear. One block per class of defect
 * (issue "Never a false Clear"); the source of every figure is named beside its check.
 */
import { describe, expect, it } from "vitest";
import { scoreFilter } from "@/assessments/rules/filter";
import { scoreNiosh, type NioshRequest } from "@/assessments/rules/niosh";
import { frequencyMultiplier } from "@/assessments/rules/niosh-frequency";
import { scoreComposite, type CompositeTaskRequest } from "@/assessments/rules/niosh-composite";
import { GRAVITY, scorePush, type PushRequest } from "@/assessments/rules/push";
import { scoreLift, type LiftRequest } from "@/assessments/lift-plan/lift";
import { modeFactor } from "@/assessments/lift-plan/sling";
import { scoreTask } from "@/assessments/method-statement/score-task";
import { whatIfLines } from "@/assessments/method-statement/what-if";
import type { Task } from "@/assessments/method-statement/content";

const lift = (over: Partial<NioshRequest> = {}): NioshRequest => ({
  method: "niosh",
  units: "metric",
  load: 5,
  origin: { h: 25, v: 75, a: 0 },
  destination: { h: 25, v: 75, a: 0 },
  frequency: 0.2,
  durationHours: 1,
  recoveryHours: 2,
  coupling: "good",
  controlAtDestination: false,
  ...over,
});
const cannotJudge = (r: { warnings: { cannotJudge?: boolean }[] }) => r.warnings.some((w) => w.cannotJudge);

describe("1. the lifting equation outside its range is never Clear (NIOSH Pub. 94-110: a multiplier of 0 means the equation cannot judge the task)", () => {
  it.each([
    ["H at the destination above 63 cm", { destination: { h: 70, v: 75, a: 0 } }, "destination.h", "HM"],
    ["V at the destination above 175 cm", { destination: { h: 25, v: 180, a: 0 } }, "destination.v", "VM"],
    ["asymmetry at the destination above 135°", { destination: { h: 25, v: 75, a: 140 } }, "destination.a", "AM"],
    ["H at the origin above 63 cm", { origin: { h: 64, v: 75, a: 0 } }, "origin.h", "HM"],
  ] as const)("%s, without control at the destination", (_, over, field, multiplier) => {
    const r = scoreNiosh(lift(over));
    expect(r.band).not.toBe("clear");
    expect(r.li).toBeNull();
    const w = r.warnings.find((x) => x.field === field);
    expect(w?.cannotJudge).toBe(true);
    expect(w?.message).toContain(`${multiplier} is 0`);
    expect(w?.message).toMatch(field.startsWith("origin") ? /origin/ : /destination/);
    expect(
      r.reasons.some(
        (x) => x.text.includes(multiplier) && x.text.includes(field.startsWith("origin") ? "origin" : "destination"),
      ),
    ).toBe(true);
  });

  it("US units: V at the destination above 70 in is outside the equation (NIOSH Pub. 94-110, US customary)", () => {
    const r = scoreNiosh(
      lift({ units: "us", load: 10, origin: { h: 10, v: 30, a: 0 }, destination: { h: 10, v: 72, a: 0 } }),
    );
    expect(r.band).not.toBe("clear");
    expect(cannotJudge(r)).toBe(true);
  });

  it("hands below the standing surface (V < 0) are outside the equation, whose V runs from 0 (NIOSH Pub. 94-110)", () => {
    const r = scoreNiosh(lift({ origin: { h: 25, v: -30, a: 0 } }));
    expect(r.band).not.toBe("clear");
    expect(r.warnings.find((w) => w.field === "origin.v")?.cannotJudge).toBe(true);
  });
});

describe("2. a frequency multiplier of 0 names the frequency and the Table 5 cell (NIOSH Pub. 94-110, Table 5)", () => {
  it("9 lifts a minute for 4 h with the hands below 75 cm: FM 0, Stop, a warning naming the cell", () => {
    const r = scoreNiosh(
      lift({ frequency: 9, durationHours: 4, origin: { h: 25, v: 40, a: 0 }, destination: { h: 25, v: 40, a: 0 } }),
    );
    expect(r.origin.fm).toBe(0);
    expect(r.band).toBe("stop");
    const w = r.warnings.find((x) => x.field === "frequency");
    expect(w?.cannotJudge).toBe(true);
    expect(w?.message).toContain("Table 5");
    expect(w?.message).toContain("9/min");
    expect(w?.message).toContain("2–8 h");
    expect(w?.message).toContain("V < 75 cm");
  });

  it("between the last non-zero row (8/min, .18) and a zero cell (9/min, 0) the table ends: FM is taken as 0 and the warning says so (Heftwise policy)", () => {
    expect(frequencyMultiplier(8, "long", false)).toBeCloseTo(0.18, 10);
    expect(frequencyMultiplier(8.5, "long", false)).toBe(0);
    const r = scoreNiosh(
      lift({
        load: 1,
        frequency: 8.5,
        durationHours: 4,
        origin: { h: 25, v: 40, a: 0 },
        destination: { h: 25, v: 40, a: 0 },
      }),
    );
    expect(r.band).not.toBe("clear");
    expect(r.warnings.find((w) => w.field === "frequency")?.message).toMatch(/table ends/i);
  });
});

describe("3. the composite index keeps a task the single-task method stops (NIOSH Pub. 94-110 §2.4)", () => {
  const at = (h: number, v: number) => ({ h, v, a: 0 });
  // Task A: 9 lifts/min for 4 h. At the origin (V 30 cm, below 75) FM is 0 (Table 5); at the
  // destination (V 80 cm) FM is .15 and FIRWL is lower (H 50 cm). Choosing the end by FIRWL alone
  // dropped the zero cell and the job came back Watch.
  const a: CompositeTaskRequest = {
    id: "A",
    load: 3,
    origin: at(25, 30),
    destination: at(50, 80),
    frequency: 9,
    coupling: "good",
    controlAtDestination: true,
  };
  const b: CompositeTaskRequest = {
    id: "B",
    load: 1,
    origin: at(25, 75),
    destination: at(25, 75),
    frequency: 0.2,
    coupling: "good",
    controlAtDestination: false,
  };
  const r = scoreComposite({ method: "niosh-composite", units: "metric", durationHours: 4, tasks: [a, b] });

  it("the single-task method stops task A", () => {
    expect(scoreNiosh({ method: "niosh", units: "metric", durationHours: 4, ...a }).band).toBe("stop");
  });
  it("so the composite is Stop, and names task A", () => {
    expect(r.band).toBe("stop");
    expect(r.reasons.some((x) => x.text.includes('"A"'))).toBe(true);
  });
});

describe("4. pushing or holding back downhill (HSE L23 guideline forces; F = m·g·(sin θ − C_rr·cos θ), REFERENCES.md §7)", () => {
  const push = (over: Partial<PushRequest> = {}): PushRequest => ({
    method: "push",
    mass: 400,
    gradient: -0.1,
    sex: "male",
    teamSize: 1,
    surface: "hard",
    braked: false,
    ...over,
  });

  it("400 kg down 1 in 10 on hard ground, unbraked: the hold-back force exceeds 200 N, never Clear", () => {
    const r = scorePush(push());
    const theta = Math.atan(0.1);
    const expected = 400 * GRAVITY * (Math.sin(theta) - r.runawayCoefficient * Math.cos(theta)); // [calc]
    expect(r.holdForceN).toBeCloseTo(expected, 6);
    expect(r.holdForceN).toBeGreaterThan(200);
    expect(r.stopForceN).toBeGreaterThan(r.holdForceN);
    expect(r.band).not.toBe("clear");
  });

  it("a trolley on rails down 1 in 200 without brakes runs away: Stop (rolling resistance about 0.001 on rail, from memory)", () => {
    const r = scorePush(push({ mass: 300, gradient: -1 / 200, surface: "rail" }));
    expect(r.runsAway).toBe(true);
    expect(r.band).toBe("stop");
  });

  it("women's figures with a team: the hold-back force is compared with the starting/stopping guideline × team factor (HSE L23)", () => {
    const r = scorePush(push({ sex: "female", teamSize: 2, mass: 150, gradient: -0.05 }));
    expect(r.guidelineStartN).toBeCloseTo(150 * 2 * (2 / 3), 10);
    expect(r.index).toBeGreaterThanOrEqual(r.stopForceN / r.guidelineStartN - 1e-12);
  });
});

describe("5. cumulative mass in team carrying is counted per person (ISO 11228-1, from memory)", () => {
  it("40 kg carried by two, once a minute for 8 h: 9 600 kg each, not 19 200", () => {
    const r = scoreFilter({
      method: "filter",
      sex: "male",
      zone: "knuckle-to-elbow",
      reach: "close",
      load: 40,
      frequency: 1,
      twistDeg: 0,
      teamSize: 2,
      carryDistanceM: 8,
      durationHours: 8,
    });
    expect(r.cumulativeMassKg).toBe(9_600);
    expect(r.warnings.some((w) => /cumulative/i.test(w.message))).toBe(false);
  });
});

describe("6. lift plan: examinations and the sling's marked limit", () => {
  const plan = (over: Partial<LiftRequest> = {}): LiftRequest => ({
    method: "lift",
    load: 300,
    riggingMass: 20,
    hookBlockMass: 10,
    ratedCapacity: 2000,
    sling: { legs: 2, angleFromVerticalDeg: 30, legWll: 3150, markedWll: 4250 },
    liftDate: "2027-05-01",
    examinations: [{ item: "Crane", kind: "equipment", lastExamined: "2027-05-10" }],
    ...over,
  });

  it("an examination dated after the lift cannot cover it: not in date, Stop (LOLER 1998 reg. 9)", () => {
    const r = scoreLift(plan());
    expect(r.examinations[0].status).not.toBe("in-date");
    expect(r.band).toBe("stop");
  });

  it("the marked assembly limit governs when lower: 10 mm grade 8 two-leg, β ≤ 45°, is marked 4 250 kg while 1.4 × 3 150 = 4 410 kg [pub, suppliers' tables; calc]", () => {
    const r = scoreLift(plan({ load: 4300, riggingMass: 0, ratedCapacity: 20_000, examinations: [] }));
    expect(r.slingWll).toBe(4250);
    expect(r.slingOk).toBe(false);
  });

  it.each([
    [1, 0, "basket", 2.0],
    [1, 30, "basket", 1.4],
    [1, 50, "basket", 1.0],
    [1, 0, "endless", 1.6],
    [1, 0, "endless-choked", 1.28],
    [2, 30, "choked", 1.4 * 0.8],
    [4, 30, "choked", 2.1 * 0.8],
  ] as const)(
    "mode factor, %i leg(s) at %i°, %s hitch: %f (uniform load method, EN 1492-1 / EN 818-4 suppliers' tables, from memory)",
    (legs, angle, hitch, factor) => {
      expect(modeFactor(legs, angle, hitch)).toBeCloseTo(factor, 10);
    },
  );
});

describe("7. every input a method uses reaches it (HSE L23 reductions for frequency and twisting)", () => {
  it("a one-person lift of 12 kg at 6 a minute with a 90° twist: the filter gets 6/min and 90°, and gives Watch", () => {
    const task: Task = {
      id: "t1",
      description: "",
      componentId: "00000000-0000-4000-8000-000000000001",
      quantity: 1,
      operation: "lift",
      niosh: {
        origin: { h: 25, v: 75, a: 90 },
        destination: { h: 25, v: 75, a: 0 },
        frequency: 6,
        durationHours: 1,
        recoveryHours: 2,
        coupling: "good",
        controlAtDestination: false,
      },
      filter: { sex: "male", zone: "knuckle-to-elbow", reach: "close", frequency: 0.5, twistDeg: 0, teamSize: 1 },
    };
    const s = scoreTask(task, { id: task.componentId!, name: "Kit", massKg: 12, grip: "good", massSource: "weighed" });
    expect(s.results.filter?.inputs.frequency).toBe(6);
    expect(s.results.filter?.inputs.twistDeg).toBe(90);
    // 25 kg × (1 − 50 % − 10 %) = 10 kg; 12 ÷ 10 = 1.2 → Watch [calc from HSE L23 figures]
    expect(s.results.filter?.guideline).toBeCloseTo(10, 10);
    expect(s.results.filter?.band).toBe("watch");
    expect(s.band).not.toBe("clear");
  });
});

describe("8. duration categories need their recovery time (NIOSH Pub. 94-110: ≤ 1 h needs ≥ 1.2 × the work time, 1–2 h ≥ 0.3 ×; ratios from memory)", () => {
  const at5 = (over: Partial<NioshRequest>) => scoreNiosh(lift({ frequency: 5, ...over }));
  it("1 h with 1.2 h of recovery stays short: FM .80", () =>
    expect(at5({ durationHours: 1, recoveryHours: 1.2 }).origin.fm).toBeCloseTo(0.8, 10));
  it("1 h with 0.5 h of recovery is moderate: FM .60", () =>
    expect(at5({ durationHours: 1, recoveryHours: 0.5 }).origin.fm).toBeCloseTo(0.6, 10));
  it("1 h with 0.2 h of recovery is long: FM .35", () =>
    expect(at5({ durationHours: 1, recoveryHours: 0.2 }).origin.fm).toBeCloseTo(0.35, 10));
  it("1.5 h with 0.3 h of recovery is long: FM .35", () =>
    expect(at5({ durationHours: 1.5, recoveryHours: 0.3 }).origin.fm).toBeCloseTo(0.35, 10));
  it("no recovery given: the long column, with a warning that says so", () => {
    const r = at5({ durationHours: 1, recoveryHours: undefined });
    expect(r.origin.fm).toBeCloseTo(0.35, 10);
    expect(r.derived.durationBand).toBe("long");
    expect(r.warnings.find((w) => w.field === "recoveryHours")?.message).toMatch(/2–8 h/);
  });
});

describe("9. infrequent tasks in a composite job count at 0.2 a minute (NIOSH Pub. 94-110; conservative, Heftwise policy)", () => {
  it("a task lifted once in ten minutes is added to the cumulative frequency at 0.2/min, and the result says why", () => {
    const at = { h: 25, v: 75, a: 0 };
    const r = scoreComposite({
      method: "niosh-composite",
      units: "metric",
      durationHours: 1,
      recoveryHours: 2,
      tasks: [
        { id: "A", load: 10, origin: at, destination: at, frequency: 1, coupling: "good", controlAtDestination: false },
        {
          id: "B",
          load: 5,
          origin: at,
          destination: at,
          frequency: 0.1,
          coupling: "good",
          controlAtDestination: false,
        },
      ],
    });
    // CLI = 10/(23×.94) + 5/23 × (1/FM(1.2) − 1/FM(1)); FM(1.2, short) = .94 + .2 × (.91 − .94) = .934 [calc, Table 5 rows 1 and 2]
    expect(r.cli).toBeCloseTo(10 / (23 * 0.94) + (5 / 23) * (1 / 0.934 - 1 / 0.94), 10);
    expect(r.reasons.some((x) => /0\.2/.test(x.text) && /"B"/.test(x.text))).toBe(true);
  });
});

describe("what would bring it to clear: computed by re-scoring, never promised", () => {
  const part = {
    id: "00000000-0000-4000-8000-000000000001",
    name: "Panel",
    massKg: 30,
    grip: "fair" as const,
    massSource: "weighed" as const,
  };
  const carry = (over: Partial<NonNullable<Task["filter"]>> = {}): Task => ({
    id: "t1",
    description: "",
    componentId: part.id,
    quantity: 1,
    operation: "carry",
    filter: {
      sex: "male",
      zone: "knuckle-to-elbow",
      reach: "close",
      frequency: 0.5,
      twistDeg: 0,
      teamSize: 1,
      carryDistanceM: 40,
      durationHours: 1,
      ...over,
    },
  });

  it("a 40 m carry of 30 kg: a pair alone does not reach Clear (the long carry keeps Watch), so it is not offered as doing so", () => {
    const s = scoreTask(carry(), part);
    expect(s.band).toBe("watch");
    expect(s.whatIf!.suggestions.some((x) => x.change.kind === "team" && x.band === "clear")).toBe(false);
    // Together, a change of method and a break in the route do reach it, re-scored.
    expect(s.whatIf!.together?.band).toBe("clear");
    expect(s.whatIf!.reachesClear).toBe(true);
  });

  it("suggestions come better band first, then smallest change first", () => {
    const s = scoreTask(carry({ carryDistanceM: 8, teamSize: 1 }), { ...part, massKg: 34 });
    const ranks = s.whatIf!.suggestions.map((x) => ["clear", "watch", "act", "stop"].indexOf(x.band));
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
    expect(s.whatIf!.suggestions[0].band).toBe("clear");
  });

  it("where nothing reaches Clear it says so and gives the best band reached", () => {
    // A braked trolley whose push-pull gauge read 900 N, already pushed by four: no change Heftwise can
    // score lowers a measured force, and four is the largest team the guidance allows (HSE L23).
    const task: Task = {
      id: "t1",
      description: "",
      componentId: part.id,
      quantity: 1,
      operation: "push",
      push: {
        mass: 800,
        gradient: 0.02,
        sex: "male",
        teamSize: 4,
        surface: "rail",
        braked: true,
        brakeOperator: "Ganger",
        measuredForceN: 900,
      },
    };
    const s = scoreTask(task, part);
    expect(s.band).not.toBe("clear");
    expect(s.whatIf!.reachesClear).toBe(false);
    expect(["watch", "act", "stop"]).toContain(s.whatIf!.bestBand);
  });
});

describe("what-if lines for the pack and the briefing", () => {
  it("a combination that reaches Clear is printed even when no single change does", () => {
    const part = {
      id: "00000000-0000-4000-8000-000000000001",
      name: "Battery",
      massKg: 31,
      grip: "good" as const,
      massSource: "datasheet" as const,
    };
    const task: Task = {
      id: "t",
      description: "",
      componentId: part.id,
      quantity: 1,
      operation: "carry",
      filter: {
        sex: "male",
        zone: "knuckle-to-elbow",
        reach: "close",
        frequency: 0.5,
        twistDeg: 0,
        teamSize: 1,
        carryDistanceM: 40,
        durationHours: 1,
      },
    };
    const s = scoreTask(task, part);
    expect(s.whatIf!.suggestions).toHaveLength(0);
    const lines = whatIfLines(s.whatIf);
    expect(lines.some((l) => l.startsWith("Together") && l.endsWith("Clear."))).toBe(true);
  });
  it("a task Clear already has nothing to print", () => {
    const part = {
      id: "00000000-0000-4000-8000-000000000001",
      name: "Kit",
      massKg: 6,
      grip: "good" as const,
      massSource: "datasheet" as const,
    };
    const task: Task = {
      id: "t",
      description: "",
      componentId: part.id,
      quantity: 1,
      operation: "carry",
      filter: {
        sex: "male",
        zone: "knuckle-to-elbow",
        reach: "close",
        frequency: 0.5,
        twistDeg: 0,
        teamSize: 1,
        carryDistanceM: 5,
        durationHours: 1,
      },
    };
    expect(whatIfLines(scoreTask(task, part).whatIf)).toEqual([]);
  });
});

describe("working conditions (HSE L23: the working environment is part of every assessment; at least Watch: Heftwise policy)", () => {
  it("each condition present lifts a Clear lift to Watch, with a reason naming it and its controls", () => {
    const clear = scoreNiosh(lift());
    expect(clear.band).toBe("clear");
    const r = scoreNiosh(lift({ conditions: ["uneven-ground", "poor-light"] }));
    expect(r.band).toBe("watch");
    expect(
      r.reasons.some((x) => x.text.includes("uneven or unstable ground") && x.text.includes("walkway boards")),
    ).toBe(true);
    expect(r.reasons.some((x) => x.text.includes("poor light") && x.text.includes("lighting"))).toBe(true);
  });
  it("the what-if offers each condition's remedy, re-scored", () => {
    const part = {
      id: "00000000-0000-4000-8000-000000000001",
      name: "Kit",
      massKg: 6,
      grip: "good" as const,
      massSource: "datasheet" as const,
    };
    const task: Task = {
      id: "t",
      description: "",
      componentId: part.id,
      quantity: 1,
      operation: "carry",
      conditions: ["wind-on-panels"],
      filter: {
        sex: "male",
        zone: "knuckle-to-elbow",
        reach: "close",
        frequency: 0.5,
        twistDeg: 0,
        teamSize: 1,
        carryDistanceM: 5,
        durationHours: 1,
      },
    };
    const s = scoreTask(task, part);
    expect(s.band).toBe("watch");
    expect(s.whatIf!.suggestions[0]).toMatchObject({
      change: { kind: "condition", condition: "wind-on-panels" },
      band: "clear",
    });
  });
});

describe("working conditions from a form", () => {
  it("a checkbox group with nothing ticked (false) is read as no conditions, never scored as something else", async () => {
    const { taskSchema } = await import("@/assessments/method-statement/content");
    const parsed = taskSchema.parse({
      id: "t",
      description: "",
      componentId: null,
      quantity: 1,
      operation: "carry",
      conditions: false,
    });
    expect(parsed.conditions).toEqual([]);
    expect(
      taskSchema.safeParse({
        id: "t",
        description: "",
        componentId: null,
        quantity: 1,
        operation: "carry",
        conditions: ["fog"],
      }).success,
    ).toBe(false);
  });
});
