/**
 * Composite lifting index: the procedure of the NIOSH Applications Manual §2.4, as reproduced in
 * REFERENCES.md §1 [pub]. No published numeric example is at hand, so the check below is worked by
 * hand from the published formula and Table 5 values [calc].
 */
import { describe, expect, it } from "vitest";
import { scoreComposite, type CompositeTaskRequest } from "@/assessments/rules/niosh-composite";

const at = { h: 25, v: 75, a: 0 };
const task = (
  id: string,
  load: number,
  frequency: number,
  over: Partial<CompositeTaskRequest> = {},
): CompositeTaskRequest => ({
  id,
  load,
  origin: at,
  destination: at,
  frequency,
  coupling: "good",
  controlAtDestination: false,
  ...over,
});

describe("composite lifting index [pub procedure, calc values]", () => {
  // Both tasks at the ideal position: FIRWL = LC = 23 kg.
  // A: 10 kg at 1/min → FM .94, STRWL 21.62, STLI .4625, FILI .4348
  // B: 5 kg at 2/min → FM .91, STRWL 20.93, STLI .2389, FILI .2174
  // CLI = .4625 + .2174 × (1/FM(3/min) − 1/FM(1/min)) = .4625 + .2174 × (1/.88 − 1/.94) = .4783
  const result = scoreComposite({
    method: "niosh-composite",
    units: "metric",
    durationHours: 1,
    recoveryHours: 1.2,
    tasks: [task("B", 5, 2), task("A", 10, 1)],
  });

  it("computes FIRWL, STRWL, FILI and STLI per task", () => {
    const a = result.tasks.find((t) => t.id === "A")!;
    expect(a.firwl).toBe(23);
    expect(a.strwl).toBeCloseTo(21.62, 10);
    expect(a.stli).toBeCloseTo(10 / 21.62, 10);
    expect(a.fili).toBeCloseTo(10 / 23, 10);
  });

  it("orders tasks by decreasing STLI", () => {
    expect(result.order).toEqual(["A", "B"]);
  });

  it("CLI = STLI₁ + FILI₂ × (1/FM(F₁+F₂) − 1/FM(F₁)) = 0.4783 [calc]", () => {
    expect(result.cli).toBeCloseTo(10 / 21.62 + (5 / 23) * (1 / 0.88 - 1 / 0.94), 10);
    expect(result.cli!.toFixed(4)).toBe("0.4783");
    expect(result.band).toBe("clear");
  });

  it("is never below the largest single-task index", () => {
    expect(result.cli!).toBeGreaterThanOrEqual(Math.max(...result.tasks.map((t) => t.stli!)));
  });

  it("a task outside the equation's range makes the job unjudgeable: CLI null, band stop", () => {
    const r = scoreComposite({
      method: "niosh-composite",
      units: "metric",
      durationHours: 1,
      recoveryHours: 1.2,
      tasks: [task("A", 10, 1), task("far", 10, 1, { origin: { h: 70, v: 75, a: 0 } })],
    });
    expect(r.cli).toBeNull();
    expect(r.band).toBe("stop");
    expect(r.order[0]).toBe("far");
    expect(r.warnings.map((w) => w.field)).toContain("tasks.1.origin.h");
  });

  it("a combined frequency where FM is 0 gives CLI null with a warning", () => {
    const r = scoreComposite({
      method: "niosh-composite",
      units: "metric",
      durationHours: 4,
      tasks: [task("A", 5, 6), task("B", 5, 6)],
    });
    expect(r.cli).toBeNull();
    expect(r.warnings.some((w) => w.field === "tasks" && /combined frequency/.test(w.message))).toBe(true);
  });
});
