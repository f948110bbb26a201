/**
 * A revision's signing record: each event of its life from the audit trail — drafted, submitted,
 * returned, approved, briefed — who, when, and how they were authenticated, with the event's place
 * and hash in the organisation's chain so that the record can be matched against the trail.
 */
import { and, asc, eq } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { auditEvents, users } from "@/db/schema";
import type { AuthRecord } from "@/lib/audit";

/** What each event of a revision's life is called, in the pack and on the audit page alike. */
export const LIFE_EVENTS: Record<string, string> = {
  "assessment.created": "Drafted (new assessment)",
  "revision.started": "Drafted (new revision)",
  "revision.submitted": "Submitted for approval",
  "revision.returned": "Returned with comments",
  "revision.approved": "Approved and countersigned",
  "revision.pack-issued": "Signed pack issued",
  "briefing.started": "Briefing started",
  "briefing.completed": "Briefed and signed off",
  "revision.site-change": "Site change noted",
  "revision.superseded": "Superseded",
};

export interface SigningRecordEntry {
  seq: number;
  hash: string | null;
  event: string;
  who: string;
  at: Date;
  contentHash: string | null;
  how: string;
}

/** Events Heftwise records as the consequence of another (the pack issued on approval, a revision superseded). */
const FOLLOW_ON = new Set(["revision.pack-issued", "revision.superseded"]);

/** How the person behind an event was authenticated, in words; a follow-on event says so (pure). */
export function describeEventAuth(action: string, details: unknown): string {
  const auth = (details as { auth?: AuthRecord } | null)?.auth;
  return !auth && FOLLOW_ON.has(action) ? "follows from the event before" : describeAuth(auth);
}

/** How someone was authenticated, in words (pure). */
export function describeAuth(auth: AuthRecord | undefined | null): string {
  if (!auth) return "not recorded";
  const method = auth.method.replaceAll("+", " + ").replaceAll("-", " ");
  const how =
    auth.via === "step-up"
      ? `re-confirmed at signing: ${method}`
      : auth.via === "token"
        ? "API token"
        : `signed-in session (${method})`;
  const from = [auth.address && `from ${auth.address}`, auth.client && `using ${clientName(auth.client)}`]
    .filter(Boolean)
    .join(", ");
  return from ? `${how}; ${from}` : how;
}

/** A User-Agent shortened to what a reader recognises: the browser and the system (pure). */
export function clientName(agent: string): string {
  const browser =
    /Edg\/[\d.]+/.exec(agent)?.[0].replace("Edg", "Edge") ??
    /(Firefox|Chrome|Chromium|Version)\/[\d]+/.exec(agent)?.[0].replace("Version", "Safari") ??
    null;
  const system = /\(([^;)]+)/.exec(agent)?.[1] ?? null;
  return browser ? `${browser}${system ? ` on ${system}` : ""}` : agent.slice(0, 60);
}

export async function signingRecord(db: Queryable, organisationId: string, revisionId: string) {
  const rows = await db
    .select({
      seq: auditEvents.seq,
      hash: auditEvents.hash,
      action: auditEvents.action,
      createdAt: auditEvents.createdAt,
      contentHash: auditEvents.contentHash,
      details: auditEvents.details,
      actorName: users.name,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(
      and(
        eq(auditEvents.organisationId, organisationId),
        eq(auditEvents.entityType, "revision"),
        eq(auditEvents.entityId, revisionId),
      ),
    )
    .orderBy(asc(auditEvents.seq));
  return rows
    .filter((r) => r.action in LIFE_EVENTS)
    .map((r): SigningRecordEntry => ({
      seq: r.seq,
      hash: r.hash,
      event: LIFE_EVENTS[r.action],
      who: r.actorName ?? "a former user",
      at: r.createdAt,
      contentHash: r.contentHash,
      how: describeAuth((r.details as { auth?: AuthRecord } | null)?.auth),
    }));
}
