import { describe, expect, it } from "vitest";
import { ConfigError, parseConfig } from "@/lib/config";

const production = (env: Record<string, string>) => {
  const saved = process.env.NODE_ENV;
  (process.env as Record<string, string>).NODE_ENV = "production";
  try {
    return parseConfig(env);
  } finally {
    (process.env as Record<string, string | undefined>).NODE_ENV = saved;
  }
};

describe("configuration", () => {
  it("in production, a missing auth secret or SMTP URL stops the start and names the variable", () => {
    expect(() => production({})).toThrow(ConfigError);
    try {
      production({});
    } catch (e) {
      expect((e as ConfigError).problems).toEqual([
        "NEXTAUTH_SECRET is required in production",
        "SMTP_URL is required in production",
      ]);
    }
  });
  it("names a secret that is too short and a database URL with the wrong scheme", () => {
    try {
      parseConfig({ NEXTAUTH_SECRET: "short", DATABASE_URL: "mysql://x" });
      expect.unreachable();
    } catch (e) {
      const problems = (e as ConfigError).problems.join("\n");
      expect(problems).toMatch(/^NEXTAUTH_SECRET must be at least 32 characters/m);
      expect(problems).toMatch(/^DATABASE_URL must start with postgres:\/\/ or postgresql:\/\//m);
    }
  });
  it("outside production it starts with development defaults", () => {
    const c = parseConfig({});
    expect(c.smtpUrl).toBe("smtp://127.0.0.1:2525");
    expect(c.pgliteDir).toBe("./data/pglite");
    expect(c.secret.length).toBeGreaterThanOrEqual(32);
  });
  it("a valid production configuration passes", () => {
    const c = production({
      NEXTAUTH_SECRET: "s".repeat(40),
      SMTP_URL: "smtp://mail.example:587",
      HEFTWISE_DATA_DIR: "/var/lib/heftwise/",
    });
    expect(c.pgliteDir).toBe("/var/lib/heftwise/pglite");
  });
});
