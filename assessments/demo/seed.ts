/**
 * Seeds the invented demo scenario. Idempotent: an organisation that already exists is left as it
 * is, so the demo can be started again without duplicating or overwriting anything.
 */
import { eq } from "drizzle-orm";
import { hashPassword } from "@/lib/auth/passwords";
import { getDb, type Db } from "@/db/client";
import { components, jobAssignments, jobs, organisations, users } from "@/db/schema";
import { drawnSignaturePng } from "@/lib/png";
import { addStarterHazards } from "../hazard-library/service";
import { approveRevision, submitRevision } from "../revisions/approval";
import { createAssessment, getRevision, saveRevision } from "../revisions/service";
import {
  demoLiftSchedule,
  DEMO_COMPONENTS,
  DEMO_JOBS,
  DEMO_LIFT_TEAM,
  DEMO_LINESIDE,
  DEMO_ORGANISATION,
  DEMO_PASSWORD,
  DEMO_USERS,
} from "./scenario";

const DEMO_ADVISER_EMAIL = "adviser@brackenfold.example";
const DEMO_APPROVER_EMAIL = "approver@brackenfold.example";
/** Three weeks from seeding: the approved demo assessment shows as due for review within 30 days. */
const demoDay = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);
const demoReviewDate = () => new Date(Date.now() + 21 * 86_400_000).toISOString().slice(0, 10);

export async function seedDemo(db: Db): Promise<{ created: boolean; organisationId: string }> {
  const existing = await db.query.organisations.findFirst({ where: eq(organisations.name, DEMO_ORGANISATION) });
  if (existing) return { created: false, organisationId: existing.id };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const result = await db.transaction(async (tx) => {
    const [org] = await tx.insert(organisations).values({ name: DEMO_ORGANISATION }).returning();
    await addStarterHazards(tx, org.id);
    const people = await tx
      .insert(users)
      .values(DEMO_USERS.map((u) => ({ ...u, organisationId: org.id, passwordHash, emailVerifiedAt: new Date() })))
      .returning();
    const adviser = people.find((p) => p.role === "adviser")!;
    const jobRows = await tx
      .insert(jobs)
      .values(DEMO_JOBS.map((j) => ({ ...j, organisationId: org.id, createdBy: adviser.id })))
      .returning({ id: jobs.id });
    const foreman = people.find((p) => p.role === "foreman")!;
    await tx
      .insert(jobAssignments)
      .values(jobRows.map((j) => ({ organisationId: org.id, jobId: j.id, userId: foreman.id })));
    await tx.insert(components).values(DEMO_COMPONENTS.map((c) => ({ ...c, organisationId: org.id })));
    return { created: true, organisationId: org.id };
  });
  if (result.created) await seedDemoAssessments(result.organisationId);
  return result;
}

/**
 * Two demo assessments: a crane job ready to submit (one standard and one complex lift, with the
 * lift team and examinations filled in) and a by-hand job left as a draft.
 */
async function seedDemoAssessments(organisationId: string) {
  const db = await getDb();
  const [adviserRow] = await db.select().from(users).where(eq(users.email, DEMO_ADVISER_EMAIL));
  const adviser = {
    id: adviserRow.id,
    organisationId,
    role: adviserRow.role,
    name: adviserRow.name,
    email: adviserRow.email,
  };
  const jobRows = await db.select().from(jobs).where(eq(jobs.organisationId, organisationId));
  const hollinVale = jobRows.find((j) => j.name === DEMO_JOBS[0].name)!;
  const carrowby = jobRows.find((j) => j.name === DEMO_JOBS[1].name)!;
  const crane = await createAssessment(adviser, {
    jobId: hollinVale.id,
    title: "Cabinet and chamber ring by lorry-loader crane",
    templateId: "cabinet-crane",
  });
  const current = await getRevision(adviser, crane.revisionId);
  const content = structuredClone(current.content);
  const team = DEMO_LIFT_TEAM;
  const schedule = demoLiftSchedule();
  for (const task of content.tasks) {
    if (!task.lift) continue;
    task.lift.liftDate = schedule.liftDate;
    task.lift.people = team;
    task.lift.examinations = schedule.examinations;
  }
  content.people.roles = [
    { role: "Appointed person", name: team.appointedPerson.name, competence: team.appointedPerson.competenceRef },
    { role: "Lift supervisor", name: team.liftSupervisor.name, competence: team.liftSupervisor.competenceRef },
    { role: "Crane operator", name: team.operator.name, competence: team.operator.competenceRef },
    { role: "Slinger/signaller", name: team.slingerSignaller.name, competence: team.slingerSignaller.competenceRef },
  ];
  Object.assign(content.lineside, DEMO_LINESIDE);
  await saveRevision(adviser, crane.revisionId, { version: current.revision.version, content });
  await createAssessment(adviser, {
    jobId: carrowby.id,
    title: "Equipment base by hand at Carrowby",
    templateId: "equipment-base",
  });
  // The lineside methods at work: a braked trolley on the down gradient, parts passed into an excavation, ground bearing.
  await createAssessment(adviser, {
    jobId: carrowby.id,
    title: "Equipment base and cable chamber at Carrowby",
    templateId: "lineside-base",
  });

  // An approved revision for the foreman to brief from, at Hollin Vale (approved without e-mails).
  const [approverRow] = await db.select().from(users).where(eq(users.email, DEMO_APPROVER_EMAIL));
  const approver = {
    id: approverRow.id,
    organisationId,
    role: approverRow.role,
    name: approverRow.name,
    email: approverRow.email,
  };
  const base = await createAssessment(adviser, {
    jobId: hollinVale.id,
    title: "Equipment base by hand at Hollin Vale",
    templateId: "equipment-base",
  });
  const baseDraft = await getRevision(adviser, base.revisionId);
  const baseContent = structuredClone(baseDraft.content);
  // The ground screws go in with the powered driver's own lifting frame at this site: no hand lift.
  baseContent.tasks = baseContent.tasks.filter((t) => t.operation !== "lift");
  baseContent.people.roles = [
    { role: "Person in charge", name: "Dafydd Strand", competence: "PTS 88213" },
    { role: "Operative", name: "Kieran Lusk", competence: "PTS 77120" },
  ];
  // Working beside the line at Hollin Vale: the arrangement, its owner, the permit and the checks.
  Object.assign(baseContent.lineside, DEMO_LINESIDE);
  baseContent.permits = [
    {
      kind: "dig",
      description: "",
      reference: "PTD-HV-0142",
      issuedBy: "Wendmoor Railway site permit office",
      validFrom: demoDay(0),
      validTo: demoDay(60),
    },
  ];
  Object.assign(baseContent.buriedServices, {
    recordsObtained: true,
    recordsRef: "SR-WHV-2291",
    scanned: true,
    scannedBy: "Kieran Lusk",
    scanDate: demoDay(-7),
    trialHoles:
      "One hand-dug trial hole at the cable route marker: signalling cable at 450 mm, 0.8 m west of the base.",
  });
  const saved = await saveRevision(adviser, base.revisionId, {
    version: baseDraft.revision.version,
    content: baseContent,
  });
  await submitRevision(
    adviser,
    base.revisionId,
    { version: saved.version, approverId: approver.id, reviewDate: demoReviewDate() },
    { notify: false },
  );
  const submitted = await getRevision(adviser, base.revisionId);
  await approveRevision(
    approver,
    base.revisionId,
    {
      version: submitted.revision.version,
      name: approver.name,
      role: "Contracts manager",
      signature: `data:image/png;base64,${drawnSignaturePng(5).toString("base64")}`,
      contentHash: submitted.revision.contentHash,
      password: DEMO_PASSWORD,
    },
    { notify: false },
  );
}
