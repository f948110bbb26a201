/**
 * `npm run demo`: builds the app if needed, migrates and seeds the invented demo scenario on the
 * embedded database, starts the local mail fake, then serves the app on http://localhost:3000.
 *
 * Options (also used by the browser tests): --port N, --smtp-port N, --inbox-port N,
 * --data-dir DIR, --fresh (delete DIR first), --no-build-check, --no-reminders (the hourly reminder job
 * otherwise runs inside the server).
 */
import { spawn } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { parseArgs } from "node:util";
import { buildIfNeeded, SERVER_NODE_FLAGS } from "./build";

const root = process.cwd();
const { values: args } = parseArgs({
  options: {
    port: { type: "string", default: "3000" },
    "smtp-port": { type: "string", default: "2525" },
    "inbox-port": { type: "string", default: "1080" },
    "data-dir": { type: "string", default: process.env.HEFTWISE_DATA_DIR || "./data" },
    fresh: { type: "boolean", default: false },
    "no-build-check": { type: "boolean", default: false },
    // The browser tests read the inbox and must not find reminders in it they did not cause.
    "no-reminders": { type: "boolean", default: false },
  },
});

const port = Number(args.port);
const dataDir = path.resolve(args["data-dir"]!);
const origin = `http://localhost:${port}`;

function demoSecret(): string {
  // Kept beside the data so that sessions survive a restart of the demo.
  const file = path.join(dataDir, "demo-secret");
  if (existsSync(file)) return readFileSync(file, "utf8").trim();
  const secret = randomBytes(32).toString("base64url");
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

async function main() {
  if (args.fresh) rmSync(dataDir, { recursive: true, force: true });
  mkdirSync(dataDir, { recursive: true });

  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    NEXT_MANUAL_SIG_HANDLE: "1",
    HEFTWISE_DATA_DIR: dataDir,
    SMTP_URL: `smtp://127.0.0.1:${args["smtp-port"]}`,
    NEXTAUTH_URL: origin,
    NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET || demoSecret(),
    // Reminders are sent by the server itself, hourly (the demo has no system scheduler).
    ...(args["no-reminders"] ? {} : { HEFTWISE_REMINDERS: "in-process" }),
  };
  // The seed below runs in this process: it must see the server's configuration (the signing key's
  // passphrase is derived from NEXTAUTH_SECRET).
  Object.assign(process.env, {
    HEFTWISE_DATA_DIR: dataDir,
    NEXTAUTH_URL: origin,
    NEXTAUTH_SECRET: env.NEXTAUTH_SECRET,
    SMTP_URL: env.SMTP_URL,
  });

  buildIfNeeded(env, { force: !args["no-build-check"] });

  // Migrate and seed in this process, then close: the server opens the data directory next,
  // and two processes must never hold it at once.
  const { getDb, closeDb } = await import("@/db/client");
  const { seedDemo } = await import("@/assessments/demo/seed");
  const seeded = await seedDemo(await getDb());
  await closeDb();

  const { startMailFake } = await import("@/lib/mail/fake-server");
  const fake = await startMailFake({ smtpPort: Number(args["smtp-port"]), httpPort: Number(args["inbox-port"]) });

  // The production server (server.ts): Next.js behind a server that cleans forwarded addresses.
  const server = spawn(process.execPath, [...SERVER_NODE_FLAGS, "--import", "tsx", path.join(root, "server.ts")], {
    stdio: ["ignore", "pipe", "inherit"],
    env: { ...env, PORT: String(port), HOSTNAME: "127.0.0.1" },
  });
  server.stdout.on("data", (chunk: Buffer) => {
    process.stdout.write(chunk);
    if (chunk.toString().includes("Ready")) printWelcome(seeded.created);
  });

  let stopping = false;
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    server.kill(signal === "SIGINT" ? "SIGTERM" : signal);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  server.on("exit", async (code) => {
    await fake.close();
    process.exit(stopping ? 0 : (code ?? 1));
  });
}

function printWelcome(created: boolean) {
  void import("@/assessments/demo/scenario").then(({ DEMO_USERS, DEMO_PASSWORD, DEMO_ORGANISATION }) => {
    const lines = [
      "",
      `Heftwise demo is running: ${origin}`,
      `Organisation: ${DEMO_ORGANISATION} (invented)${created ? " — seeded just now" : ""}`,
      `Sign in as (password for all: ${DEMO_PASSWORD}):`,
      ...DEMO_USERS.map((u) => `  ${u.role.padEnd(9)} ${u.email}`),
      `Mail sent by the app lands in the local fake: http://127.0.0.1:${args["inbox-port"]}`,
      "Stop with Ctrl+C.",
      "",
    ];
    console.log(lines.join("\n"));
  });
}

main().catch((err) => {
  console.error(`The demo could not start: ${(err as Error).message}`);
  process.exit(1);
});
