/** The sign-in throttle's policy and the client's address (pure parts; the database side is in tests/integration/users.test.ts). */
import { describe, expect, it } from "vitest";
import {
  BASE_WAIT_MS,
  FREE_ADDRESS_FAILURES,
  FREE_PAIR_FAILURES,
  MAX_SLOWDOWN_MS,
  slowdownAfter,
  waitAfter,
  WINDOW_MS,
} from "@/lib/auth/throttle";
import { cleanForwardedHeaders, clientAddressFrom } from "@/lib/client-address";

describe("waiting after failures", () => {
  it("the first five failures of an account from one address are free; then each attempt waits, doubling", () => {
    expect(waitAfter({ failures: FREE_PAIR_FAILURES - 1, lastFailure: 0 }, FREE_PAIR_FAILURES, 0)).toBe(0);
    expect(waitAfter({ failures: FREE_PAIR_FAILURES, lastFailure: 0 }, FREE_PAIR_FAILURES, 0)).toBe(BASE_WAIT_MS);
    expect(waitAfter({ failures: FREE_PAIR_FAILURES + 1, lastFailure: 0 }, FREE_PAIR_FAILURES, 0)).toBe(
      2 * BASE_WAIT_MS,
    );
    expect(waitAfter({ failures: FREE_PAIR_FAILURES, lastFailure: 0 }, FREE_PAIR_FAILURES, BASE_WAIT_MS)).toBe(0);
  });
  it("an address trying many accounts waits after twenty", () => {
    expect(waitAfter({ failures: FREE_ADDRESS_FAILURES - 1, lastFailure: 0 }, FREE_ADDRESS_FAILURES, 0)).toBe(0);
    expect(waitAfter({ failures: FREE_ADDRESS_FAILURES, lastFailure: 0 }, FREE_ADDRESS_FAILURES, 0)).toBeGreaterThan(0);
  });
  it("failures are forgotten after the window", () => {
    expect(waitAfter({ failures: 50, lastFailure: 0 }, FREE_PAIR_FAILURES, WINDOW_MS + 1)).toBe(0);
  });
  it("failures on the account from elsewhere only slow the check, by at most two seconds", () => {
    expect(slowdownAfter({ failures: FREE_PAIR_FAILURES, lastFailure: 0 }, 0)).toBe(0);
    expect(slowdownAfter({ failures: FREE_PAIR_FAILURES + 1, lastFailure: 0 }, 0)).toBeGreaterThan(0);
    expect(slowdownAfter({ failures: 10_000, lastFailure: 0 }, 0)).toBe(MAX_SLOWDOWN_MS);
  });
});

describe("the client's address", () => {
  it("forwarded headers from an untrusted connection are removed: the socket's address stands", () => {
    const headers: Record<string, string | undefined> = {
      "x-forwarded-for": "203.0.113.9",
      "x-real-ip": "203.0.113.9",
      forwarded: "for=203.0.113.9",
      host: "heftwise",
    };
    cleanForwardedHeaders(headers, "198.51.100.4", []);
    expect(headers).toEqual({ host: "heftwise" });
  });
  it("from a configured proxy they are kept, and the client is the right-most address that is not a proxy", () => {
    const headers: Record<string, string | undefined> = { "x-forwarded-for": "203.0.113.9, 10.0.0.2" };
    cleanForwardedHeaders(headers, "::ffff:10.0.0.2", ["10.0.0.2"]);
    expect(headers["x-forwarded-for"]).toBe("203.0.113.9, 10.0.0.2");
    expect(clientAddressFrom(headers["x-forwarded-for"], ["10.0.0.2"])).toBe("203.0.113.9");
    // A client that prepends a forged address cannot choose which one is believed.
    expect(clientAddressFrom("1.2.3.4, 203.0.113.9, 10.0.0.2", ["10.0.0.2"])).toBe("203.0.113.9");
  });
  it("without proxies, the address is the one Next.js filled in from the socket", () => {
    expect(clientAddressFrom("198.51.100.4", [])).toBe("198.51.100.4");
    expect(clientAddressFrom(null, [])).toBeNull();
  });
});
