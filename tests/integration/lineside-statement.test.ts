/**
 * The lineside method statement: working near the line, permits, buried services, excavations.
 * Gaps that matter are submission blockers, not warnings; dates and references are validated.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { contentSchema, type Content } from "@/assessments/method-statement/content";
import { linesideGaps, reviewContent } from "@/assessments/method-statement/score-task";
import { submitRevision } from "@/assessments/revisions/approval";
import { createAssessment, getRevision, saveRevision } from "@/assessments/revisions/service";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/permissions";
import { actorFor, completeLineside, demoOrganisation, reviewDateIn } from "./helpers";

let adviser: Actor;
let approver: Actor;
let revisionId: string;
let template: Content;

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  adviser = await actorFor("adviser", organisationId);
  approver = await actorFor("approver", organisationId);
  const jobs = await (await import("@/assessments/jobs/queries")).listJobs(adviser);
  ({ revisionId } = await createAssessment(adviser, {
    jobId: jobs[1].id,
    title: "Lineside statement test",
    templateId: "lineside-base",
  }));
  template = (await getRevision(adviser, revisionId)).content;
});

const messages = (c: Content) => linesideGaps(c).map((m) => m.message);

describe("what blocks submission", () => {
  it("the lineside template starts with its arrangement and texts, and lists what the adviser must still add", () => {
    expect(template.lineside).toMatchObject({ nearLine: "near", protection: "possession" });
    expect(template.excavation.present).toBe(true);
    const gaps = messages(template);
    expect(gaps).toEqual(
      expect.arrayContaining([
        "Name the person responsible for the safe system of work.",
        "Give the competence reference of the person responsible for the safe system of work.",
        "Say where the positions of safety are.",
        "Permit to dig: the permit is listed as needed but has no reference.",
        "Buried services: record the scan with a cable locating tool before digging.",
        "Excavation: say who inspects it, before each shift and after anything that could weaken it.",
      ]),
    );
    expect(messages(completeLineside(template))).toEqual([]);
  });

  it("work near the line without a protection arrangement is blocked; not near the line, nothing is asked", () => {
    const c = completeLineside(template);
    c.lineside.protection = null;
    expect(messages(c)).toContain("Choose the protection arrangement for working on or near the line.");
    c.lineside.nearLine = "not-near";
    c.lineside.responsibleName = "";
    expect(messages(c).some((m) => /protection|responsible/.test(m))).toBe(false);
  });

  it("a load lowered below the standing surface needs the excavation described", () => {
    const c = completeLineside(template);
    c.excavation.present = false;
    expect(messages(c)).toContain(
      "A task lowers a load below the standing surface: describe the excavation it goes into.",
    );
  });

  it("the server refuses submission with each gap named, and nothing changes", async () => {
    const current = await getRevision(adviser, revisionId);
    const err = await submitRevision(adviser, revisionId, {
      version: current.revision.version,
      approverId: approver.id,
      reviewDate: reviewDateIn(120),
    }).catch((e: AppError) => e);
    expect(err).toBeInstanceOf(AppError);
    expect((err as AppError).code).toBe("validation");
    expect((err as AppError).issues!.map((i) => i.message)).toContain(
      "Name the person responsible for the safe system of work.",
    );
    expect((await getRevision(adviser, revisionId)).revision.status).toBe("draft");
  });

  it("completed, the lineside sections no longer block it", async () => {
    const current = await getRevision(adviser, revisionId);
    const content = completeLineside(current.content);
    content.tasks.find((t) => t.operation === "push")!.push!.brakeOperator = "Kieran Lusk";
    content.people.roles = content.people.roles.map((r) => ({ ...r, name: r.name || "Dafydd Strand" }));
    const review = reviewContent(content, current.register);
    expect(review.missing.filter((m) => m.step === "line" || m.step === "ground")).toEqual([]);
    await saveRevision(adviser, revisionId, { version: current.revision.version, content });
  });
});

describe("dates and references are validated", () => {
  it.each([
    [
      { permits: [{ kind: "dig", reference: "PTD 1", issuedBy: "x", validFrom: "2027-03-10", validTo: "2027-03-01" }] },
      "permits.0.validTo",
      "Must be on or after the start date",
    ],
    [
      { permits: [{ kind: "dig", reference: "PTD <1>", issuedBy: "x" }] },
      "permits.0.reference",
      "Use letters, digits, spaces and - / . _ : # only",
    ],
    [{ buriedServices: { scanDate: "2027-02-30" } }, "buriedServices.scanDate", "Use a real date"],
    [{ lineside: { protection: "lookout-only" } }, "lineside.protection", undefined],
    [{ excavation: { present: true, depthM: -1 } }, "excavation.depthM", "At least 0.05 m"],
  ])("%o → %s", (patch, path, message) => {
    const parsed = contentSchema.safeParse({
      ...template,
      ...Object.fromEntries(
        Object.entries(patch).map(([k, v]) => [
          k,
          Array.isArray(v) ? v : { ...(template as Record<string, object>)[k], ...v },
        ]),
      ),
    });
    expect(parsed.success).toBe(false);
    const issue = parsed.error!.issues.find((i) => i.path.join(".") === path);
    expect(issue, JSON.stringify(parsed.error!.issues)).toBeDefined();
    if (message) expect(issue!.message).toBe(message);
  });

  it("a draft saved before these sections existed still opens, with them empty", () => {
    const { lineside, permits, buriedServices, excavation, environment, ...old } = template;
    void [lineside, permits, buriedServices, excavation, environment];
    const parsed = contentSchema.parse(old);
    expect(parsed.lineside.nearLine).toBe("not-near");
    expect(parsed.permits).toEqual([]);
    expect(parsed.excavation.present).toBe(false);
  });
});

describe("a new assessment on a railway job", () => {
  it("starts near the line, with the job's access point", async () => {
    const jobs = await (await import("@/assessments/jobs/queries")).listJobs(adviser);
    const railway = jobs.find((j) => j.lineReference)!;
    const { revisionId: id } = await createAssessment(adviser, { jobId: railway.id, title: "Blank, on the railway" });
    const { content } = await getRevision(adviser, id);
    expect(content.lineside.nearLine).toBe("near");
    expect(content.lineside.accessPoint).toBe(railway.accessPoint);
    expect(messages(content)).toContain("Choose the protection arrangement for working on or near the line.");
  });
});
