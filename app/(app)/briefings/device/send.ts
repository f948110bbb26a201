/**
 * Sends what waits on the phone, once and in order: a briefing's start, then its sign-ons, then the
 * sign-off. Each carries the key made on the phone, so sending again after a lost answer records
 * nothing twice. No answer (no signal, the server busy, signed out) stops the run and keeps the rest
 * waiting; a refusal marks that record refused with the reason, and a refused start refuses what
 * belongs to it.
 */
import { ApiError, apiRequest, problemOf } from "@/lib/api-client";
import type { StartedBriefing } from "@/assessments/briefing/service";
import { bringCopiesUpToDate } from "./copies";
import { announceChange, noteContact, phoneDb, type OutgoingRecord, type PhoneBriefing } from "./store";

let running: Promise<void> | null = null;

/** Sends what waits for this person; a second call while one runs waits for that run. */
export function sendWaiting(userId: string): Promise<void> {
  running ??= run(userId).finally(() => {
    running = null;
  });
  return running;
}

const SIGNED_OUT = "Waiting: sign in again to send (the phone's session has ended).";

async function run(userId: string) {
  const db = await phoneDb();
  const waiting = (await db.getAllFromIndex("outbox", "user", userId))
    .filter((r) => r.state === "waiting")
    .sort((a, b) => a.seq! - b.seq!);
  for (const record of waiting) {
    const briefing = await db.get("briefings", record.briefingKey);
    if (!briefing) {
      await settle(record, { state: "refused", problem: "The briefing is no longer on this phone." });
      continue;
    }
    if (record.kind !== "start" && !briefing.serverId) {
      const start = (await db.getAllFromIndex("outbox", "briefing", briefing.key)).find((r) => r.kind === "start");
      if (start?.state === "refused") {
        await settle(record, {
          state: "refused",
          problem: `Not sent: the briefing itself was refused (${start.problem})`,
        });
        continue;
      }
      break; // Its start has not gone yet: keep the order.
    }
    try {
      await send(record, briefing);
      noteContact(true);
      await settle(record, { state: "sent", problem: undefined, sentAt: new Date().toISOString() });
    } catch (err) {
      noteContact(!(err instanceof ApiError && err.offline));
      if (err instanceof ApiError && err.status === 401) {
        await settle(record, { state: "waiting", problem: SIGNED_OUT });
        break;
      }
      if (!(err instanceof ApiError) || err.retryable) {
        if (record.problem) await settle(record, { state: "waiting", problem: undefined });
        break;
      }
      await settle(record, { state: "refused", problem: problemOf(err) });
    }
  }
}

async function send(record: OutgoingRecord, briefing: PhoneBriefing) {
  if (record.kind === "start") {
    const started = await apiRequest<StartedBriefing>("/api/v1/briefings", { json: record.body });
    const db = await phoneDb();
    await db.put("briefings", { ...briefing, serverId: started.briefingId, superseded: started.superseded });
    // The phone's copy is out of date: replace it now, not at the next scheduled update.
    if (started.superseded) void bringCopiesUpToDate(record.userId, { force: true });
    return;
  }
  const path = record.kind === "sign-on" ? "attendees" : "complete";
  await apiRequest(`/api/v1/briefings/${briefing.serverId}/${path}`, { json: record.body });
}

async function settle(record: OutgoingRecord, change: Partial<OutgoingRecord>) {
  const db = await phoneDb();
  await db.put("outbox", { ...record, ...change });
  announceChange();
}
