/**
 * The phone's own database (IndexedDB, through idb) for the foreman's side: briefings started on the
 * phone, the records waiting to be sent, and what the phone last learnt of the foreman's approved
 * revisions. Everything is per person: another foreman signing in on the same phone sees only theirs.
 */
import { openDB, type DBSchema, type IDBPDatabase } from "idb";
import type { BriefableRevisions } from "@/assessments/briefing/queries";

/** A briefing as the phone knows it; `serverId` once the server has its start. */
export interface PhoneBriefing {
  key: string;
  userId: string;
  revisionId: string;
  revisionNumber: number;
  title: string;
  jobName: string;
  place: string;
  startedAt: string;
  serverId?: string;
  /** The revision had been superseded when the start arrived: the briefing is recorded as such. */
  superseded?: { revisionNumber: number; currentRevisionNumber: number | null } | null;
}

export type RecordKind = "start" | "sign-on" | "sign-off";

/** One record waiting on the phone, sent once and in order (`seq`) with its key. */
export interface OutgoingRecord {
  seq?: number;
  userId: string;
  briefingKey: string;
  kind: RecordKind;
  /** Who or what it is, for the screen: the person signing on, the foreman signing off. */
  label: string;
  body: Record<string, unknown>;
  state: "waiting" | "sent" | "refused";
  /** Why it was refused, or why it is still waiting (signed out, the server busy). */
  problem?: string;
  createdAt: string;
  sentAt?: string;
}

export type BriefableRevision = BriefableRevisions["revisions"][number];

/** What the phone last learnt of the foreman's approved revisions, and when. */
export interface CopiesState {
  userId: string;
  /** When the copies were last brought up to date from the server (null: never). */
  updatedAt: string | null;
  revisions: BriefableRevision[];
  /** Revisions whose copy was dropped because a newer one replaced them (or they were withdrawn). */
  replaced: { revisionId: string; title: string; jobName: string; number: number; newer: number | null; at: string }[];
  problem?: string;
}

interface PhoneDb extends DBSchema {
  briefings: { key: string; value: PhoneBriefing; indexes: { user: string } };
  outbox: { key: number; value: OutgoingRecord; indexes: { user: string; briefing: string } };
  copies: { key: string; value: CopiesState };
}

let opened: Promise<IDBPDatabase<PhoneDb>> | null = null;

export function phoneDb(): Promise<IDBPDatabase<PhoneDb>> {
  // Ask the browser not to clear the phone's records and copies when storage runs low; a browser
  // may grant it silently, ask the person, or decline (then they are kept as long as it allows).
  if (!opened) void navigator.storage?.persist?.().catch(() => false);
  opened ??= openDB<PhoneDb>("heftwise-phone", 1, {
    upgrade(db) {
      db.createObjectStore("briefings", { keyPath: "key" }).createIndex("user", "userId");
      const outbox = db.createObjectStore("outbox", { keyPath: "seq", autoIncrement: true });
      outbox.createIndex("user", "userId");
      outbox.createIndex("briefing", "briefingKey");
      db.createObjectStore("copies", { keyPath: "userId" });
    },
  });
  return opened;
}

const CHANGED = "heftwise-phone-changed";
const channel = typeof BroadcastChannel === "undefined" ? null : new BroadcastChannel(CHANGED);

/** Tells every open screen (this tab and others) that the phone's records changed. */
export function announceChange() {
  window.dispatchEvent(new Event(CHANGED));
  channel?.postMessage(CHANGED);
}

export function onChange(listener: () => void): () => void {
  window.addEventListener(CHANGED, listener);
  channel?.addEventListener("message", listener);
  return () => {
    window.removeEventListener(CHANGED, listener);
    channel?.removeEventListener("message", listener);
  };
}

/**
 * Whether Heftwise was reachable at the last attempt (null: not tried yet). The browser's own online
 * flag only says a network is joined; at an access point a phone often has one without internet.
 */
let reachable: boolean | null = null;

export const lastContact = () => reachable;

export function noteContact(ok: boolean) {
  if (reachable === ok) return;
  reachable = ok;
  announceChange();
}

/** Asks the server whether it can be reached, cheaply. */
export async function probe(): Promise<boolean> {
  try {
    const response = await fetch("/api/health", { cache: "no-store" });
    noteContact(response.ok);
  } catch {
    noteContact(false);
  }
  return reachable === true;
}

/** Starts a briefing on the phone: it exists at once, and its start waits to be sent. */
export async function startOnPhone(briefing: PhoneBriefing): Promise<void> {
  const db = await phoneDb();
  const tx = db.transaction(["briefings", "outbox"], "readwrite");
  await tx.objectStore("briefings").put(briefing);
  await tx.objectStore("outbox").add({
    userId: briefing.userId,
    briefingKey: briefing.key,
    kind: "start",
    label: `Briefing at ${briefing.place}`,
    body: {
      key: briefing.key,
      revisionId: briefing.revisionId,
      place: briefing.place,
      startedAt: briefing.startedAt,
    },
    state: "waiting",
    createdAt: briefing.startedAt,
  });
  await tx.done;
  announceChange();
}

/** Keeps a sign-on or the sign-off on the phone until it is sent. */
export async function keepOnPhone(record: Omit<OutgoingRecord, "seq" | "state" | "createdAt">): Promise<void> {
  const db = await phoneDb();
  await db.add("outbox", { ...record, state: "waiting", createdAt: new Date().toISOString() });
  announceChange();
}

export async function briefingsOf(userId: string): Promise<PhoneBriefing[]> {
  return (await phoneDb()).getAllFromIndex("briefings", "user", userId);
}

export async function recordsOf(userId: string): Promise<OutgoingRecord[]> {
  return (await phoneDb()).getAllFromIndex("outbox", "user", userId);
}

export async function copiesOf(userId: string): Promise<CopiesState | undefined> {
  return (await phoneDb()).get("copies", userId);
}

/** A random key, also where crypto.randomUUID is missing (plain http on a site network). */
export function newKey(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("");
}
