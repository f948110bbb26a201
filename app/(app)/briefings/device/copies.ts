/**
 * Brings the phone's copies up to date while there is signal: the start page, the list of briefings,
 * and each approved revision's briefing page and sheet go into the cache the service worker answers
 * from without signal (lib/device-copies.ts). A copy of a revision no longer approved is dropped, and
 * the phone remembers that it was replaced and by which revision.
 */
import type { BriefableRevisions } from "@/assessments/briefing/queries";
import { apiRequest, problemOf } from "@/lib/api-client";
import { DEVICE_COPIES_CACHE } from "@/lib/device-copies";
import { ApiError } from "@/lib/api-client";
import { announceChange, noteContact, phoneDb, type CopiesState } from "./store";

/** Without a secure connection (plain http on a site network) a browser keeps no copies. */
export const canKeepCopies = () => typeof window !== "undefined" && "caches" in window && window.isSecureContext;

/** The pages and sheets are fetched again at most this often while nothing changed (Heftwise policy). */
const AT_MOST_EVERY_MS = 60_000;
let running: Promise<CopiesState | undefined> | null = null;

/** One update at a time; one asked for with `force` while another runs follows it, never merges into it. */
export function bringCopiesUpToDate(userId: string, { force = false } = {}): Promise<CopiesState | undefined> {
  const next = () => update(userId, force);
  const mine = running ? (force ? running.then(next, next) : running) : next();
  running = mine;
  void mine.finally(() => {
    if (running === mine) running = null;
  });
  return mine;
}

async function update(userId: string, force: boolean): Promise<CopiesState | undefined> {
  const db = await phoneDb();
  const previous = await db.get("copies", userId);
  if (!navigator.onLine || !canKeepCopies()) return previous;
  // The list is small and always asked for: a newer revision shows at once.
  let list: BriefableRevisions;
  try {
    list = await apiRequest<BriefableRevisions>("/api/v1/briefings/briefable");
    noteContact(true);
  } catch (err) {
    noteContact(!(err instanceof ApiError && err.offline));
    const state = { ...emptyState(userId), ...previous, problem: problemOf(err) };
    await db.put("copies", state);
    announceChange();
    return state;
  }
  const now = new Date().toISOString();
  const replaced = (previous?.revisions ?? [])
    .filter((old) => !list.revisions.some((r) => r.revisionId === old.revisionId))
    .map((old) => ({
      revisionId: old.revisionId,
      title: old.title,
      jobName: old.jobName,
      number: old.number,
      newer: list.revisions.find((r) => r.title === old.title && r.jobName === old.jobName)?.number ?? null,
      at: now,
    }));
  const known: CopiesState = {
    userId,
    updatedAt: previous?.updatedAt ?? null,
    revisions: list.revisions,
    replaced: [...replaced, ...(previous?.replaced ?? [])].slice(0, 10),
    problem: previous?.problem,
  };
  // Recorded before the copies are fetched, so that leaving the page part-way loses none of it.
  await db.put("copies", known);
  announceChange();
  const unchanged =
    replaced.length === 0 && list.revisions.length === (previous?.revisions.length ?? -1) && !previous?.problem;
  if (!force && unchanged && previous?.updatedAt && Date.now() - Date.parse(previous.updatedAt) < AT_MOST_EVERY_MS)
    return known;
  const cache = await caches.open(DEVICE_COPIES_CACHE);
  const wanted = ["/", "/briefings", ...list.revisions.flatMap((r) => [r.page, r.sheet])];
  let failed = 0;
  for (const url of wanted) {
    try {
      const response = await fetch(url, { cache: "no-store", credentials: "same-origin" });
      // A redirect is the sign-in page, not the copy: keep the copy there was.
      if (response.ok && !response.redirected) await cache.put(url, response);
      else failed++;
    } catch {
      failed++;
    }
  }
  for (const request of await cache.keys()) {
    const url = new URL(request.url);
    if (!wanted.includes(url.pathname + url.search)) await cache.delete(request);
  }
  const state: CopiesState = {
    ...known,
    updatedAt: failed ? known.updatedAt : list.checkedAt,
    problem: failed
      ? `${failed} of ${wanted.length} copies could not be saved: they are tried again shortly.`
      : undefined,
  };
  await db.put("copies", state);
  announceChange();
  return state;
}

const emptyState = (userId: string): CopiesState => ({ userId, updatedAt: null, revisions: [], replaced: [] });

/**
 * At sign-out: no copy of anyone's work stays readable on a shared phone. Records still waiting to be
 * sent stay (they belong to the person who took them and go when they sign in again).
 */
export async function forgetCopies(): Promise<void> {
  if ("caches" in window) await caches.delete(DEVICE_COPIES_CACHE);
  await (await phoneDb()).clear("copies");
}

/** How many records on this phone still wait to be sent, anyone's. */
export async function waitingOnPhone(): Promise<number> {
  return (await (await phoneDb()).getAll("outbox")).filter((r) => r.state === "waiting").length;
}
