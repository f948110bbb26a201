/**
 * Reading the organisation's audit trail as a whole: checking its hash chain link by link, and
 * exporting it as CSV. Both walk the trail in pages, in chain order, so a long trail never sits in
 * memory at once.
 */
import "server-only";
import { and, asc, eq, gt } from "drizzle-orm";
import Papa from "papaparse";
import { getDb, type Queryable } from "@/db/client";
import { auditEvents, users } from "@/db/schema";
import { BROKEN_LINK_TEXT, findBrokenLink, type BrokenLink } from "@/lib/audit-chain";
import { authorize, type Actor } from "@/lib/permissions";
import { neutraliseFormula } from "../load-register/csv-cells";

const PAGE = 2000;

async function* chainPages(db: Queryable, organisationId: string) {
  let after = 0;
  for (;;) {
    const rows = await db
      .select({
        id: auditEvents.id,
        organisationId: auditEvents.organisationId,
        seq: auditEvents.seq,
        actorId: auditEvents.actorId,
        action: auditEvents.action,
        entityType: auditEvents.entityType,
        entityId: auditEvents.entityId,
        contentHash: auditEvents.contentHash,
        details: auditEvents.details,
        createdAt: auditEvents.createdAt,
        prevHash: auditEvents.prevHash,
        hash: auditEvents.hash,
        actorName: users.name,
        actorEmail: users.email,
      })
      .from(auditEvents)
      .leftJoin(users, eq(users.id, auditEvents.actorId))
      .where(and(eq(auditEvents.organisationId, organisationId), gt(auditEvents.seq, after)))
      .orderBy(asc(auditEvents.seq))
      .limit(PAGE);
    if (!rows.length) return;
    yield rows;
    after = rows[rows.length - 1].seq;
  }
}

export type ChainReport =
  | { intact: true; checked: number; head: { seq: number; hash: string | null } }
  | { intact: false; checked: number; broken: BrokenLink & { explanation: string } };

/** Checks an organisation's chain from the first event; reports the first broken link (no permission check: the CLI's). */
export async function checkChain(organisationId: string, db?: Queryable): Promise<ChainReport> {
  const q = db ?? (await getDb());
  let state = { seq: 0, hash: null as string | null };
  let checked = 0;
  for await (const rows of chainPages(q, organisationId)) {
    const result = findBrokenLink(rows, state);
    if ("broken" in result) {
      checked += rows.findIndex((r) => r.seq >= result.broken.seq);
      return {
        intact: false,
        checked,
        broken: { ...result.broken, explanation: BROKEN_LINK_TEXT[result.broken.reason] },
      };
    }
    state = result.next;
    checked += rows.length;
  }
  return { intact: true, checked, head: state };
}

export async function checkAuditChain(actor: Actor | null): Promise<ChainReport> {
  authorize(actor, "audit:read");
  return checkChain(actor.organisationId);
}

const CSV_FIELDS = [
  "seq",
  "time_utc",
  "actor",
  "actor_email",
  "action",
  "entity_type",
  "entity_id",
  "content_hash",
  "details",
  "prev_hash",
  "hash",
];

/** The whole trail as CSV chunks, oldest first; text a spreadsheet would run as a formula is neutralised. */
export async function* exportAuditCsv(actor: Actor | null): AsyncGenerator<string> {
  authorize(actor, "audit:read");
  const db = await getDb();
  yield CSV_FIELDS.join(",") + "\r\n";
  for await (const rows of chainPages(db, actor.organisationId)) {
    yield (
      Papa.unparse(
        rows.map((r) => [
          r.seq,
          r.createdAt.toISOString(),
          neutraliseFormula(r.actorName ?? ""),
          neutraliseFormula(r.actorEmail ?? ""),
          r.action,
          r.entityType,
          r.entityId ?? "",
          r.contentHash ?? "",
          neutraliseFormula(r.details ? JSON.stringify(r.details) : ""),
          r.prevHash ?? "",
          r.hash ?? "",
        ]),
      ) + "\r\n"
    );
  }
}
