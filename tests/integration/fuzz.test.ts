/**
 * Fuzzing every body the API takes — JSON, CSV and multipart — as a role allowed to call it, with
 * this organisation's real records: arbitrary JSON, NUL and broken characters, huge and
 * non-finite numbers, deep nesting, chunked bodies. Every answer is a 4xx (or a success for input
 * that happens to be valid), never a 500, and a refused call writes nothing.
 */
import fc from "fast-check";
import { count } from "drizzle-orm";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import {
  assessments,
  auditEvents,
  briefingAttendees,
  briefings,
  components,
  hazardLibrary,
  jobs,
  revisions,
} from "@/db/schema";
import type { Actor } from "@/lib/permissions";
import type { Role } from "@/db/schema";
import { actorFor, demoOrganisation } from "./helpers";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/auth/session", () => ({ getActor: async () => session.actor }));

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
interface Target {
  name: string;
  role: Role;
  load: () => Promise<Handler>;
  method: string;
  params?: () => Record<string, string>;
}

const ids: Record<string, string> = {};
const routes: Target[] = [
  {
    name: "POST /score",
    role: "foreman",
    method: "POST",
    load: async () => (await import("@/app/api/v1/score/route")).POST as Handler,
  },
  {
    name: "POST /jobs",
    role: "adviser",
    method: "POST",
    load: async () => (await import("@/app/api/v1/jobs/route")).POST as Handler,
  },
  {
    name: "PUT /jobs/{id}",
    role: "adviser",
    method: "PUT",
    load: async () => (await import("@/app/api/v1/jobs/[id]/route")).PUT as Handler,
    params: () => ({ id: ids.job }),
  },
  {
    name: "PUT /jobs/{id}/foremen",
    role: "admin",
    method: "PUT",
    load: async () => (await import("@/app/api/v1/jobs/[id]/foremen/route")).PUT as Handler,
    params: () => ({ id: ids.job }),
  },
  {
    name: "POST /components",
    role: "adviser",
    method: "POST",
    load: async () => (await import("@/app/api/v1/components/route")).POST as Handler,
  },
  {
    name: "PUT /components/{id}",
    role: "adviser",
    method: "PUT",
    load: async () => (await import("@/app/api/v1/components/[id]/route")).PUT as Handler,
    params: () => ({ id: ids.component }),
  },
  {
    name: "POST /assessments",
    role: "adviser",
    method: "POST",
    load: async () => (await import("@/app/api/v1/assessments/route")).POST as Handler,
  },
  {
    name: "PUT /revisions/{id}",
    role: "adviser",
    method: "PUT",
    load: async () => (await import("@/app/api/v1/revisions/[id]/route")).PUT as Handler,
    params: () => ({ id: ids.draft }),
  },
  {
    name: "POST /revisions/{id}/tasks",
    role: "adviser",
    method: "POST",
    load: async () => (await import("@/app/api/v1/revisions/[id]/tasks/route")).POST as Handler,
    params: () => ({ id: ids.draft }),
  },
  {
    name: "POST /revisions/{id}/submit",
    role: "adviser",
    method: "POST",
    load: async () => (await import("@/app/api/v1/revisions/[id]/submit/route")).POST as Handler,
    params: () => ({ id: ids.draft }),
  },
  {
    name: "POST /briefings",
    role: "foreman",
    method: "POST",
    load: async () => (await import("@/app/api/v1/briefings/route")).POST as Handler,
  },
];

const actors = {} as Record<Role, Actor>;
beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  for (const role of ["admin", "adviser", "approver", "foreman"] as const)
    actors[role] = await actorFor(role, organisationId);
  const db = await getDb();
  ids.job = (await db.select({ id: jobs.id }).from(jobs).limit(1))[0].id;
  ids.component = (await db.select({ id: components.id }).from(components).limit(1))[0].id;
  ids.draft = (await db.select({ id: revisions.id, status: revisions.status }).from(revisions)).find(
    (r) => r.status === "draft",
  )!.id;
});

async function counts() {
  const db = await getDb();
  const tables = { jobs, components, assessments, revisions, briefings, briefingAttendees, hazardLibrary, auditEvents };
  return Object.fromEntries(
    await Promise.all(
      Object.entries(tables).map(async ([n, t]) => [n, (await db.select({ c: count() }).from(t))[0].c]),
    ),
  );
}

const nasty = fc.oneof(
  fc.string(),
  fc.constantFrom("\u0000", "a\u0000b", "\ud800", "x\udc00y", "\u202e", "'; drop table jobs; --", "%", "_", "\\"),
  fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -0, 5e-324),
);
const json = fc.oneof(
  fc.jsonValue({ maxDepth: 4 }),
  fc.dictionary(
    fc.constantFrom(
      "name",
      "title",
      "load",
      "mass",
      "version",
      "content",
      "task",
      "method",
      "jobId",
      "foremanIds",
      "revisionId",
      "place",
      "massKg",
      "approverId",
      "reviewDate",
    ),
    fc.oneof(nasty, fc.jsonValue({ maxDepth: 2 })),
  ),
);
/** JSON text that JSON itself cannot express, or that nests deeper than any form does. */
const rawBodies = fc.constantFrom(
  "1e400",
  '{"load": 1e400}',
  "[".repeat(5000) + "]".repeat(5000),
  `{"a":${"[".repeat(20_000)}${"]".repeat(20_000)}}`,
  '{"name":"\\u0000"}',
  '{"name":"\\ud800"}',
  "",
);

async function send(target: Target, body: BodyInit, type = "application/json") {
  session.actor = actors[target.role];
  const handler = await target.load();
  const res = await handler(
    new Request("http://localhost/api/v1/x", { method: target.method, headers: { "content-type": type }, body }),
    { params: Promise.resolve(target.params?.() ?? {}) },
  );
  return res.status;
}

describe.each(routes)("$name", (target) => {
  it("answers any JSON with a 4xx or a success — never a 500 — and a refused call writes nothing", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          json.map((v) => JSON.stringify(v)),
          rawBodies,
        ),
        async (body) => {
          const before = await counts();
          const status = await send(target, body);
          expect(status, body.slice(0, 200)).toBeLessThan(500);
          if (status >= 400) expect(await counts()).toEqual(before);
        },
      ),
      { numRuns: 25 },
    );
  });
});

describe("CSV and multipart bodies", () => {
  const importRoute: Target = {
    name: "import",
    role: "adviser",
    method: "POST",
    load: async () => (await import("@/app/api/v1/components/import/route")).POST as Handler,
  };
  const attach: Target = {
    name: "attach",
    role: "adviser",
    method: "POST",
    load: async () => (await import("@/app/api/v1/components/[id]/attachments/route")).POST as Handler,
    params: () => ({ id: ids.component }),
  };
  const verify: Target = {
    name: "verify",
    role: "foreman",
    method: "POST",
    load: async () => (await import("@/app/api/verify/route")).POST as Handler,
  };

  it("a CSV import of anything answers a 4xx or imports whole rows — never a 500 — and a refused file writes nothing", async () => {
    const cell = fc.oneof(
      fc.string({ maxLength: 12 }),
      nasty.map(String),
      fc.constantFrom("12,5", "1,250", "0x1F", "=cmd", '"', "\r\n"),
    );
    const csv = fc
      .array(fc.array(cell, { minLength: 4, maxLength: 5 }), { maxLength: 6 })
      .map((rows) => ["name,mass_kg,grip,mass_source", ...rows.map((r) => r.join(","))].join("\n"));
    await fc.assert(
      fc.asyncProperty(csv, async (body) => {
        const before = await counts();
        const status = await send(importRoute, body, "text/csv");
        expect(status, body.slice(0, 200)).toBeLessThan(500);
        if (status >= 400) expect(await counts()).toEqual(before);
      }),
      { numRuns: 40 },
    );
  });

  it("uploads of arbitrary bytes, or broken multipart, answer a 4xx", async () => {
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ maxLength: 2000 }), fc.boolean(), async (bytes, asForm) => {
        for (const target of [attach, verify]) {
          let status: number;
          if (asForm) {
            const form = new FormData();
            form.set("file", new File([bytes], "upload.pdf"));
            session.actor = actors[target.role];
            const res = await (
              await target.load()
            )(new Request("http://localhost/x", { method: "POST", body: form }), {
              params: Promise.resolve(target.params?.() ?? {}),
            });
            status = res.status;
          } else status = await send(target, bytes, "multipart/form-data; boundary=xyz");
          expect(status).toBeGreaterThanOrEqual(400);
          expect(status).toBeLessThan(500);
        }
      }),
      { numRuns: 20 },
    );
  });
});
