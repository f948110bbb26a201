import type { Queryable } from "@/db/client";
import { auditEvents } from "@/db/schema";

export interface AuditEntry {
  organisationId: string;
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  contentHash?: string | null;
  details?: Record<string, unknown>;
}

/** Records who did what, when — inside the caller's transaction, so the event and the change land together. */
export async function recordAudit(tx: Queryable, entry: AuditEntry): Promise<void> {
  await tx
    .insert(auditEvents)
    .values({ ...entry, contentHash: entry.contentHash ?? null, details: entry.details ?? null });
}
