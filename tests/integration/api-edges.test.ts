/**
 * Every route that takes JSON, through the same edges: no session (401), a role the permission
 * table refuses (403), malformed JSON (400), another content type (415), an oversize body (413).
 */
import { beforeAll, describe, expect, it, vi } from "vitest";
import type { Role } from "@/db/schema";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation } from "./helpers";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/auth/session", () => ({ getActor: async () => session.actor }));

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
const id = "5d1c0f7e-2b8a-4c61-9d3e-7a0b1c2d3e4f";

const routes: {
  name: string;
  load: () => Promise<Handler>;
  method: string;
  allowed: Role;
  refused: Role | null;
  params?: Record<string, string>;
}[] = [
  {
    name: "POST /score",
    load: async () => (await import("@/app/api/v1/score/route")).POST as Handler,
    method: "POST",
    allowed: "foreman",
    refused: null,
  },
  {
    name: "POST /jobs",
    load: async () => (await import("@/app/api/v1/jobs/route")).POST as Handler,
    method: "POST",
    allowed: "adviser",
    refused: "approver",
  },
  {
    name: "PUT /jobs/{id}",
    load: async () => (await import("@/app/api/v1/jobs/[id]/route")).PUT as Handler,
    method: "PUT",
    allowed: "adviser",
    refused: "foreman",
    params: { id },
  },
  {
    name: "PUT /jobs/{id}/foremen",
    load: async () => (await import("@/app/api/v1/jobs/[id]/foremen/route")).PUT as Handler,
    method: "PUT",
    allowed: "admin",
    refused: "approver",
    params: { id },
  },
  {
    name: "POST /components",
    load: async () => (await import("@/app/api/v1/components/route")).POST as Handler,
    method: "POST",
    allowed: "adviser",
    refused: "foreman",
  },
  {
    name: "PUT /components/{id}",
    load: async () => (await import("@/app/api/v1/components/[id]/route")).PUT as Handler,
    method: "PUT",
    allowed: "adviser",
    refused: "approver",
    params: { id },
  },
  {
    name: "POST /assessments",
    load: async () => (await import("@/app/api/v1/assessments/route")).POST as Handler,
    method: "POST",
    allowed: "adviser",
    refused: "foreman",
  },
  {
    name: "PUT /revisions/{id}",
    load: async () => (await import("@/app/api/v1/revisions/[id]/route")).PUT as Handler,
    method: "PUT",
    allowed: "adviser",
    refused: "approver",
    params: { id },
  },
  {
    name: "POST /revisions/{id}/submit",
    load: async () => (await import("@/app/api/v1/revisions/[id]/submit/route")).POST as Handler,
    method: "POST",
    allowed: "adviser",
    refused: "foreman",
    params: { id },
  },
  {
    name: "POST /revisions/{id}/tasks",
    load: async () => (await import("@/app/api/v1/revisions/[id]/tasks/route")).POST as Handler,
    method: "POST",
    allowed: "adviser",
    refused: "approver",
    params: { id },
  },
  {
    name: "PUT /revisions/{id}/tasks/{taskId}",
    load: async () => (await import("@/app/api/v1/revisions/[id]/tasks/[taskId]/route")).PUT as Handler,
    method: "PUT",
    allowed: "adviser",
    refused: "foreman",
    params: { id, taskId: "t-1" },
  },
  {
    name: "DELETE /revisions/{id}/tasks/{taskId}",
    load: async () => (await import("@/app/api/v1/revisions/[id]/tasks/[taskId]/route")).DELETE as Handler,
    method: "DELETE",
    allowed: "adviser",
    refused: "foreman",
    params: { id, taskId: "t-1" },
  },
  {
    name: "POST /revisions/{id}/approve",
    load: async () => (await import("@/app/api/v1/revisions/[id]/approve/route")).POST as Handler,
    method: "POST",
    allowed: "approver",
    refused: "adviser",
    params: { id },
  },
  {
    name: "POST /revisions/{id}/return",
    load: async () => (await import("@/app/api/v1/revisions/[id]/return/route")).POST as Handler,
    method: "POST",
    allowed: "approver",
    refused: "adviser",
    params: { id },
  },
  {
    name: "POST /briefings",
    load: async () => (await import("@/app/api/v1/briefings/route")).POST as Handler,
    method: "POST",
    allowed: "foreman",
    refused: "adviser",
  },
  {
    name: "POST /briefings/{id}/attendees",
    load: async () => (await import("@/app/api/v1/briefings/[id]/attendees/route")).POST as Handler,
    method: "POST",
    allowed: "foreman",
    refused: "approver",
    params: { id },
  },
  {
    name: "POST /briefings/{id}/complete",
    load: async () => (await import("@/app/api/v1/briefings/[id]/complete/route")).POST as Handler,
    method: "POST",
    allowed: "foreman",
    refused: "adviser",
    params: { id },
  },
];

const actors = {} as Record<Role, Actor>;
beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  for (const role of ["admin", "adviser", "approver", "foreman"] as const)
    actors[role] = await actorFor(role, organisationId);
});

async function send(
  handler: Handler,
  method: string,
  params: Record<string, string>,
  body: string,
  type = "application/json",
) {
  const res = await handler(
    new Request("http://localhost/api/v1/x", { method, headers: { "content-type": type }, body }),
    { params: Promise.resolve(params) },
  );
  return { status: res.status, body: await res.json() };
}

describe.each(routes)("$name", ({ load, method, allowed, refused, params = {} }) => {
  it("answers 401 without a session, 403 for a refused role, and never a stack trace", async () => {
    const handler = await load();
    session.actor = null;
    const anonymous = await send(handler, method, params, "{}");
    expect(anonymous.status).toBe(401);
    expect(anonymous.body).toEqual({ error: { code: "unauthenticated", message: "Sign in to continue" } });
    if (refused) {
      session.actor = actors[refused];
      const denied = await send(handler, method, params, "{}");
      expect(denied.status).toBe(403);
      expect(JSON.stringify(denied.body)).not.toMatch(/at .*\.ts:\d+/);
    }
  });

  it("answers 400 to malformed JSON, 415 to another content type, 413 to an oversize body", async () => {
    const handler = await load();
    session.actor = actors[allowed];
    expect((await send(handler, method, params, "{not json")).status).toBe(400);
    expect((await send(handler, method, params, "{}", "text/plain")).status).toBe(415);
    expect((await send(handler, method, params, JSON.stringify({ pad: "x".repeat(1_100_000) }))).status).toBe(413);
  });

  it("answers 413 to a chunked body over the limit as soon as it passes it, without reading the rest", async () => {
    const handler = await load();
    session.actor = actors[allowed];
    let pulled = 0;
    const chunk = new TextEncoder().encode(`"${"x".repeat(64 * 1024)}",`);
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled++;
        if (pulled > 400)
          controller.close(); // about 26 MB if read whole
        else controller.enqueue(pulled === 1 ? new TextEncoder().encode("[") : chunk);
      },
    });
    const res = await handler(
      new Request("http://localhost/api/v1/x", {
        method,
        headers: { "content-type": "application/json" },
        body,
        duplex: "half",
      } as RequestInit),
      { params: Promise.resolve(params) },
    );
    expect(res.status).toBe(413);
    expect(pulled).toBeLessThan(40);
  });
});

describe("writes from another site's page are refused, whatever the content type", () => {
  const job = {
    name: "Cross-site job",
    client: "Wendmoor Railway Infrastructure",
    location: "Tolgarth",
    nearestHospital: "Tolgarth Community Hospital",
    emergencyArrangements: "Call 999",
  };
  const post = async (headers: Record<string, string>) => {
    const jobs = (await import("@/app/api/v1/jobs/route")).POST as Handler;
    session.actor = actors.adviser;
    const res = await jobs(
      new Request("http://localhost/api/v1/jobs", {
        method: "POST",
        headers: { "content-type": "application/json", ...headers },
        body: JSON.stringify(job),
      }),
      { params: Promise.resolve({}) },
    );
    return res.status;
  };
  it.each([
    { origin: "https://evil.example" },
    { origin: "null" },
    { "sec-fetch-site": "cross-site" },
    { "sec-fetch-site": "same-site", origin: "http://other.localhost:3000" },
  ] as Record<string, string>[])("%o → 403", async (headers) => {
    expect(await post(headers)).toBe(403);
  });
  it("a CSV import from another site is refused too (a simple content type a form can send)", async () => {
    const imp = (await import("@/app/api/v1/components/import/route")).POST as Handler;
    session.actor = actors.adviser;
    const res = await imp(
      new Request("http://localhost/api/v1/components/import", {
        method: "POST",
        headers: { "content-type": "text/plain", origin: "https://evil.example" },
        body: "name,mass_kg,grip,mass_source\nEvil,1,good,weighed\n",
      }),
      { params: Promise.resolve({}) },
    );
    expect(res.status).toBe(403);
  });
  it("the same origin, or a client that sends no Origin, is judged by its credentials", async () => {
    const { config } = await import("@/lib/config");
    expect(await post({ origin: new URL(config().NEXTAUTH_URL).origin, "sec-fetch-site": "same-origin" })).toBe(201);
  });
});

describe("text PostgreSQL cannot store, and the database's own refusals", () => {
  it("a NUL or a broken character in any text field answers 422 on that field, and nothing is written", async () => {
    const jobs = (await import("@/app/api/v1/jobs/route")).POST as Handler;
    session.actor = actors.adviser;
    const job = {
      name: "Tolgarth\u0000 footbridge",
      client: "Wendmoor Railway Infrastructure",
      location: "Tolgarth",
      nearestHospital: "Tolgarth Community Hospital",
      emergencyArrangements: "Call 999",
    };
    const nul = await send(jobs, "POST", {}, JSON.stringify(job));
    expect(nul.status).toBe(422);
    expect(nul.body.error.issues).toEqual([{ path: "name", message: expect.stringContaining("cannot be stored") }]);
    const broken = await send(
      jobs,
      "POST",
      {},
      JSON.stringify({ ...job, name: "Tolgarth", location: "Tolgarth \ud800 cess" }),
    );
    expect(broken.status).toBe(422);
    expect(broken.body.error.issues[0].path).toBe("location");
    const list = await (
      await import("@/app/api/v1/jobs/route")
    ).GET(new Request("http://localhost/api/v1/jobs?q=Tolgarth"));
    expect(
      ((await list.json()) as { items: { name: string }[] }).items.filter((j) => j.name.startsWith("Tolgarth")),
    ).toEqual([]);
  });

  it("a database refusal of the data (class 22) is a 422 and a taken unique key a 409, never a 500", async () => {
    const { toAppError } = await import("@/lib/errors");
    expect(toAppError({ code: "22P05", message: "unsupported Unicode escape sequence" })?.status).toBe(422);
    expect(toAppError(Object.assign(new Error("Failed query"), { cause: { code: "22021" } }))?.status).toBe(422);
    expect(toAppError(Object.assign(new Error("Failed query"), { cause: { code: "23505" } }))?.status).toBe(409);
    expect(toAppError(new Error("something else"))).toBeNull();
  });
});
