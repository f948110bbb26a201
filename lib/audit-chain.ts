/**
 * The audit trail's hash chain, pure. Each event's hash covers its own fields and the previous
 * event's hash in the same organisation, so editing an event, removing one or changing their order
 * breaks a link that `findBrokenLink` reports. The newest hash (the chain's head) vouches for
 * everything before it: noted down or exported elsewhere, it also shows if newest events were removed.
 */
import { createHash } from "node:crypto";

export interface ChainedEvent {
  id: string;
  organisationId: string;
  seq: number;
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  contentHash: string | null;
  details: unknown;
  createdAt: Date;
  prevHash: string | null;
}

/** JSON with object keys sorted at every depth: the same value gives the same text however it was stored. */
export function canonicalJson(value: unknown): string {
  if (value === null || value === undefined) return "null";
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (typeof value === "object")
    return `{${Object.keys(value as object)
      .sort()
      .filter((k) => (value as Record<string, unknown>)[k] !== undefined)
      .map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`)
      .join(",")}}`;
  return JSON.stringify(value);
}

export function eventHash(e: ChainedEvent): string {
  const fields = [
    e.seq,
    e.prevHash,
    e.id,
    e.organisationId,
    e.actorId,
    e.action,
    e.entityType,
    e.entityId,
    e.contentHash,
    e.details ?? null,
    e.createdAt.toISOString(),
  ];
  return createHash("sha256").update(canonicalJson(fields)).digest("hex");
}

export type BrokenLink =
  | { seq: number; id: string | null; reason: "missing" | "unlinked" | "altered" | "unsealed" }
  | { seq: number; id: string; reason: "out-of-order" };

export const BROKEN_LINK_TEXT: Record<BrokenLink["reason"], string> = {
  missing: "An event is missing here: the numbering skips.",
  unlinked: "This event does not carry the previous event's hash: an event before it was removed or replaced.",
  altered: "This event's fields no longer match its hash: it was changed after it was recorded.",
  unsealed: "This event was never sealed into the chain.",
  "out-of-order": "This event's number is out of order.",
};

/**
 * Walks events in `seq` order, page by page, carrying what the next page must link to. Returns the
 * first broken link of this page, or the state to continue with.
 */
export function findBrokenLink(
  events: readonly (ChainedEvent & { hash: string | null })[],
  from: { seq: number; hash: string | null },
): { broken: BrokenLink } | { next: { seq: number; hash: string | null } } {
  let expected = from.seq + 1;
  let prev = from.hash;
  for (const e of events) {
    if (e.seq < expected) return { broken: { seq: e.seq, id: e.id, reason: "out-of-order" } };
    if (e.seq > expected) return { broken: { seq: expected, id: null, reason: "missing" } };
    if (e.hash === null) return { broken: { seq: e.seq, id: e.id, reason: "unsealed" } };
    if (e.prevHash !== prev) return { broken: { seq: e.seq, id: e.id, reason: "unlinked" } };
    if (eventHash(e) !== e.hash) return { broken: { seq: e.seq, id: e.id, reason: "altered" } };
    prev = e.hash;
    expected++;
  }
  return { next: { seq: expected - 1, hash: prev } };
}
