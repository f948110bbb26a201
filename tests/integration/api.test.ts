/**
 * Every /api/v1 route as a client calls it: the happy path, each role allowed or refused by the
 * permission table, another organisation's record (404), malformed JSON, wrong types, oversize bodies.
 */
import { beforeAll, describe, expect, it, vi } from "vitest";
import type { Role } from "@/db/schema";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation, otherOrganisation, reviewDateIn } from "./helpers";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/auth/session", () => ({ getActor: async () => session.actor }));

const jobsRoute = await import("@/app/api/v1/jobs/route");
const jobRoute = await import("@/app/api/v1/jobs/[id]/route");
const componentsRoute = await import("@/app/api/v1/components/route");
const componentRoute = await import("@/app/api/v1/components/[id]/route");
const attachmentsRoute = await import("@/app/api/v1/components/[id]/attachments/route");
const attachmentRoute = await import("@/app/api/v1/attachments/[id]/route");
const importRoute = await import("@/app/api/v1/components/import/route");
const templateRoute = await import("@/app/api/v1/components/import/template/route");
const assessmentsRoute = await import("@/app/api/v1/assessments/route");
const revisionRoute = await import("@/app/api/v1/revisions/[id]/route");
const submitRoute = await import("@/app/api/v1/revisions/[id]/submit/route");
const tasksRoute = await import("@/app/api/v1/revisions/[id]/tasks/route");
const taskRoute = await import("@/app/api/v1/revisions/[id]/tasks/[taskId]/route");
const hazardLibraryRoute = await import("@/app/api/v1/hazard-library/route");
const { listLibrary } = await import("@/assessments/hazard-library/queries");

const actors = {} as Record<Role, Actor>;
let other: Actor;

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  for (const role of ["admin", "adviser", "approver", "foreman"] as const)
    actors[role] = await actorFor(role, organisationId);
  other = (await otherOrganisation()).admin;
});

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

async function call(
  as: Actor | null,
  handler: Handler,
  {
    body,
    params = {},
    type = "application/json",
    query = "",
  }: { body?: unknown; params?: Record<string, string>; type?: string; query?: string } = {},
) {
  session.actor = as;
  const init: RequestInit = { method: body === undefined ? "GET" : "POST" };
  if (body !== undefined) {
    init.body = typeof body === "string" || body instanceof FormData ? body : JSON.stringify(body);
    if (!(body instanceof FormData)) init.headers = { "content-type": type };
  }
  const res = await handler(new Request(`http://localhost/api/v1/x${query}`, init), {
    params: Promise.resolve(params),
  });
  const text = await res.text();
  let json: unknown = text;
  try {
    json = JSON.parse(text);
  } catch {
    // not JSON (CSV, file)
  }
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- response bodies of many shapes, checked field by field
  return { status: res.status, json: json as Record<string, any>, text };
}

const job = {
  name: "Nantgarw culvert headwall",
  client: "Invented Client Ltd",
  location: "Nantgarw, down side",
  siteContactPhone: "07700 900123",
};
const component = { name: "Test bracket", massKg: 12.5, grip: "good", massSource: "weighed" };

describe("jobs", () => {
  it("adviser and admin create and update; approver and foreman are refused; no session is 401", async () => {
    const created = await call(actors.adviser, jobsRoute.POST, { body: job });
    expect(created.status).toBe(201);
    const id = created.json.id;
    expect(
      (await call(actors.admin, jobRoute.PUT as Handler, { body: { ...job, name: "Renamed" }, params: { id } })).json
        .name,
    ).toBe("Renamed");
    expect((await call(actors.approver, jobsRoute.POST, { body: job })).status).toBe(403);
    expect((await call(actors.foreman, jobsRoute.GET)).status).toBe(403);
    expect((await call(null, jobsRoute.GET)).status).toBe(401);
    expect((await call(other, jobRoute.GET as Handler, { params: { id } })).status).toBe(404);
    expect((await call(other, jobRoute.PUT as Handler, { body: job, params: { id } })).status).toBe(404);
  });

  it("lists in pages with limit and cursor", async () => {
    const first = await call(actors.adviser, jobsRoute.GET, { query: "?limit=1" });
    expect(first.json.items).toHaveLength(1);
    expect(first.json.total).toBeGreaterThanOrEqual(3);
    const second = await call(actors.adviser, jobsRoute.GET, { query: `?limit=1&cursor=${first.json.nextCursor}` });
    expect(second.json.items[0].id).not.toBe(first.json.items[0].id);
    expect((await call(actors.adviser, jobsRoute.GET, { query: "?limit=500" })).status).toBe(422);
    expect((await call(actors.adviser, jobsRoute.GET, { query: "?cursor=%%%" })).status).toBe(422);
  });

  it("malformed JSON 400, wrong types 422 with fields, wrong content type 415, oversize 413", async () => {
    expect((await call(actors.adviser, jobsRoute.POST, { body: "{" })).status).toBe(400);
    const wrong = await call(actors.adviser, jobsRoute.POST, {
      body: { name: 7, client: "", location: "x", siteContactPhone: "call me" },
    });
    expect(wrong.status).toBe(422);
    expect(wrong.json.error.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      "client",
      "location",
      "name",
      "siteContactPhone",
    ]);
    expect((await call(actors.adviser, jobsRoute.POST, { body: JSON.stringify(job), type: "text/plain" })).status).toBe(
      415,
    );
    expect(
      (await call(actors.adviser, jobsRoute.POST, { body: { ...job, location: "x".repeat(1_100_000) } })).status,
    ).toBe(413);
  });
});

describe("components", () => {
  it("create, read, update; duplicates refused by name; filters and search; roles and organisations", async () => {
    const created = await call(actors.adviser, componentsRoute.POST, { body: component });
    expect(created.status).toBe(201);
    const id = created.json.id;
    expect(
      (await call(actors.adviser, componentsRoute.POST, { body: { ...component, name: "test BRACKET" } })).json.error
        .issues[0],
    ).toEqual({ path: "name", message: "A component with this name is already in the register" });
    expect(
      (
        await call(actors.adviser, componentRoute.PUT as Handler, {
          body: { ...component, massKg: 13 },
          params: { id },
        })
      ).json.massKg,
    ).toBe(13);
    const estimated = await call(actors.adviser, componentsRoute.GET, { query: "?massSource=estimated" });
    expect(estimated.json.items.every((c: { massSource: string }) => c.massSource === "estimated")).toBe(true);
    expect(
      (await call(actors.adviser, componentsRoute.GET, { query: "?q=bracket" })).json.items.map(
        (c: { name: string }) => c.name,
      ),
    ).toEqual(["Test bracket"]);
    const byMass = (await call(actors.adviser, componentsRoute.GET, { query: "?sort=-massKg&limit=2" })).json.items;
    expect(byMass[0].massKg).toBeGreaterThanOrEqual(byMass[1].massKg);
    expect((await call(actors.foreman, componentsRoute.GET)).status).toBe(403);
    expect((await call(other, componentRoute.GET as Handler, { params: { id } })).status).toBe(404);
    expect((await call(actors.adviser, componentRoute.GET as Handler, { params: { id: "nope" } })).status).toBe(404);
    expect(
      (
        await call(actors.adviser, componentsRoute.POST, {
          body: { ...component, name: "Other", massKg: "heavy", grip: "slippery" },
        })
      ).json.error.issues
        .map((i: { path: string }) => i.path)
        .sort(),
    ).toEqual(["grip", "massKg"]);
  });

  it("attachments: a PDF by content is accepted whatever its name; a text file named .pdf is refused", async () => {
    const { json: c } = await call(actors.adviser, componentsRoute.POST, {
      body: { ...component, name: "Bracket with sheet" },
    });
    const pdf = new FormData();
    pdf.set("file", new File([Buffer.from("%PDF-1.4\n1 0 obj\n<<>>\nendobj\ntrailer\n<<>>\n%%EOF\n")], "sheet.bin"));
    const added = await call(actors.adviser, attachmentsRoute.POST as Handler, { body: pdf, params: { id: c.id } });
    expect(added.status).toBe(201);
    expect(added.json.contentType).toBe("application/pdf");
    const fake = new FormData();
    fake.set("file", new File([Buffer.from("just some words, not a PDF at all")], "datasheet.pdf"));
    expect(
      (await call(actors.adviser, attachmentsRoute.POST as Handler, { body: fake, params: { id: c.id } })).status,
    ).toBe(415);
    const download = await call(actors.approver, attachmentRoute.GET as Handler, { params: { id: added.json.id } });
    expect(download.status).toBe(403);
    const mine = await call(actors.adviser, attachmentRoute.GET as Handler, { params: { id: added.json.id } });
    expect(mine.text.startsWith("%PDF")).toBe(true);
    expect((await call(other, attachmentRoute.GET as Handler, { params: { id: added.json.id } })).status).toBe(404);
    session.actor = actors.adviser;
    const del = await attachmentRoute.DELETE(new Request("http://localhost/x", { method: "DELETE" }), {
      params: Promise.resolve({ id: added.json.id }),
    });
    expect(del.status).toBe(204);
  });

  it("CSV import: preview names each bad row; a file with any bad row imports nothing; a good file imports all", async () => {
    const template = await call(actors.adviser, templateRoute.GET as Handler);
    expect(template.text.split("\n")[0]).toBe("name,mass_kg,length_mm,width_mm,height_mm,grip,mass_source,notes");
    const bad = "name,mass_kg,grip,mass_source\nGood row,10,fair,weighed\nBad row,-3,sticky,weighed\n";
    const preview = await call(actors.adviser, importRoute.POST, { body: bad, type: "text/csv", query: "?dryRun=1" });
    expect(preview.json.rows[0].errors).toEqual([]);
    expect(preview.json.rows[1].errors.map((e: { path: string }) => e.path).sort()).toEqual(["grip", "massKg"]);
    const refused = await call(actors.adviser, importRoute.POST, { body: bad, type: "text/csv" });
    expect(refused.status).toBe(422);
    expect((await call(actors.adviser, componentsRoute.GET, { query: "?q=Good row" })).json.total).toBe(0);
    const good =
      "name,mass_kg,length_mm,width_mm,height_mm,grip,mass_source,notes\nImported A,10,100,100,100,fair,weighed,\nImported B,20,,,,poor,estimated,check\n";
    const done = await call(actors.adviser, importRoute.POST, { body: good, type: "text/csv" });
    expect(done.status).toBe(201);
    expect(done.json.imported).toBe(2);
    expect((await call(actors.adviser, importRoute.POST, { body: good, type: "text/csv" })).status).toBe(422);
    expect((await call(actors.approver, importRoute.POST, { body: good, type: "text/csv" })).status).toBe(403);
    expect((await call(actors.adviser, importRoute.POST, { body: good, type: "application/json" })).status).toBe(415);
  });

  it("parallel creates of one name (any case) make one component; the others answer 409 on the name", async () => {
    const body = (name: string) => ({ body: { name, massKg: 5, grip: "good", massSource: "weighed" } });
    const results = await Promise.all(
      ["Race lid", "RACE LID", "race lid", "Race Lid"].map((n) => call(actors.adviser, componentsRoute.POST, body(n))),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    const refused = results.find((r) => r.status === 409)!;
    expect(refused.json.error.issues).toEqual([
      { path: "name", message: "A component with this name is already in the register" },
    ]);
    expect((await call(actors.adviser, componentsRoute.GET, { query: "?q=race lid" })).json.total).toBe(1);
  });

  it("CSV import reads masses exactly or refuses them: a decimal comma is 12.5 kg, never 125; '1,250' is refused; formula-like text is noted", async () => {
    const ambiguous = 'name,mass_kg,grip,mass_source\nComma lid,"1,250",fair,weighed\n';
    const refused = await call(actors.adviser, importRoute.POST, { body: ambiguous, type: "text/csv" });
    expect(refused.status).toBe(422);
    expect(refused.json.error.issues.find((i: { path: string }) => i.path === "line 2.massKg").message).toMatch(
      /could mean 1250 or 1.250/,
    );
    expect((await call(actors.adviser, componentsRoute.GET, { query: "?q=Comma lid" })).json.total).toBe(0);

    const comma =
      'name,mass_kg,grip,mass_source,notes\nComma lid,"12,5",fair,weighed,\n=HYPERLINK("x"),3,good,weighed,@note\n';
    const preview = await call(actors.adviser, importRoute.POST, { body: comma, type: "text/csv", query: "?dryRun=1" });
    expect(preview.json.rows[0].errors).toEqual([]);
    expect(preview.json.rows[1].notes.map((n: { path: string }) => n.path)).toEqual(["name", "notes"]);
    expect((await call(actors.adviser, importRoute.POST, { body: comma, type: "text/csv" })).status).toBe(201);
    const stored = (await call(actors.adviser, componentsRoute.GET, { query: "?q=Comma lid" })).json.items[0];
    expect(stored.massKg).toBe(12.5);
  });
});

describe("assessments, revisions and tasks", () => {
  it("create, filter, read, save with versions, tasks, submit; roles and organisations", async () => {
    const jobs = (await call(actors.adviser, jobsRoute.GET)).json.items;
    const created = await call(actors.adviser, assessmentsRoute.POST, {
      body: { jobId: jobs[0].id, title: "API assessment", templateId: "trough-route" },
    });
    expect(created.status).toBe(201);
    const id = created.json.revisionId;
    expect(
      (await call(actors.approver, assessmentsRoute.POST, { body: { jobId: jobs[0].id, title: "No" } })).status,
    ).toBe(403);
    expect(
      (await call(actors.adviser, assessmentsRoute.POST, { body: { jobId: "x", title: "" } })).json.error.issues
        .map((i: { path: string }) => i.path)
        .sort(),
    ).toEqual(["jobId", "title"]);

    const listed = await call(actors.adviser, assessmentsRoute.GET, { query: "?q=API&status=draft" });
    expect(listed.json.items.map((r: { title: string }) => r.title)).toEqual(["API assessment"]);
    expect((await call(actors.adviser, assessmentsRoute.GET, { query: "?status=nonsense" })).status).toBe(422);

    const rev = await call(actors.adviser, revisionRoute.GET as Handler, { params: { id } });
    expect(rev.json.status).toBe("draft");
    expect((await call(other, revisionRoute.GET as Handler, { params: { id } })).status).toBe(404);
    expect((await call(actors.foreman, revisionRoute.GET as Handler, { params: { id } })).status).toBe(403);

    const tasks = await call(actors.adviser, tasksRoute.GET as Handler, { params: { id } });
    expect(tasks.json.tasks).toHaveLength(3);
    expect(tasks.json.tasks[0].score.band).not.toBeNull();
    const task = { ...tasks.json.tasks[1].task, id: "t-new", description: "Added through the API" };
    const added = await call(actors.adviser, tasksRoute.POST as Handler, {
      body: { version: tasks.json.version, task },
      params: { id },
    });
    expect(added.status).toBe(201);
    const stale = await call(actors.adviser, tasksRoute.POST as Handler, {
      body: { version: tasks.json.version, task: { ...task, id: "t-other" } },
      params: { id },
    });
    expect(stale.status).toBe(409);
    session.actor = actors.adviser;
    const replaced = await taskRoute.PUT(
      new Request("http://localhost/x", {
        method: "PUT",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ version: added.json.version, task: { ...task, description: "Changed" } }),
      }),
      { params: Promise.resolve({ id, taskId: "t-new" }) },
    );
    expect(replaced.status).toBe(200);
    const afterReplace = (await replaced.json()).version;
    const removed = await taskRoute.DELETE(
      new Request("http://localhost/x", {
        method: "DELETE",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ version: afterReplace }),
      }),
      { params: Promise.resolve({ id, taskId: "t-new" }) },
    );
    expect(removed.status).toBe(200);
    const missingTask = await taskRoute.DELETE(
      new Request("http://localhost/x", {
        method: "DELETE",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ version: (await removed.json()).version }),
      }),
      { params: Promise.resolve({ id, taskId: "t-new" }) },
    );
    expect(missingTask.status).toBe(404);

    const now = await call(actors.adviser, revisionRoute.GET as Handler, { params: { id } });
    const badSave = await call(actors.adviser, revisionRoute.PUT as Handler, {
      body: { version: now.json.version, content: { ...now.json.content, tasks: "none" } },
      params: { id },
    });
    expect(badSave.status).toBe(422);
    expect(badSave.json.error.issues[0].path).toBe("content.tasks");

    const notReady = await call(actors.adviser, submitRoute.POST as Handler, {
      body: { version: now.json.version, approverId: actors.approver.id, reviewDate: reviewDateIn(180) },
      params: { id },
    });
    expect(notReady.status).toBe(422);
    expect(notReady.json.error.issues.length).toBeGreaterThan(0);
    expect((await call(actors.approver, submitRoute.POST as Handler, { body: {}, params: { id } })).status).toBe(403);
  });
});

describe("hazard library", () => {
  it("advisers read their organisation's whole library; other organisations see only their own; foremen are refused", async () => {
    const read = await call(actors.adviser, hazardLibraryRoute.GET);
    expect(read.status).toBe(200);
    const hazards = (read.json.items as { hazard: string; controls: unknown[] }[]).map((e) => e.hazard);
    expect(hazards.length).toBeGreaterThan(0);
    expect(hazards).toEqual((await listLibrary(actors.adviser)).map((e) => e.hazard));
    expect((read.json.items as { controls: unknown[] }[]).every((e) => e.controls.length > 0)).toBe(true);
    const theirs = await call(other, hazardLibraryRoute.GET);
    expect(theirs.status).toBe(200);
    expect(theirs.json.items.map((e: { hazard: string }) => e.hazard)).not.toEqual(hazards);
    expect((await call(actors.foreman, hazardLibraryRoute.GET)).status).toBe(403);
    expect((await call(null, hazardLibraryRoute.GET)).status).toBe(401);
  });
});
