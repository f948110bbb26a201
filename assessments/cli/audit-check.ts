/**
 * `npm run audit:check [-- --organisation ID]`: checks every organisation's audit chain (or one)
 * and prints, for each, "intact" with the number of events and the head hash, or the first broken
 * link. Exit 0 when all are intact, 1 when any link is broken, 2 on bad input.
 */
import { parseArgs } from "node:util";

async function main(): Promise<number> {
  let organisation: string | undefined;
  try {
    ({
      values: { organisation },
    } = parseArgs({ options: { organisation: { type: "string" } } }));
  } catch (err) {
    process.stderr.write(`${(err as Error).message}\nusage: npm run audit:check [-- --organisation ID]\n`);
    return 2;
  }
  const { getDb, closeDb } = await import("@/db/client");
  const { organisations } = await import("@/db/schema");
  const { checkChain } = await import("@/assessments/audit-trail/queries");
  const { isUuid } = await import("@/lib/ids");
  const { asc, eq } = await import("drizzle-orm");
  if (organisation !== undefined && !isUuid(organisation)) {
    process.stderr.write("--organisation: give the organisation's id (a UUID)\n");
    return 2;
  }
  const db = await getDb();
  const orgs = await db
    .select({ id: organisations.id, name: organisations.name })
    .from(organisations)
    .where(organisation ? eq(organisations.id, organisation) : undefined)
    .orderBy(asc(organisations.name));
  if (organisation && !orgs.length) {
    process.stderr.write(`No organisation ${organisation}\n`);
    await closeDb();
    return 2;
  }
  let broken = 0;
  for (const org of orgs) {
    const report = await checkChain(org.id, db);
    if (report.intact)
      process.stdout.write(
        `${org.name} (${org.id}): intact, ${report.checked} events, head #${report.head.seq} ${report.head.hash ?? "-"}\n`,
      );
    else {
      broken++;
      process.stdout.write(
        `${org.name} (${org.id}): BROKEN at event #${report.broken.seq}${report.broken.id ? ` (${report.broken.id})` : ""}: ${report.broken.explanation} ${report.checked} events before it are intact.\n`,
      );
    }
  }
  await closeDb();
  return broken ? 1 : 0;
}

main().then((code) => (process.exitCode = code));
