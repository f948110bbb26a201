/**
 * The same task gets the same band wherever it is scored: the wizard and the server (`scoreTask`,
 * stored with the draft), the scoring API and the CLI (each method's request, built by the one
 * mapping `methodRequests`), and the pack (printed from the stored snapshot). The tasks are the
 * edge cases of the engine: a lift beyond the equation's range, a long team carry, a downhill
 * trolley, a lift whose frequency and twist the filter must receive, a lift with equipment
 * examined after the lift date.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { methodRequests, type TaskScore } from "@/assessments/method-statement/score-task";
import type { Content, Task } from "@/assessments/method-statement/content";
import { renderPack } from "@/assessments/pack/render";
import { createAssessment, getRevision, saveRevision } from "@/assessments/revisions/service";
import { worstBand } from "@/assessments/rules/bands";
import type { Band } from "@/assessments/rules/types";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation } from "./helpers";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/auth/session", () => ({ getActor: async () => session.actor }));
const { POST } = await import("@/app/api/v1/score/route");

let stored: TaskScore[];
let tasks: Task[];
let revisionId: string;

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  const adviser = await actorFor("adviser", organisationId);
  session.actor = adviser;
  const jobs = await (await import("@/assessments/jobs/queries")).listJobs(adviser);
  const created = await createAssessment(adviser, { jobId: jobs[0].id, title: "Edge cases in every channel" });
  revisionId = created.revisionId;
  const { content, revision } = await getRevision(adviser, revisionId);
  const { listComponentsPage } = await import("@/assessments/load-register/queries");
  const register = (await listComponentsPage(adviser, { limit: 100 })).items;
  const id = (name: string) => register.find((c) => c.name.startsWith(name))!.id;
  tasks = [
    {
      id: "beyond-reach",
      description: "Lift the kit onto the far bracket",
      componentId: id("Axle counter head kit"),
      quantity: 1,
      operation: "lift",
      niosh: {
        origin: { h: 30, v: 40, a: 0 },
        destination: { h: 70, v: 100, a: 0 },
        frequency: 0.5,
        durationHours: 1,
        recoveryHours: 2,
        coupling: "good",
        controlAtDestination: false,
      },
      filter: { sex: "male", zone: "knuckle-to-elbow", reach: "close", frequency: 0.5, twistDeg: 0, teamSize: 1 },
    },
    {
      id: "long-carry",
      description: "Carry panels along the cess as a pair",
      componentId: id("Galvanised walkway panel"),
      quantity: 2,
      operation: "carry",
      filter: {
        sex: "male",
        zone: "knuckle-to-elbow",
        reach: "close",
        frequency: 1,
        twistDeg: 0,
        teamSize: 2,
        carryDistanceM: 40,
        durationHours: 6,
      },
    },
    {
      id: "downhill-trolley",
      description: "Trolley the troughs down to the site",
      componentId: id("Concrete cable trough"),
      quantity: 6,
      operation: "push",
      push: {
        mass: 6 * 42 + 60,
        gradient: -1 / 150,
        sex: "male",
        teamSize: 2,
        distanceM: 15,
        surface: "rail",
        braked: false,
      },
    },
    {
      id: "twisting-lift",
      description: "Lift kits from the van to the bench",
      componentId: id("Route marker post"),
      quantity: 1,
      operation: "lift",
      niosh: {
        origin: { h: 25, v: 75, a: 90 },
        destination: { h: 25, v: 75, a: 0 },
        frequency: 6,
        durationHours: 1,
        recoveryHours: 2,
        coupling: "good",
        controlAtDestination: false,
      },
      filter: { sex: "male", zone: "knuckle-to-elbow", reach: "close", frequency: 0.5, twistDeg: 0, teamSize: 1 },
    },
    {
      id: "crane",
      description: "Set the cabinet",
      componentId: id("Location cabinet"),
      quantity: 1,
      operation: "equipment",
      lift: {
        riggingMass: 25,
        hookBlockMass: 15,
        ratedCapacity: 1200,
        sling: { legs: 4, angleFromVerticalDeg: 30, legWll: 1000, hitch: "straight", markedWll: 2100 },
        liftDate: "2027-05-01",
        examinations: [{ item: "Lorry-loader crane", kind: "equipment", lastExamined: "2027-05-20" }],
      },
    },
  ];
  const next: Content = { ...content, tasks };
  await saveRevision(adviser, revisionId, { version: revision.version, content: next });
  stored = (await getRevision(adviser, revisionId)).revision.results as TaskScore[];
});

const bands = (xs: { band: Band }[]) => xs.map((x) => x.band);

describe("one band for one task, wherever it is scored", () => {
  it("none of these edge cases is Clear", () => {
    expect(stored.map((s) => s.band)).not.toContain("clear");
  });

  it("the scoring API gives each method's stored band, and the task's band is the worst of them", async () => {
    for (const [i, task] of tasks.entries()) {
      const requests = Object.values(methodRequests(task, stored[i].load));
      const res = await POST(
        new Request("http://localhost/api/v1/score", {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: JSON.stringify(requests),
        }),
      );
      expect(res.status, task.id).toBe(200);
      const results = (await res.json()) as { method: string; band: Band }[];
      const storedBands = results.map(
        (r) => (stored[i].results as Record<string, { band: Band }>)[r.method === "lift" ? "lift" : r.method].band,
      );
      expect(bands(results), task.id).toEqual(storedBands);
      expect(worstBand(bands(results)), task.id).toBe(stored[i].band);
    }
  });

  it("the CLI gives the same bands", () => {
    const dir = mkdtempSync(path.join(tmpdir(), "heftwise-same-band-"));
    const requests = tasks.flatMap((task, i) => Object.values(methodRequests(task, stored[i].load)));
    const file = path.join(dir, "requests.json");
    writeFileSync(file, JSON.stringify(requests));
    const out = spawnSync("npm", ["run", "--silent", "score", "--", file], { encoding: "utf8" });
    expect(out.status).toBe(0);
    const expected = stored.flatMap((s) => Object.values(s.results).map((r) => r.band));
    expect(bands(JSON.parse(out.stdout))).toEqual(expected);
  });

  it("the pack prints each task's stored band in its summary", async () => {
    const pdf = await renderPack(await getDb(), revisionId);
    const file = path.join(mkdtempSync(path.join(tmpdir(), "heftwise-same-band-")), "pack.pdf");
    writeFileSync(file, pdf);
    const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
    const summary = text.slice(text.indexOf("Summary of bands"));
    for (const [i, task] of tasks.entries()) {
      const row = summary.split("\n").find((line) => line.includes(task.description.slice(0, 20)));
      expect(row, task.id).toBeDefined();
      expect(row!, task.id).toContain(stored[i].band!.toUpperCase());
    }
  });
});
