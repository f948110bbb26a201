/**
 * The audit trail: who did what, when, and — for signatures — how they proved who they were. Every
 * event is chained to the one before it in its organisation (lib/audit-chain.ts), so the trail is
 * tamper-evident.
 */
import { randomUUID } from "node:crypto";
import { and, asc, desc, eq, isNull, sql } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { auditEvents } from "@/db/schema";
import { eventHash, type ChainedEvent } from "./audit-chain";

/** How the person behind an event was authenticated, recorded beside what they did. */
export interface AuthRecord {
  /** "session" (signed in), "token" (an API token) or "step-up" (re-asked at the moment of signing). */
  via: "session" | "token" | "step-up";
  /** e.g. "password", "password+authenticator", "password+recovery-code", "api-token". */
  method: string;
  address: string | null;
  client: string | null;
}

export interface AuditEntry {
  organisationId: string;
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  contentHash?: string | null;
  details?: Record<string, unknown>;
  auth?: AuthRecord | null;
}

/** Takes the organisation's chain for the rest of the transaction: one writer at a time appends. */
async function lockChain(tx: Tx, organisationId: string) {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${`audit:${organisationId}`}, 0))`);
}

/**
 * Events recorded before the chain existed (migration 0010 numbered them, unhashed) are sealed in
 * order by the first chained write of their organisation.
 */
async function sealBacklog(tx: Tx, organisationId: string): Promise<{ seq: number; hash: string | null }> {
  const backlog = await tx
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.organisationId, organisationId), isNull(auditEvents.hash)))
    .orderBy(asc(auditEvents.seq));
  const [before] = backlog.length
    ? await tx
        .select({ seq: auditEvents.seq, hash: auditEvents.hash })
        .from(auditEvents)
        .where(and(eq(auditEvents.organisationId, organisationId), sql`${auditEvents.seq} < ${backlog[0].seq}`))
        .orderBy(desc(auditEvents.seq))
        .limit(1)
    : [];
  let prevHash = before?.hash ?? null;
  let seq = before?.seq ?? 0;
  for (const e of backlog) {
    seq = e.seq;
    const hash = eventHash({ ...e, prevHash });
    await tx.update(auditEvents).set({ prevHash, hash }).where(eq(auditEvents.id, e.id));
    prevHash = hash;
  }
  return { seq, hash: prevHash };
}

/** The chain's newest link, sealing any backlog first. Call with the chain locked. */
async function chainHead(tx: Tx, organisationId: string): Promise<{ seq: number; hash: string | null }> {
  const [last] = await tx
    .select({ seq: auditEvents.seq, hash: auditEvents.hash })
    .from(auditEvents)
    .where(eq(auditEvents.organisationId, organisationId))
    .orderBy(desc(auditEvents.seq))
    .limit(1);
  if (!last) return { seq: 0, hash: null };
  return last.hash === null ? sealBacklog(tx, organisationId) : last;
}

/** The row to insert for an event following `head`, with its hash. Pure apart from the id and clock. */
export function chainEvent(
  entry: AuditEntry,
  head: { seq: number; hash: string | null },
  at = new Date(),
  id: string = randomUUID(),
): ChainedEvent & { hash: string } {
  const details = entry.auth ? { ...entry.details, auth: entry.auth } : (entry.details ?? null);
  const event: ChainedEvent = {
    id,
    organisationId: entry.organisationId,
    seq: head.seq + 1,
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    contentHash: entry.contentHash ?? null,
    details,
    createdAt: at,
    prevHash: head.hash,
  };
  return { ...event, hash: eventHash(event) };
}

/**
 * Records who did what, when — inside the caller's transaction, so the event and the change land
 * together (or neither does), chained to the organisation's previous event.
 */
export async function recordAudit(tx: Tx, entry: AuditEntry): Promise<{ id: string; seq: number }> {
  await lockChain(tx, entry.organisationId);
  const event = chainEvent(entry, await chainHead(tx, entry.organisationId));
  await tx.insert(auditEvents).values(event);
  return { id: event.id, seq: event.seq };
}

/** The head of an organisation's chain, for bulk writers that chain rows themselves (the scale seed). */
export async function lockedChainHead(tx: Tx, organisationId: string) {
  await lockChain(tx, organisationId);
  return chainHead(tx, organisationId);
}
