/**
 * `npm run --silent pack -- --demo --out FILE`: writes the signed pack of the demo scenario's
 * approved assessment. It builds the scenario in a throwaway in-memory database (never touching
 * ./data), with a local mail fake taking the workflow's e-mails.
 */
import { writeFileSync } from "node:fs";
import { parseArgs } from "node:util";

const { values } = parseArgs({ options: { demo: { type: "boolean", default: false }, out: { type: "string" } } });
if (!values.demo || !values.out) {
  process.stderr.write("usage: npm run --silent pack -- --demo --out FILE\n");
  process.exit(2);
}

process.env.HEFTWISE_DATA_DIR = "memory://";
delete process.env.DATABASE_URL;

async function main(out: string) {
  const { startMailFake } = await import("@/lib/mail/fake-server");
  const fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
  try {
    const { getDb, closeDb } = await import("@/db/client");
    const { seedDemo } = await import("@/assessments/demo/seed");
    const { DEMO_USERS, DEMO_PASSWORD } = await import("@/assessments/demo/scenario");
    const { users } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    const { getRevision } = await import("@/assessments/revisions/service");
    const { listAssessments } = await import("@/assessments/revisions/queries");
    const { submitRevision, approveRevision, getPackFile } = await import("@/assessments/revisions/approval");
    const { drawnSignaturePng } = await import("@/lib/png");

    const db = await getDb();
    await seedDemo(db);
    const actor = async (role: string) => {
      const email = DEMO_USERS.find((u) => u.role === role)!.email;
      const [u] = await db.select().from(users).where(eq(users.email, email));
      return { id: u.id, organisationId: u.organisationId, role: u.role, name: u.name, email: u.email };
    };
    const adviser = await actor("adviser");
    const approver = await actor("approver");
    const revisionId = (await listAssessments(adviser)).find((a) => a.title.includes("lorry-loader"))!.revisionId;
    const draft = await getRevision(adviser, revisionId);
    await submitRevision(adviser, revisionId, {
      version: draft.revision.version,
      approverId: approver.id,
      reviewDate: new Date(Date.now() + 182 * 86_400_000).toISOString().slice(0, 10),
    });
    const submitted = await getRevision(adviser, revisionId);
    await approveRevision(approver, revisionId, {
      version: submitted.revision.version,
      name: approver.name,
      role: "Contracts manager",
      signature: `data:image/png;base64,${drawnSignaturePng(3).toString("base64")}`,
      contentHash: submitted.revision.contentHash,
      password: DEMO_PASSWORD,
    });
    const pack = await getPackFile(adviser, revisionId);
    writeFileSync(out, pack.data);
    process.stderr.write(`wrote ${out} (${pack.data.byteLength} bytes, signed)\n`);
    await closeDb();
  } finally {
    await fake.close();
  }
}

main(values.out).catch((err) => {
  process.stderr.write(`pack failed: ${(err as Error).message}\n`);
  process.exit(1);
});
