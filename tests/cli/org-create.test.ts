/**
 * `npm run org:create` and `npm run audit:check` as an operator runs them, on a data folder of
 * their own (with a mail fake receiving the invitation).
 */
import { spawn } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "@/lib/mail/fake-server";

const dataDir = mkdtempSync(path.join(tmpdir(), "heftwise-org-"));
let fake: MailFake;

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
});
afterAll(() => fake.close());

function run(script: string, args: string[]): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    const child = spawn("npm", ["run", "--silent", script, "--", ...args], {
      env: {
        ...process.env,
        HEFTWISE_DATA_DIR: dataDir,
        SMTP_URL: `smtp://127.0.0.1:${fake.smtpPort}`,
        NEXTAUTH_URL: "http://localhost:3999",
      },
    });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stderr += d));
    child.on("close", (status) => resolve({ status, stdout, stderr }));
  });
}

describe("npm run org:create", () => {
  it("names every bad field and creates nothing", async () => {
    const bad = await run("org:create", ["--organisation", "X", "--email", "not-an-address"]);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("--organisation: Give the organisation's name");
    expect(bad.stderr).toContain("--name: Give the administrator's name");
    expect(bad.stderr).toContain("--email: Give a valid e-mail address");
  }, 60_000);

  it("creates the organisation and its administrator, who is e-mailed a link to set a password", async () => {
    const made = await run("org:create", [
      "--organisation",
      "Hallam Vale Signalling",
      "--name",
      "Pell Arkwright",
      "--email",
      "Pell@HallamVale.example",
    ]);
    expect(made.stderr).toBe("");
    expect(made.status).toBe(0);
    expect(made.stdout).toMatch(/Created "Hallam Vale Signalling" .* with administrator pell@hallamvale\.example/);
    const mail = fake.messages.find((m) => m.to.includes("pell@hallamvale.example"))!;
    expect(mail.text).toMatch(/http:\/\/localhost:3999\/invite\/[A-Za-z0-9_-]+/);

    const again = await run("org:create", [
      "--organisation",
      "Other",
      "--name",
      "Someone",
      "--email",
      "pell@hallamvale.example",
    ]);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain("--email: This address already has a Heftwise account");

    const check = await run("audit:check", []);
    expect(check.status).toBe(0);
    expect(check.stdout).toMatch(/Hallam Vale Signalling \(.+\): intact, 2 events, head #2 [0-9a-f]{64}/);
  }, 120_000);
});
