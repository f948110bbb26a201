/**
 * `npm run org:create -- --organisation "Name" --name "First Admin" --email admin@example.com`:
 * creates an organisation and its first administrator for a managed install. The operator vouches
 * for the address; the administrator gets the invitation e-mail to set a password (SMTP_URL).
 * Exit 0 when created, 2 on bad input (listed), 1 when it could not be done.
 */
import { parseArgs } from "node:util";

const USAGE = 'usage: npm run org:create -- --organisation "Name" --name "First Admin" --email admin@example.com\n';

async function main(): Promise<number> {
  let values: Record<string, string | undefined>;
  try {
    ({ values } = parseArgs({
      options: { organisation: { type: "string" }, name: { type: "string" }, email: { type: "string" } },
    }));
  } catch (err) {
    process.stderr.write(`${(err as Error).message}\n${USAGE}`);
    return 2;
  }
  const { getDb, closeDb } = await import("@/db/client");
  const { organisationCliSchema } = await import("@/lib/organisations/schemas");
  const { createOrganisation } = await import("@/lib/organisations/service");
  const { inviteFirstAdministrator } = await import("@/lib/users/service");
  const { AppError } = await import("@/lib/errors");
  const parsed = organisationCliSchema.safeParse(values);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) process.stderr.write(`--${issue.path.join(".")}: ${issue.message}\n`);
    process.stderr.write(USAGE);
    return 2;
  }
  try {
    const db = await getDb();
    const { organisation, admin, send } = await db.transaction(async (tx) => {
      const created = await createOrganisation(tx, { ...parsed.data, passwordHash: null, verified: true });
      return { ...created, send: await inviteFirstAdministrator(tx, created.admin) };
    });
    const mail = await send();
    process.stdout.write(
      `Created "${organisation.name}" (${organisation.id}) with administrator ${admin.email}.\n` +
        (mail.status === "sent"
          ? "The invitation to set a password was e-mailed.\n"
          : `The invitation e-mail could not be sent (${mail.error}); resend it from People once SMTP works.\n`),
    );
    await closeDb();
    return 0;
  } catch (err) {
    if (err instanceof AppError) {
      process.stderr.write(`${err.message}\n`);
      for (const issue of err.issues ?? []) process.stderr.write(`--${issue.path}: ${issue.message}\n`);
      await closeDb();
      return err.issues ? 2 : 1;
    }
    throw err;
  }
}

main().then((code) => (process.exitCode = code));
