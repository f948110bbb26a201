/**
 * Keeps the answers of reads until the data changes: lists, counts, a revision. db/client.ts moves
 * the data version when a write completes. On the embedded database this process makes every write,
 * so an answer read while the version stayed the same is exactly what the database would answer
 * again — and the database (single-threaded, in this process) is spared. On a PostgreSQL server other
 * processes write too: each write's notice, sent when it commits (migration 0014), moves the version
 * here a moment later. Until it arrives an answer may predate that other process's commit, as a read
 * begun just before it would; this process's own writes move the version at once. While the
 * listener is down, nothing is kept. Identical reads in flight at once share one query.
 *
 * Callers key by organisation and by everything the answer depends on. An answer is shared by every
 * caller, so it is frozen, deeply, before anyone gets it: a caller that changed one would change
 * what the next request reads, and fails loudly instead. Kept on globalThis: Next.js may load this
 * module once per route.
 */
import { dataVersion, writesAreHeard } from "@/db/client";

const MAX_ENTRIES = 500;

interface State {
  version: number;
  entries: Map<string, Promise<unknown>>;
}

const state = ((globalThis as unknown as { __heftwiseReadCache?: State }).__heftwiseReadCache ??= {
  version: -1,
  entries: new Map(),
});

export async function cachedRead<T>(key: string, load: () => Promise<T>): Promise<T> {
  if (!writesAreHeard()) return load();
  const version = dataVersion();
  if (state.version !== version) {
    state.version = version;
    state.entries.clear();
  }
  const kept = state.entries.get(key) as Promise<T> | undefined;
  if (kept) {
    // Most recently used last: the first entry is the one to drop when full.
    state.entries.delete(key);
    state.entries.set(key, kept);
    return kept;
  }
  const pending = load().then(deepFreeze);
  state.entries.set(key, pending);
  if (state.entries.size > MAX_ENTRIES) state.entries.delete(state.entries.keys().next().value!);
  const drop = () => {
    if (state.entries.get(key) === pending) state.entries.delete(key);
  };
  try {
    const value = await pending;
    // A write finished while this was read: the answer may predate it.
    if (dataVersion() !== version) drop();
    return value;
  } catch (err) {
    drop();
    throw err;
  }
}

/** Freezes plain objects and arrays all the way down (dates and other class instances are left as they are). */
function deepFreeze<T>(value: T): T {
  if (value === null || typeof value !== "object" || Object.isFrozen(value)) return value;
  const proto = Object.getPrototypeOf(value);
  if (!Array.isArray(value) && proto !== Object.prototype && proto !== null) return value;
  Object.freeze(value);
  for (const inner of Object.values(value)) deepFreeze(inner);
  return value;
}

/** A cache key from a function's name, the organisation and its (plain, JSON-able) arguments. */
export const readKey = (name: string, organisationId: string, ...args: unknown[]) =>
  JSON.stringify([name, organisationId, ...args]);
