/** Builds the production app when there is no build yet, or the sources changed since the last one. */
import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import path from "node:path";

const SOURCE_DIRS = ["app", "assessments", "db", "lib", "fonts", "public"];
const SOURCE_FILES = [
  "next.config.ts",
  "package.json",
  "postcss.config.mjs",
  "instrumentation.ts",
  "proxy.ts",
  "tsconfig.json",
];

function newestSourceTime(root: string): number {
  let newest = 0;
  const visit = (p: string) => {
    const s = statSync(p);
    if (s.isDirectory()) for (const entry of readdirSync(p)) visit(path.join(p, entry));
    else newest = Math.max(newest, s.mtimeMs);
  };
  for (const d of SOURCE_DIRS) if (existsSync(path.join(root, d))) visit(path.join(root, d));
  for (const f of SOURCE_FILES) if (existsSync(path.join(root, f))) visit(path.join(root, f));
  return newest;
}

/**
 * Node.js flags for the production server (`npm start`, which spells them out in package.json, the
 * demo and bench:api). A young generation of 64 MB a half-space, V8's default being 16: a page drawn
 * under load makes a few hundred kB of short-lived objects, and with 50 requests in flight the
 * default promoted much of it to the old generation, to be swept by slower full collections. Heftwise
 * policy, from bench:api (the assessments page's p95 about 40 % lower); it costs at most about 150 MB.
 */
export const SERVER_NODE_FLAGS = ["--max-semi-space-size=64"];

/** `force: false` accepts any existing build (the browser tests build once, then start twice). */
export function buildIfNeeded(env: NodeJS.ProcessEnv, { force = true, root = process.cwd() } = {}) {
  const buildId = path.join(root, ".next", "BUILD_ID");
  if (existsSync(buildId) && (!force || statSync(buildId).mtimeMs >= newestSourceTime(root))) return;
  console.log("Building Heftwise (first run, or the sources changed)…");
  const result = spawnSync(
    process.execPath,
    [path.join(root, "node_modules", "next", "dist", "bin", "next"), "build"],
    { stdio: "inherit", env },
  );
  if (result.status !== 0) {
    console.error("The build failed; see above.");
    process.exit(result.status ?? 1);
  }
}
