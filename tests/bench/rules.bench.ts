/**
 * `npm run bench:rules`: single-task scorings per second and 10-task composite jobs per second, on
 * one core (targets: at least 1 000 000 and 50 000 per second); and the time to score a wizard task
 * with its what-if, every candidate change re-scored (target: under 2 ms a task).
 */
import { score } from "@/assessments/rules";
import type { ScoreRequest } from "@/assessments/rules/request";
import { scoreTask, type RegisterEntry } from "@/assessments/method-statement/score-task";
import { TEMPLATES } from "@/assessments/method-statement/templates";
import type { Task } from "@/assessments/method-statement/content";

const single: ScoreRequest[] = Array.from({ length: 64 }, (_, i) => ({
  method: "niosh",
  units: "metric",
  load: 5 + (i % 20),
  origin: { h: 25 + (i % 30), v: 20 + (i % 100), a: (i * 7) % 90 },
  destination: { h: 30, v: 120, a: 0 },
  frequency: (i % 12) / 2,
  durationHours: 1 + (i % 6),
  coupling: (["good", "fair", "poor"] as const)[i % 3],
  controlAtDestination: i % 2 === 0,
}));

const composite: ScoreRequest[] = Array.from({ length: 16 }, (_, j) => ({
  method: "niosh-composite",
  units: "metric",
  durationHours: 1 + (j % 3),
  tasks: Array.from({ length: 10 }, (_, i) => ({
    id: `task-${i}`,
    load: 4 + ((i + j) % 15),
    origin: { h: 25 + i * 2, v: 30 + i * 5, a: i * 5 },
    destination: { h: 30, v: 100, a: 0 },
    frequency: 0.2 + (i % 4) * 0.2,
    coupling: "good" as const,
    controlAtDestination: i % 3 === 0,
  })),
}));

/** Scorings per second: the median of `rounds` one-second rounds, after a warm-up. */
function measure(name: string, requests: ScoreRequest[], rounds: number, target: number): boolean {
  let sink = 0;
  for (let i = 0; i < 50_000; i++) sink += score(requests[i % requests.length]).reasons.length;
  const rates: number[] = [];
  for (let r = 0; r < rounds; r++) {
    let n = 0;
    const start = process.hrtime.bigint();
    while (process.hrtime.bigint() - start < 1_000_000_000n) {
      for (let i = 0; i < 1000; i++) sink += score(requests[(n + i) % requests.length]).reasons.length;
      n += 1000;
    }
    rates.push(n / (Number(process.hrtime.bigint() - start) / 1e9));
  }
  rates.sort((x, y) => x - y);
  const median = rates[Math.floor(rates.length / 2)];
  const ok = median >= target;
  const f = (x: number) => Math.round(x).toLocaleString("en-GB");
  console.log(
    `${name.padEnd(28)} median ${f(median).padStart(10)} /s  (range ${f(rates[0])}–${f(rates[rates.length - 1])})  target ${f(target)} /s  ${ok ? "met" : "MISSED"}`,
  );
  if (sink === 0) console.log("(no work was done)");
  return ok;
}

/**
 * Wizard tasks with their what-if: every task of every template, each with a heavier part so that
 * the solver has work to do, plus hard cases (a lift outside the equation's range, a long carry).
 */
function whatIfTasks(): [Task, RegisterEntry][] {
  const part = (massKg: number): RegisterEntry => ({
    id: "00000000-0000-4000-8000-000000000001",
    name: "Part",
    massKg,
    grip: "fair",
    massSource: "datasheet",
  });
  const out: [Task, RegisterEntry][] = [];
  for (const template of TEMPLATES)
    for (const task of template.build(() => part(1).id).tasks)
      for (const kg of [12, 30, 60, 700]) out.push([task, part(kg)]);
  const reach = {
    origin: { h: 70, v: -20, a: 140 },
    destination: { h: 40, v: 120, a: 0 },
    frequency: 9,
    durationHours: 4,
    coupling: "poor" as const,
    controlAtDestination: true,
  };
  out.push([
    {
      id: "x",
      description: "",
      componentId: part(1).id,
      quantity: 3,
      operation: "lift",
      niosh: reach,
      filter: {
        sex: "female",
        zone: "below-standing-level",
        reach: "extended",
        frequency: 9,
        twistDeg: 140,
        teamSize: 1,
      },
    },
    part(20),
  ]);
  return out;
}

function measureWhatIf(target: number): boolean {
  const tasks = whatIfTasks();
  let sink = 0;
  for (let i = 0; i < 200; i++) sink += scoreTask(...tasks[i % tasks.length]).whatIf?.suggestions.length ?? 0;
  const perTask: number[] = [];
  let worst = 0;
  for (let r = 0; r < 5; r++) {
    const start = process.hrtime.bigint();
    for (const t of tasks) {
      const one = process.hrtime.bigint();
      sink += scoreTask(...t).whatIf?.suggestions.length ?? 0;
      worst = Math.max(worst, Number(process.hrtime.bigint() - one) / 1e6);
    }
    perTask.push(Number(process.hrtime.bigint() - start) / 1e6 / tasks.length);
  }
  perTask.sort((x, y) => x - y);
  const median = perTask[Math.floor(perTask.length / 2)];
  const ok = median < target;
  console.log(
    `${"task with what-if".padEnd(28)} median ${median.toFixed(3).padStart(10)} ms a task  (slowest single task ${worst.toFixed(2)} ms; ${tasks.length} tasks)  target < ${target} ms  ${ok ? "met" : "MISSED"}`,
  );
  if (sink === 0) console.log("(no work was done)");
  return ok;
}

console.log(`Rules engine on one core, Node ${process.version}`);
const a = measure("single-task scorings", single, 5, 1_000_000);
const b = measure("composite jobs (10 tasks)", composite, 5, 50_000);
const c = measureWhatIf(2);
process.exitCode = a && b && c ? 0 : 1;
