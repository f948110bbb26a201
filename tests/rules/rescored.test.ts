/** A draft saved under earlier rules shows which tasks the current rules score differently (Heftwise policy). */
import { describe, expect, it } from "vitest";
import { rateTask, rescoredByCurrentRules } from "@/assessments/method-statement/score-task";
import type { Task } from "@/assessments/method-statement/content";
import { RULES_VERSION } from "@/assessments/rules/version";

const part = {
  id: "00000000-0000-4000-8000-000000000001",
  name: "Panel",
  massKg: 40,
  grip: "fair" as const,
  massSource: "weighed" as const,
};
const carry: Task = {
  id: "c1",
  description: "Carry panels as a pair",
  componentId: part.id,
  quantity: 1,
  operation: "carry",
  filter: {
    sex: "male",
    zone: "knuckle-to-elbow",
    reach: "close",
    frequency: 1,
    twistDeg: 0,
    teamSize: 2,
    carryDistanceM: 8,
    durationHours: 8,
  },
};

describe("tasks the current rules score differently", () => {
  const now = rateTask(carry, part);

  it("a stored result from earlier rules with another band is listed, with both bands", () => {
    // Stored under earlier rules with a band the current rules do not give.
    expect(now.band).not.toBe("stop");
    const stored = [{ ...now, band: "stop" as const, rulesVersion: "2026.12.1" }];
    const changed = rescoredByCurrentRules([carry], stored, [now]);
    expect(changed).toEqual([
      {
        taskId: "c1",
        position: 1,
        description: "Carry panels as a pair",
        was: "stop",
        now: now.band,
        wasVersion: "2026.12.1",
      },
    ]);
  });

  it("a stored result under the current rules is not listed, nor one the new rules score the same", () => {
    expect(rescoredByCurrentRules([carry], [now], [now])).toEqual([]);
    expect(rescoredByCurrentRules([carry], [{ ...now, rulesVersion: "2026.12.1" }], [now])).toEqual([]);
    expect(now.rulesVersion).toBe(RULES_VERSION);
  });

  it("the same band with a different index is listed", () => {
    const filter = { ...now.results.filter!, index: now.results.filter!.index! + 0.2 };
    const stored = [{ ...now, results: { filter }, rulesVersion: "2026.12.1" }];
    expect(rescoredByCurrentRules([carry], stored, [now])).toHaveLength(1);
  });
});
