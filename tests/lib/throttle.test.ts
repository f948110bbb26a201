import { describe, expect, it } from "vitest";
import { SignInThrottle } from "@/lib/auth/throttle";

describe("sign-in throttle", () => {
  it("lets the first five failures through, then makes each further attempt wait, doubling", () => {
    let now = 0;
    const t = new SignInThrottle(() => now);
    for (let i = 0; i < 5; i++) {
      expect(t.waitMs(["account:a"])).toBe(0);
      t.recordFailure(["account:a"]);
    }
    expect(t.waitMs(["account:a"])).toBe(30_000);
    now += 30_000;
    expect(t.waitMs(["account:a"])).toBe(0);
    t.recordFailure(["account:a"]);
    expect(t.waitMs(["account:a"])).toBe(60_000);
  });
  it("an address that fails across many accounts is slowed too", () => {
    const t = new SignInThrottle(() => 0);
    for (let i = 0; i < 5; i++) t.recordFailure([`account:${i}`, "address:10.0.0.9"]);
    expect(t.waitMs(["account:new", "address:10.0.0.9"])).toBeGreaterThan(0);
    expect(t.waitMs(["account:new", "address:10.0.0.8"])).toBe(0);
  });
  it("forgets failures after the window, and a success clears the account", () => {
    let now = 0;
    const t = new SignInThrottle(() => now);
    for (let i = 0; i < 6; i++) t.recordFailure(["account:a"]);
    now += 16 * 60_000;
    expect(t.waitMs(["account:a"])).toBe(0);
    for (let i = 0; i < 6; i++) t.recordFailure(["account:b"]);
    t.recordSuccess(["account:b"]);
    expect(t.waitMs(["account:b"])).toBe(0);
  });
});
