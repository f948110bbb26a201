/**
 * The authorization matrix, generated from the route files themselves: every handler under
 * app/api, every method it exports, called anonymously, as each role, and as another
 * organisation's user with a real record of this one. The permission a method needs is read from
 * its `requireApiActor("…")` call; a method that names none must be on the documented list below,
 * so a new route cannot slip past. Refused calls change nothing.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { count } from "drizzle-orm";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import {
  assessments,
  auditEvents,
  briefings,
  components,
  hazardLibrary,
  jobs,
  revisions,
  userSessions,
  users,
} from "@/db/schema";
import { PERMISSIONS, type Action, type Actor } from "@/lib/permissions";
import type { Role } from "@/db/schema";
import { actorFor, demoOrganisation, otherOrganisation } from "./helpers";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/auth/session", () => ({ getActor: async () => session.actor, requireActor: async () => session.actor }));

/** Routes that name no permission on purpose, and what they answer instead. */
const SELF_CHECKED: Record<string, string> = {
  "app/api/auth/[...nextauth]/route.ts": "next-auth's own sign-in, sign-out and CSRF endpoints",
  "app/api/verify/route.ts":
    "public: anyone holding a pack may check it; names only revisions Heftwise issued a pack of",
  "app/api/v1/openapi.json/route.ts": "public: the API's description",
  "app/api/health/route.ts": "public: liveness only, reads nothing and names nothing",
  "app/api/v1/revisions/[id]/pack/route.ts":
    "signed-in callers; getPackFile applies the per-revision rule (author's organisation, named approver, assigned foreman)",
};

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
interface Entry {
  file: string;
  method: (typeof METHODS)[number];
  action: Action | null;
}

function routeFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) =>
    d.isDirectory() ? routeFiles(path.join(dir, d.name)) : d.name === "route.ts" ? [path.join(dir, d.name)] : [],
  );
}

/** Each exported method of each route file, with the permission its own code names. */
function entries(): Entry[] {
  const out: Entry[] = [];
  for (const file of routeFiles("app/api").map((f) => f.split(path.sep).join("/"))) {
    const source = readFileSync(file, "utf8");
    for (const method of METHODS) {
      // `export { handler as GET }` re-exports a handler that names no permission of its own.
      if (new RegExp(`export \\{[^}]*\\bas ${method}\\b`).test(source)) {
        out.push({ file, method, action: null });
        continue;
      }
      const at = source.search(new RegExp(`export (const|async function|function) ${method}\\b`));
      if (at < 0) continue;
      const next = METHODS.map((m) =>
        source.slice(at + 1).search(new RegExp(`export (const|async function|function) ${m}\\b`)),
      ).filter((i) => i >= 0);
      const body = source.slice(at, next.length ? at + 1 + Math.min(...next) : undefined);
      const action = body.match(/requireApiActor\("([a-z-]+:[a-z-]+)"\)/)?.[1] as Action | undefined;
      out.push({ file, method, action: action ?? null });
    }
  }
  return out;
}

const ENTRIES = entries();
const ROLES: Role[] = ["admin", "adviser", "approver", "foreman"];
const actors = {} as Record<Role, Actor>;
let stranger: Actor;
const realIds: Record<string, string> = {};

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  for (const role of ROLES) actors[role] = await actorFor(role, organisationId);
  stranger = (await otherOrganisation()).admin;
  const db = await getDb();
  realIds.components = (await db.select({ id: components.id }).from(components).limit(1))[0].id;
  realIds.jobs = (await db.select({ id: jobs.id }).from(jobs).limit(1))[0].id;
  realIds.revisions = (await db.select({ id: revisions.id }).from(revisions).limit(1))[0].id;
});

/** Params for a route's dynamic segments: this organisation's real record where the segment names a table. */
function paramsFor(file: string): Record<string, string> {
  const params: Record<string, string> = {};
  const parts = file.split("/");
  parts.forEach((p, i) => {
    const m = p.match(/^\[(\w+)\]$/);
    if (m) params[m[1]] = m[1] === "taskId" ? "t-1" : (realIds[parts[i - 1]] ?? "5d1c0f7e-2b8a-4c61-9d3e-7a0b1c2d3e4f");
  });
  return params;
}

function request(file: string, method: string): Request {
  const url = `http://localhost/${file.replace(/^app\//, "").replace(/\/route\.ts$/, "")}`;
  if (method === "GET" || method === "DELETE")
    return new Request(url, {
      method,
      ...(method === "DELETE" ? { headers: { "content-type": "application/json" }, body: "{}" } : {}),
    });
  if (file.includes("components/import"))
    return new Request(url, {
      method,
      headers: { "content-type": "text/csv" },
      body: "name,mass_kg,grip,mass_source\n",
    });
  if (/attachments\/route|site-changes|verify/.test(file)) return new Request(url, { method, body: new FormData() });
  return new Request(url, { method, headers: { "content-type": "application/json" }, body: "{}" });
}

async function call(entry: Entry, actor: Actor | null): Promise<number> {
  session.actor = actor;
  const mod = (await import(`@/${entry.file.replace(/\.ts$/, "")}`)) as Record<
    string,
    (r: Request, c: { params: Promise<Record<string, string>> }) => Promise<Response>
  >;
  const res = await mod[entry.method](request(entry.file, entry.method), {
    params: Promise.resolve(paramsFor(entry.file)),
  });
  return res.status;
}

async function tableCounts() {
  const db = await getDb();
  const tables = {
    jobs,
    components,
    assessments,
    revisions,
    briefings,
    hazardLibrary,
    auditEvents,
    users,
    userSessions,
  };
  return Object.fromEntries(
    await Promise.all(
      Object.entries(tables).map(async ([name, t]) => [name, (await db.select({ n: count() }).from(t))[0].n]),
    ),
  );
}

describe("the authorization matrix, from the route files", () => {
  it("finds the routes, and every method either names its permission or is on the documented list", () => {
    expect(ENTRIES.length).toBeGreaterThan(25);
    const unnamed = ENTRIES.filter((e) => !e.action && !SELF_CHECKED[e.file]).map((e) => `${e.method} ${e.file}`);
    expect(
      unnamed,
      "these handlers name no permission: add requireApiActor(…) or document them in SELF_CHECKED",
    ).toEqual([]);
    for (const file of Object.keys(SELF_CHECKED))
      expect(
        ENTRIES.some((e) => e.file === file),
        `${file} no longer exists`,
      ).toBe(true);
  });

  it("anonymous, refused roles and another organisation are answered 401, 403 and 404 — and nothing changes", async () => {
    const before = await tableCounts();
    const wrong: string[] = [];
    for (const entry of ENTRIES.filter((e) => e.action)) {
      const anonymous = await call(entry, null);
      if (anonymous !== 401) wrong.push(`${entry.method} ${entry.file} anonymous → ${anonymous}`);
      for (const role of ROLES) {
        if (PERMISSIONS[role].includes(entry.action!)) continue;
        const status = await call(entry, actors[role]);
        if (status !== 403) wrong.push(`${entry.method} ${entry.file} as ${role} → ${status}, expected 403`);
      }
      // Another organisation's user whose role is allowed: this organisation's record is "not found".
      if (
        Object.keys(paramsFor(entry.file)).some((p) => p === "id") &&
        PERMISSIONS.admin.includes(entry.action!) &&
        /\/(components|jobs|revisions)\/\[id\]/.test(entry.file)
      ) {
        const status = await call(entry, stranger);
        if (status !== 404)
          wrong.push(`${entry.method} ${entry.file} from another organisation → ${status}, expected 404`);
      }
    }
    for (const entry of ENTRIES.filter((e) => e.file.endsWith("revisions/[id]/pack/route.ts"))) {
      if ((await call(entry, null)) !== 401) wrong.push(`${entry.method} ${entry.file} anonymous`);
      if ((await call(entry, stranger)) !== 404) wrong.push(`${entry.method} ${entry.file} from another organisation`);
    }
    expect(wrong).toEqual([]);
    expect(await tableCounts()).toEqual(before);
  });

  it("allowed roles get past authorization (whatever their dummy body then earns), never a 500", async () => {
    const wrong: string[] = [];
    for (const entry of ENTRIES.filter((e) => e.action)) {
      for (const role of ROLES.filter((r) => PERMISSIONS[r].includes(entry.action!))) {
        const status = await call(entry, actors[role]);
        if (status === 401 || status === 403 || status >= 500)
          wrong.push(`${entry.method} ${entry.file} as ${role} → ${status}`);
      }
    }
    expect(wrong).toEqual([]);
  });
});
