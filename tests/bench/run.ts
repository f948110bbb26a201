/**
 * Runs a benchmark the way the code runs in production: bundled by esbuild (as
 * Next bundles the engine for the browser), then executed by plain Node.js on one thread.
 * Usage: tsx tests/bench/run.ts tests/bench/rules.bench.ts
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { build } from "esbuild";

const entry = process.argv[2];
if (!entry) {
  console.error("usage: tsx tests/bench/run.ts BENCH_FILE");
  process.exit(2);
}
const outfile = path.join(mkdtempSync(path.join(tmpdir(), "heftwise-bench-")), "bench.mjs");
await build({
  entryPoints: [entry],
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  outfile,
  alias: { "@": process.cwd() },
  logLevel: "error",
});
const result = spawnSync(process.execPath, [outfile], { stdio: "inherit" });
process.exit(result.status ?? 1);
