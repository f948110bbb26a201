/**
 * `npm run seed:scale -- --assessments 10000 [--data-dir DIR]`: fills a data folder (or the server
 * `DATABASE_URL` names) with a large invented dataset for measuring lists and pages at scale: the
 * demo organisation, then N assessments with their revisions and scored tasks, five components a
 * assessment, 200 people, briefings with sign-ons, and the audit events of every transition.
 *
 * Rows are written in batches straight to the tables (the services would take minutes), with the
 * same shapes the services write: contents from the templates, results scored by the engine. The
 * random choices come from a fixed seed, so two runs make the same dataset. A folder that already
 * holds a scale dataset is left as it is.
 */
import { createHash, randomUUID } from "node:crypto";
import path from "node:path";
import { parseArgs } from "node:util";
import type * as Schema from "@/db/schema";
import type { AuditEntry } from "@/lib/audit";

const { values: args } = parseArgs({
  options: {
    assessments: { type: "string", default: "10000" },
    "data-dir": { type: "string" },
  },
});
const total = Number(args.assessments);
if (!Number.isInteger(total) || total < 1 || total > 200_000) {
  process.stderr.write("usage: npm run seed:scale -- --assessments N [--data-dir DIR]   (N from 1 to 200000)\n");
  process.exit(2);
}
if (args["data-dir"]) process.env.HEFTWISE_DATA_DIR = path.resolve(args["data-dir"]);

/** A small deterministic generator (mulberry32): the same dataset on every run. */
function generator(seed: number) {
  let a = seed;
  const next = () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    int: (min: number, max: number) => min + Math.floor(next() * (max - min + 1)),
    pick: <T>(list: readonly T[]): T => list[Math.floor(next() * list.length)],
  };
}

// Invented names, places and products.
const FIRST = [
  "Aled",
  "Bryony",
  "Cai",
  "Delyth",
  "Emrys",
  "Ffion",
  "Gethin",
  "Hana",
  "Iolo",
  "Jory",
  "Kezia",
  "Lowri",
  "Madoc",
  "Nia",
  "Osian",
  "Petra",
  "Rhodri",
  "Sian",
  "Tegan",
  "Wyn",
];
const LAST = [
  "Ambrey",
  "Blackwell",
  "Corran",
  "Dunmore",
  "Eskett",
  "Fallow",
  "Garside",
  "Hesketh",
  "Ilsley",
  "Jarrold",
  "Kettley",
  "Lathom",
  "Mardle",
  "Nettlefold",
  "Orrell",
  "Pendry",
  "Quarmby",
  "Ravensworth",
  "Skelwith",
  "Tarrant",
];
const PLACES = [
  "Hollin Vale",
  "Carrowby",
  "Gorsey Lane",
  "Marsh End",
  "Thornbeck",
  "Wendmoor Junction",
  "Aldwyn Sidings",
  "Kestle Bridge",
  "Fennick Cutting",
  "Owlerton Loop",
  "Brackley Moss",
  "Scarth Viaduct",
];
const WORKS = [
  "Equipment base by hand",
  "Cable trough route renewal",
  "Location cabinet by crane",
  "Chamber rings into excavation",
  "Walkway panels along the cess",
  "Signal post base plates",
  "Battery set replacement",
  "Axle counter heads fitted",
  "Route marker posts",
  "Troughing lids replaced",
];
const PRODUCTS = [
  "Cable trough",
  "Trough lid",
  "Walkway panel",
  "Base plate",
  "Ground screw",
  "Chamber ring",
  "Cabinet plinth",
  "Post socket",
  "Battery set",
  "Junction box",
  "Cable drum",
  "Bearer",
  "Handrail section",
  "Equipment frame",
  "Marker post",
];
const MAKERS = ["Ferrowell", "Dunstan Precast", "Kelder", "Northgate GRP", "Ravel Steel", "Tamworth Cast"];

const STATUSES_OF_LATEST = [
  "approved",
  "approved",
  "approved",
  "approved",
  "approved",
  "draft",
  "draft",
  "draft",
  "submitted",
  "submitted",
] as const;
const DAY = 86_400_000;

async function main() {
  const { getDb, closeDb } = await import("@/db/client");
  const schema = await import("@/db/schema");
  const { eq, count, sql } = await import("drizzle-orm");
  const { seedDemo } = await import("@/assessments/demo/seed");
  const { DEMO_PASSWORD } = await import("@/assessments/demo/scenario");
  const { TEMPLATES } = await import("@/assessments/method-statement/templates");
  const { reviewContent } = await import("@/assessments/method-statement/score-task");
  const { hashPassword } = await import("@/lib/auth/passwords");
  const { drawnSignaturePng } = await import("@/lib/png");
  const { chainEvent, lockedChainHead } = await import("@/lib/audit");

  const db = await getDb();
  const { organisationId } = await seedDemo(db);
  const [{ n: existing }] = await db
    .select({ n: count() })
    .from(schema.assessments)
    .where(eq(schema.assessments.organisationId, organisationId));
  if (existing > 100) {
    console.log(`This database already holds a scale dataset (${existing} assessments): left as it is.`);
    await closeDb();
    return;
  }
  const rng = generator(20261202);
  const started = Date.now();
  const now = Date.now();
  const insert = async <T extends Record<string, unknown>>(
    table: Parameters<typeof db.insert>[0],
    rows: T[],
    size = 400,
  ) => {
    for (let i = 0; i < rows.length; i += size) await db.insert(table).values(rows.slice(i, i + size) as never);
  };

  // People: 200 in all (the demo's four among them); one password for every invented account.
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const roles = [
    ...Array(20).fill("adviser"),
    ...Array(12).fill("approver"),
    ...Array(4).fill("admin"),
    ...Array(160).fill("foreman"),
  ] as ("adviser" | "approver" | "admin" | "foreman")[];
  const people = roles.map((role, i) => {
    const name = `${FIRST[i % FIRST.length]} ${LAST[Math.floor(i / FIRST.length) % LAST.length]}`;
    return {
      id: randomUUID(),
      organisationId,
      role,
      name,
      email: `${name.toLowerCase().replace(/\s+/g, ".")}.${i}@brackenfold.example`,
      passwordHash,
      emailVerifiedAt: new Date(),
    };
  });
  await insert(schema.users, people);
  const demoPeople = await db.select().from(schema.users).where(eq(schema.users.organisationId, organisationId));
  const byRole = (role: string) => demoPeople.filter((p) => p.role === role);
  const advisers = byRole("adviser");
  const approvers = byRole("approver");
  const foremen = byRole("foreman");

  // Jobs, each with a few foremen assigned.
  const jobRows = Array.from({ length: 80 }, (_, i) => {
    const place = PLACES[i % PLACES.length];
    return {
      id: randomUUID(),
      organisationId,
      name: `${place}: package ${String(i + 1).padStart(3, "0")}`,
      client: "Wendmoor Railway Infrastructure",
      location: `${place}, ${rng.pick(["up", "down"])} side`,
      lineReference: "WHV (Wendmoor – Hollin Vale branch)",
      mileage: `${rng.int(2, 40)}m ${String(rng.int(0, 79)).padStart(2, "0")}ch`,
      createdBy: rng.pick(advisers).id,
    };
  });
  await insert(schema.jobs, jobRows);
  const assignments = jobRows.flatMap((job) =>
    Array.from(new Set([rng.pick(foremen), rng.pick(foremen), rng.pick(foremen)])).map((f) => ({
      organisationId,
      jobId: job.id,
      userId: f.id,
    })),
  );
  await insert(schema.jobAssignments, assignments);

  // The load register: five components an assessment, each name unique.
  const components = Array.from({ length: total * 5 }, (_, i) => ({
    organisationId,
    name: `${rng.pick(PRODUCTS)} ${rng.pick(["600", "900", "1000", "1200", "1500"])} mm (${rng.pick(MAKERS)}) #${String(i + 1).padStart(6, "0")}`,
    massKg: Math.round(rng.int(40, 4000)) / 10,
    grip: rng.pick(["good", "fair", "poor"] as const),
    massSource: rng.pick(["weighed", "datasheet", "datasheet", "estimated"] as const),
    lengthMm: rng.int(200, 2000),
    widthMm: rng.int(50, 800),
    heightMm: rng.int(20, 800),
  }));
  await insert(schema.components, components, 1000);
  console.log(`People, jobs and ${components.length} components in ${((Date.now() - started) / 1000).toFixed(0)} s`);

  // Each template's content, scored once by the engine against the demo register.
  const register = await db
    .select({
      id: schema.components.id,
      name: schema.components.name,
      massKg: schema.components.massKg,
      grip: schema.components.grip,
      massSource: schema.components.massSource,
    })
    .from(schema.components)
    .where(eq(schema.components.organisationId, organisationId))
    .limit(50);
  const scored = TEMPLATES.map((t) => {
    const content = t.build((name) => register.find((r) => r.name === name)?.id ?? null);
    const review = reviewContent(content, register);
    return {
      content,
      results: review.scores,
      worstBand: review.worstBand,
      hash: createHash("sha256").update(JSON.stringify(content)).digest("hex"),
    };
  });

  const signature = drawnSignaturePng(7);
  let written = 0;
  const BATCH = 500;
  for (let from = 0; from < total; from += BATCH) {
    const assessmentRows: (typeof Schema.assessments.$inferInsert)[] = [];
    const revisionRows: (typeof Schema.revisions.$inferInsert)[] = [];
    const auditRows: (AuditEntry & { createdAt: Date })[] = [];
    const briefingRows: (typeof Schema.briefings.$inferInsert)[] = [];
    const attendeeRows: (typeof Schema.briefingAttendees.$inferInsert)[] = [];
    for (let i = from; i < Math.min(total, from + BATCH); i++) {
      const job = rng.pick(jobRows);
      const author = rng.pick(advisers);
      const approver = rng.pick(approvers);
      const template = rng.pick(scored);
      const createdAt = new Date(now - rng.int(30, 3 * 365) * DAY - rng.int(0, DAY));
      const assessmentId = randomUUID();
      assessmentRows.push({
        id: assessmentId,
        organisationId,
        jobId: job.id,
        title: `${rng.pick(WORKS)} at ${job.name.split(":")[0]} (${String(i + 1).padStart(5, "0")})`,
        createdBy: author.id,
        createdAt,
      });
      const count = rng.next() < 0.6 ? 1 : rng.next() < 0.75 ? 2 : 3;
      let at = createdAt.getTime();
      for (let n = 1; n <= count; n++) {
        const latest = n === count;
        const status: (typeof STATUSES_OF_LATEST)[number] | "superseded" = latest
          ? rng.pick(STATUSES_OF_LATEST)
          : "superseded";
        const revisionId = randomUUID();
        const revisionCreated = new Date(at);
        at += rng.int(1, 20) * DAY;
        const submittedAt = status === "draft" ? null : new Date(at);
        const approvedAt = status === "approved" || status === "superseded" ? new Date(at + rng.int(1, 5) * DAY) : null;
        const updatedAt = new Date(
          Math.min(now - 60_000, (approvedAt ?? submittedAt ?? revisionCreated).getTime() + rng.int(0, DAY)),
        );
        const reviewDate =
          status === "draft"
            ? null
            : new Date(updatedAt.getTime() + rng.int(-60, 365) * DAY).toISOString().slice(0, 10);
        revisionRows.push({
          id: revisionId,
          organisationId,
          assessmentId,
          number: n,
          status,
          isLatest: latest,
          content: template.content,
          results: template.results,
          worstBand: template.worstBand,
          contentHash: status === "draft" ? null : template.hash,
          authorId: author.id,
          approverId: status === "draft" ? null : approver.id,
          reviewDate,
          submittedAt,
          approvedAt,
          createdAt: revisionCreated,
          updatedAt,
        });
        const audit = (action: string, actorId: string, when: Date) =>
          auditRows.push({
            organisationId,
            actorId,
            action,
            entityType: "revision",
            entityId: revisionId,
            contentHash: template.hash,
            createdAt: when,
          });
        audit(n === 1 ? "assessment.created" : "revision.started", author.id, revisionCreated);
        if (submittedAt) audit("revision.submitted", author.id, submittedAt);
        if (approvedAt) audit("revision.approved", approver.id, approvedAt);
        if (status === "superseded") audit("revision.superseded", approver.id, new Date(at + 6 * DAY));
        if (approvedAt && rng.next() < 0.3) {
          const foreman = rng.pick(foremen);
          const briefingId = randomUUID();
          const startedAt = new Date(approvedAt.getTime() + rng.int(1, 10) * DAY);
          briefingRows.push({
            id: briefingId,
            organisationId,
            revisionId,
            foremanId: foreman.id,
            foremanName: foreman.name,
            place: job.location,
            startedAt,
            completedAt: new Date(startedAt.getTime() + 20 * 60_000),
            foremanSignature: signature,
          });
          for (let k = 0; k < rng.int(2, 6); k++)
            attendeeRows.push({
              organisationId,
              briefingId,
              idempotencyKey: randomUUID(),
              name: `${rng.pick(FIRST)} ${rng.pick(LAST)}`,
              employer: "Brackenfold Lineside Ltd",
              cardNumber: `PTS ${rng.int(10000, 99999)}`,
              signature,
              signedAt: new Date(startedAt.getTime() + k * 60_000),
            });
        }
      }
    }
    await db.transaction(async (tx) => {
      await tx.insert(schema.assessments).values(assessmentRows);
      for (let i = 0; i < revisionRows.length; i += 200)
        await tx.insert(schema.revisions).values(revisionRows.slice(i, i + 200));
      // Chained like every event (lib/audit.ts), in the order written.
      let head = await lockedChainHead(tx, organisationId);
      const chained = auditRows.map(({ createdAt, ...entry }) => (head = chainEvent(entry, head, createdAt)));
      for (let i = 0; i < chained.length; i += 1000)
        await tx.insert(schema.auditEvents).values(chained.slice(i, i + 1000));
      if (briefingRows.length) await tx.insert(schema.briefings).values(briefingRows);
      for (let i = 0; i < attendeeRows.length; i += 500)
        await tx.insert(schema.briefingAttendees).values(attendeeRows.slice(i, i + 500));
    });
    written += assessmentRows.length;
    process.stdout.write(`\r${written} of ${total} assessments`);
  }
  process.stdout.write("\n");
  // Fresh statistics for the planner, as a database that grew over years would have.
  await db.execute(sql`vacuum analyze`);
  console.log(
    `Scale dataset written in ${((Date.now() - started) / 1000).toFixed(0)} s. Sign in as any demo user (password ${DEMO_PASSWORD}).`,
  );
  await closeDb();
}

main().catch((err) => {
  console.error(`seed:scale failed: ${(err as Error).message}`);
  process.exit(1);
});
