/**
 * `npm run bench:rules`: single-task scorings per second and 10-task composite jobs per second, on
 * one core. Targets: at least 1 000 000 and 50 000 per second.
 */
import { score } from "@/assessments/rules";
import type { ScoreRequest } from "@/assessments/rules/request";

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

console.log(`Rules engine on one core, Node ${process.version}`);
const a = measure("single-task scorings", single, 5, 1_000_000);
const b = measure("composite jobs (10 tasks)", composite, 5, 50_000);
process.exitCode = a && b ? 0 : 1;
