/**
 * `npm run bench:api [-- --assessments 10000 --duration 5 --rounds 3 --connections 50 --database-url URL]`:
 * the production build on a scale dataset (`npm run seed:scale`), loaded by autocannon at 50
 * concurrent connections, endpoint by endpoint: p50/p95/p99 latency, requests a second, errors, and
 * the server's memory over the run. Every endpoint is loaded in each of several rounds, one after
 * another, and each figure is the median of the rounds: a burst of work elsewhere on the machine
 * spoils one round of one endpoint, not the comparison between endpoints. Beside them, two floors of the same build: a minimal route
 * handler (the framework's own cost) and a signed-in request that reads no table (ours).
 *
 * Targets (issue "Scale and speed"): every list and search within 2× the signed-in floor's p95; the
 * signed-in floor at least two thirds of the minimal handler's throughput; pages within 2× the
 * framework's own small page; no errors; memory flat (a second run of every endpoint grows the
 * server by at most 10 %, or 32 MB). Prints each target met or not, and exits 1 if one is not.
 */
import autocannon from "autocannon";
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { parseArgs } from "node:util";
import { buildIfNeeded, SERVER_NODE_FLAGS } from "@/assessments/cli/build";
import { signInCookie } from "./sign-in";

const { values: args } = parseArgs({
  options: {
    assessments: { type: "string", default: "10000" },
    duration: { type: "string", default: "5" },
    rounds: { type: "string", default: "3" },
    connections: { type: "string", default: "50" },
    "database-url": { type: "string", default: process.env.DATABASE_URL },
    port: { type: "string", default: "3390" },
  },
});
const root = process.cwd();
const port = Number(args.port);
const origin = `http://127.0.0.1:${port}`;
const duration = Number(args.duration);
const rounds = Number(args.rounds);
const connections = Number(args.connections);
const databaseUrl = args["database-url"];
const dataDir = path.join(root, ".bench-data", `scale-${args.assessments}`);
const where = databaseUrl
  ? `PostgreSQL server (${new URL(databaseUrl).host})`
  : `embedded database (${path.relative(root, dataDir)})`;

const env: NodeJS.ProcessEnv = {
  ...process.env,
  NODE_ENV: "production",
  NEXT_TELEMETRY_DISABLED: "1",
  NEXT_MANUAL_SIG_HANDLE: "1",
  NEXTAUTH_URL: origin,
  NEXTAUTH_SECRET: "bench-only-secret-bench-only-secret-0000",
  // Nothing in these requests sends mail; production configuration requires an address all the same.
  SMTP_URL: "smtp://127.0.0.1:9",
  PORT: String(port),
  HOSTNAME: "127.0.0.1",
  ...(databaseUrl ? { DATABASE_URL: databaseUrl } : { HEFTWISE_DATA_DIR: dataDir }),
};
if (!databaseUrl) delete env.DATABASE_URL;

function seed() {
  if (!databaseUrl && existsSync(path.join(dataDir, "pglite"))) return;
  console.log(`Seeding ${args.assessments} assessments into the ${where}…`);
  const result = spawnSync(
    process.execPath,
    [
      // The domain is marked server-only; outside Next.js, the condition says where it runs.
      "--conditions=react-server",
      "--import",
      "tsx",
      "assessments/cli/seed-scale.ts",
      "--assessments",
      args.assessments!,
      ...(databaseUrl ? [] : ["--data-dir", dataDir]),
    ],
    { stdio: "inherit", env: { ...env, NODE_ENV: "development" } },
  );
  if (result.status !== 0) process.exit(result.status ?? 1);
}

let serverErr = "";

function startServer(): Promise<ChildProcess> {
  // --expose-gc and the probe: the bench can ask for a full collection and read what is still held.
  const server = spawn(
    process.execPath,
    ["--expose-gc", ...SERVER_NODE_FLAGS, "--import", "./tests/bench/memory-probe.mjs", "--import", "tsx", "server.ts"],
    { env, stdio: ["ignore", "pipe", "pipe"] },
  );
  server.stderr!.on("data", (chunk: Buffer) => {
    const text = chunk.toString();
    serverErr += text;
    // Requests autocannon cuts off at the end of each run are reported by Next.js as "aborted": expected.
    const lines = text
      .split("\n")
      .filter((l) => l.trim() && !l.startsWith("HEFTWISE-MEMORY"))
      .filter((l) => !/aborted|ECONNRESET|ignore-listed frames|^\s*[{}]\s*$|^\s*code: '/.test(l));
    if (lines.length) process.stderr.write(lines.join("\n") + "\n");
  });
  return new Promise((resolve, reject) => {
    server.stdout!.on("data", (chunk: Buffer) => chunk.toString().includes("Ready") && resolve(server));
    server.on("exit", (code) => reject(new Error(`the server stopped (exit ${code})`)));
  });
}

/** After a full garbage collection: the JavaScript heap and the memory outside it (the database's), in MB. */
async function heldMemory(server: ChildProcess): Promise<{ heap: number; external: number }> {
  const before = serverErr.length;
  server.kill("SIGUSR2");
  for (let i = 0; i < 100; i++) {
    const line = /HEFTWISE-MEMORY (\{.*\})/.exec(serverErr.slice(before));
    if (line) {
      const m = JSON.parse(line[1]) as { heapUsed: number; external: number };
      return { heap: m.heapUsed / 1048576, external: m.external / 1048576 };
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error("the server did not report its memory");
}

/** Resident memory of the server process, in MB (Linux). */
const rssMb = (pid: number) =>
  Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, "utf8"))?.[1] ?? 0) / 1024;

interface Endpoint {
  name: string;
  kind: "floor" | "list" | "page" | "write";
  path: string;
  method?: "GET" | "POST" | "PUT";
  body?: string;
  signedIn: boolean;
  /** Per connection: the request to send next (for writes that carry a version). */
  perConnection?: () => autocannon.Request;
  /** Run before each load of this endpoint (outside the measured time). */
  prepare?: () => Promise<void>;
}

interface Result {
  name: string;
  kind: Endpoint["kind"];
  p50: number;
  p95: number;
  p99: number;
  rps: number;
  errors: number;
  requests: number;
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? NaN;

async function load(endpoint: Endpoint, cookie: string, seconds: number): Promise<Result> {
  await endpoint.prepare?.();
  const latencies: number[] = [];
  let errors = 0;
  const refused = new Map<number, number>();
  const summary = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: `${origin}${endpoint.path}`,
        connections,
        duration: seconds,
        method: endpoint.method ?? "GET",
        headers: {
          ...(endpoint.signedIn ? { cookie } : {}),
          ...(endpoint.method && endpoint.method !== "GET" ? { "content-type": "application/json" } : {}),
        },
        body: endpoint.body,
        requests: endpoint.perConnection ? [endpoint.perConnection()] : undefined,
        timeout: 10,
      },
      (err, result) => (err ? reject(err) : resolve(result)),
    );
    instance.on("response", (_client, status, _bytes, ms) => {
      latencies.push(ms);
      if (status >= 400) {
        errors++;
        refused.set(status, (refused.get(status) ?? 0) + 1);
      }
    });
  });
  if (refused.size)
    console.log(
      `  ${endpoint.name}: answered ${[...refused].map(([status, n]) => `${n} × HTTP ${status}`).join(", ")}`,
    );
  const sorted = latencies.sort((a, b) => a - b);
  return {
    name: endpoint.name,
    kind: endpoint.kind,
    p50: percentile(sorted, 50),
    p95: percentile(sorted, 95),
    p99: percentile(sorted, 99),
    rps: latencies.length / seconds,
    errors: errors + summary.errors + summary.timeouts,
    requests: latencies.length,
  };
}

async function main() {
  seed();
  buildIfNeeded(env);
  const server = await startServer();
  const memory: number[] = [];
  const sampler = setInterval(() => memory.push(rssMb(server.pid!)), 500);
  try {
    const cookie = await signInCookie(origin, "adviser@brackenfold.example");
    const get = async <T>(p: string) => (await (await fetch(`${origin}${p}`, { headers: { cookie } })).json()) as T;
    // Drafts to save: two a connection (autocannon prepares a connection's next request before it
    // reports the last one's answer), and one more for the wizard's page.
    const drafts: { revisionId: string }[] = [];
    for (let cursor = ""; drafts.length < 2 * connections + 1;) {
      const page = await get<{ items: { revisionId: string }[]; nextCursor: string | null }>(
        `/api/v1/assessments?status=draft&limit=100${cursor ? `&cursor=${cursor}` : ""}`,
      );
      drafts.push(...page.items);
      if (!page.nextCursor) break;
      cursor = page.nextCursor;
    }
    if (drafts.length < 2 * connections + 1)
      throw new Error(`the dataset has ${drafts.length} drafts; the write test needs ${2 * connections + 1}`);

    // Saving a draft: each connection edits a draft of its own, with the version the last save returned.
    const saves = await Promise.all(
      drafts.slice(1, 2 * connections + 1).map(async ({ revisionId }) => {
        const r = await get<{ version: number; content: unknown }>(`/api/v1/revisions/${revisionId}`);
        return { revisionId, version: r.version, content: r.content };
      }),
    );
    // A pool of drafts: each request takes a free one and gives it back with the version its save
    // returned, so that no two saves in flight edit the same draft (a stale version would be 409).
    // Before each run the versions are read again: a save cut off at the end of the last run may
    // have landed without its answer.
    const free = [...saves];
    const refreshDrafts = async () => {
      for (const draft of saves)
        draft.version = (await get<{ version: number }>(`/api/v1/revisions/${draft.revisionId}`)).version;
      free.splice(0, free.length, ...saves);
    };
    const saveRequest = (): autocannon.Request => ({
      method: "PUT",
      setupRequest: (req, context) => {
        const draft = free.shift() ?? saves[0];
        (context as { draft?: (typeof saves)[number] }).draft = draft;
        return {
          ...req,
          path: `/api/v1/revisions/${draft.revisionId}`,
          body: JSON.stringify({ version: draft.version, content: draft.content }),
        };
      },
      onResponse: (status, body, context) => {
        const draft = (context as { draft?: (typeof saves)[number] }).draft;
        if (!draft) return;
        if (status === 200) draft.version = (JSON.parse(body) as { version: number }).version;
        free.push(draft);
      },
    });

    const score = JSON.stringify({
      method: "niosh",
      units: "metric",
      load: 14,
      origin: { h: 30, v: 40, a: 0 },
      destination: { h: 35, v: 110, a: 30 },
      frequency: 1,
      durationHours: 1,
      coupling: "fair",
      controlAtDestination: false,
    });
    const endpoints: Endpoint[] = [
      { name: "floor: minimal route handler", kind: "floor", path: "/api/health", signedIn: false },
      { name: "floor: signed in, reads no table", kind: "floor", path: "/api/v1/me", signedIn: true },
      { name: "floor: the framework's small page (sign-in)", kind: "floor", path: "/sign-in", signedIn: false },
      { name: "assessments list", kind: "list", path: "/api/v1/assessments?limit=20", signedIn: true },
      {
        name: "filtered search",
        kind: "list",
        path: "/api/v1/assessments?limit=20&q=cabinet&status=approved",
        signedIn: true,
      },
      {
        name: "load register, by mass",
        kind: "list",
        path: "/api/v1/components?limit=20&sort=-massKg",
        signedIn: true,
      },
      { name: "overview page", kind: "page", path: "/", signedIn: true },
      { name: "assessments page", kind: "page", path: "/assessments", signedIn: true },
      { name: "revision page (wizard)", kind: "page", path: `/revisions/${drafts[0].revisionId}`, signedIn: true },
      {
        name: "save a draft",
        kind: "write",
        path: "/api/v1/revisions",
        method: "PUT",
        signedIn: true,
        perConnection: saveRequest,
        prepare: refreshDrafts,
      },
      { name: "score a lift", kind: "write", path: "/api/v1/score", method: "POST", body: score, signedIn: true },
    ];

    console.log(
      `\nHeftwise bench:api — ${args.assessments} assessments on the ${where}; ${connections} connections; ${rounds} rounds of ${duration} s an endpoint (after 2 s of warming); the median round of each\n`,
    );
    // Warm every route once under load, so that the first measured one does not pay for compiling.
    for (const e of endpoints) await load(e, cookie, 2);
    const memoryStart = await heldMemory(server);
    const byRound: Result[][] = endpoints.map(() => []);
    for (let round = 0; round < rounds; round++)
      for (const [i, e] of endpoints.entries()) byRound[i].push(await load(e, cookie, duration));
    const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
    const results: Result[] = byRound.map((runs) => ({
      name: runs[0].name,
      kind: runs[0].kind,
      p50: median(runs.map((r) => r.p50)),
      p95: median(runs.map((r) => r.p95)),
      p99: median(runs.map((r) => r.p99)),
      rps: median(runs.map((r) => r.rps)),
      errors: runs.reduce((n, r) => n + r.errors, 0),
      requests: runs.reduce((n, r) => n + r.requests, 0),
    }));
    for (const [i, r] of results.entries()) {
      const p95s = byRound[i].map((run) => run.p95);
      console.log(
        `${r.name.padEnd(44)} p50 ${r.p50.toFixed(0).padStart(5)} ms  p95 ${r.p95.toFixed(0).padStart(5)} ms (rounds ${Math.min(...p95s).toFixed(0)}–${Math.max(...p95s).toFixed(0)})  p99 ${r.p99.toFixed(0).padStart(5)} ms  ${r.rps.toFixed(0).padStart(5)} req/s  ${r.errors} errors`,
      );
    }
    console.log(
      `Server resident memory over the rounds: ${Math.min(...memory).toFixed(0)}–${Math.max(...memory).toFixed(0)} MB`,
    );
    // Memory: the same run again. A leak grows with every request; a heap that has found its size
    // does not. Compared after a full collection, so that garbage not yet collected is not counted.
    const afterFirst = await heldMemory(server);
    for (const e of endpoints) await load(e, cookie, duration);
    const afterSecond = await heldMemory(server);
    const held = (m: { heap: number; external: number }) => m.heap + m.external;

    const byName = (n: string) => results.find((r) => r.name === n)!;
    const minimal = byName("floor: minimal route handler");
    const signedFloor = byName("floor: signed in, reads no table");
    const smallPage = byName("floor: the framework's small page (sign-in)");
    const checks: [string, boolean][] = [
      [
        `signed-in floor at least 2/3 of the minimal handler's throughput (${signedFloor.rps.toFixed(0)} vs ${minimal.rps.toFixed(0)} req/s)`,
        signedFloor.rps >= (2 / 3) * minimal.rps,
      ],
      ...results
        .filter((r) => r.kind === "list")
        .map((r): [string, boolean] => [
          `${r.name}: p95 within 2× the signed-in floor's (${r.p95.toFixed(0)} ≤ ${(2 * signedFloor.p95).toFixed(0)} ms)`,
          r.p95 <= 2 * signedFloor.p95,
        ]),
      ...results
        .filter((r) => r.kind === "page")
        .map((r): [string, boolean] => [
          `${r.name}: p95 within 2× the framework's small page (${r.p95.toFixed(0)} ≤ ${(2 * smallPage.p95).toFixed(0)} ms)`,
          r.p95 <= 2 * smallPage.p95,
        ]),
      [
        `no errors (${results.reduce((n, r) => n + r.errors, 0)} in ${results.reduce((n, r) => n + r.requests, 0)} requests)`,
        results.every((r) => r.errors === 0),
      ],
      [
        `memory flat: what the server holds after a full collection grows by at most 10 % (or 32 MB) over a second run of every endpoint (JavaScript heap ${memoryStart.heap.toFixed(0)} → ${afterFirst.heap.toFixed(0)} → ${afterSecond.heap.toFixed(0)} MB, outside it ${memoryStart.external.toFixed(0)} → ${afterFirst.external.toFixed(0)} → ${afterSecond.external.toFixed(0)} MB, after warming → the run → the second run; resident peak ${Math.max(...memory).toFixed(0)} MB)`,
        // 10 %, or 32 MB for the database driver's buffers, which come and go with the last request.
        held(afterSecond) <= Math.max(1.1 * held(afterFirst), held(afterFirst) + 32),
      ],
    ];
    console.log("\nTargets");
    for (const [text, met] of checks) console.log(`  ${met ? "met    " : "NOT MET"}  ${text}`);
    console.log(
      `\nFor the record, pages against the signed-in floor: ${results
        .filter((r) => r.kind === "page")
        .map((r) => `${r.name} ${(r.p95 / signedFloor.p95).toFixed(1)}×`)
        .join(", ")} its p95.`,
    );
    process.exitCode = checks.every(([, met]) => met) ? 0 : 1;
  } finally {
    clearInterval(sampler);
    server.kill("SIGTERM");
  }
}

main().catch((err) => {
  console.error(`bench:api failed: ${(err as Error).message}`);
  process.exit(1);
});
