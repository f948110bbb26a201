import { desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { outboundEmails } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";

/** The organisation's outbound e-mail log, newest first. */
export async function listOutboundEmails(actor: Actor | null, limit = 100) {
  authorize(actor, "mail-log:read");
  const db = await getDb();
  return db
    .select()
    .from(outboundEmails)
    .where(eq(outboundEmails.organisationId, actor.organisationId))
    .orderBy(desc(outboundEmails.createdAt))
    .limit(limit);
}
