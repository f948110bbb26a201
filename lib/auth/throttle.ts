/**
 * Slows down repeated sign-in failures from one account or one address. After FREE_FAILURES
 * failures within the window, each further attempt must wait, doubling from BASE_WAIT_MS up to
 * MAX_WAIT_MS; a success clears the account's count. Kept in the process's memory: Heftwise runs
 * as one process per data directory.
 */
const WINDOW_MS = 15 * 60_000;
const FREE_FAILURES = 5;
const BASE_WAIT_MS = 30_000;
const MAX_WAIT_MS = 15 * 60_000;

interface Entry {
  failures: number;
  lastFailure: number;
}

export class SignInThrottle {
  private entries = new Map<string, Entry>();

  constructor(private readonly now: () => number = Date.now) {}

  /** Milliseconds the caller must still wait before another attempt for any of these keys (0 = go). */
  waitMs(keys: string[]): number {
    let wait = 0;
    for (const key of keys) {
      const entry = this.current(key);
      if (!entry || entry.failures < FREE_FAILURES) continue;
      const backoff = Math.min(MAX_WAIT_MS, BASE_WAIT_MS * 2 ** (entry.failures - FREE_FAILURES));
      wait = Math.max(wait, entry.lastFailure + backoff - this.now());
    }
    return Math.max(0, wait);
  }

  recordFailure(keys: string[]): void {
    for (const key of keys) {
      const entry = this.current(key) ?? { failures: 0, lastFailure: 0 };
      this.entries.set(key, { failures: entry.failures + 1, lastFailure: this.now() });
    }
  }

  recordSuccess(keys: string[]): void {
    for (const key of keys) this.entries.delete(key);
  }

  private current(key: string): Entry | undefined {
    const entry = this.entries.get(key);
    if (entry && this.now() - entry.lastFailure > WINDOW_MS) {
      this.entries.delete(key);
      return undefined;
    }
    return entry;
  }
}

const globalForThrottle = globalThis as unknown as { __heftwiseThrottle?: SignInThrottle };
export const signInThrottle = (globalForThrottle.__heftwiseThrottle ??= new SignInThrottle());
