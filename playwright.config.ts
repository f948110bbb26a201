import { defineConfig, devices } from "@playwright/test";

const PORT = 3100;
export const INBOX_URL = "http://127.0.0.1:1181";

// Browser tests run in the system Chromium against a production build served by the demo runner,
// on a fresh data folder, with the mail fake's inbox on INBOX_URL.
export default defineConfig({
  testDir: "tests/e2e",
  workers: 1,
  retries: 0,
  forbidOnly: !!process.env.CI,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: process.env.CI ? [["list"]] : [["list"], ["html", { open: "never" }]],
  use: {
    baseURL: `http://localhost:${PORT}`,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
  },
  projects: [{ name: "chromium", use: { ...devices["Desktop Chrome"], channel: undefined } }],
  webServer: {
    command: `npx tsx --conditions=react-server assessments/cli/demo.ts --port ${PORT} --smtp-port 2626 --inbox-port 1181 --data-dir .e2e-data --fresh --no-reminders`,
    url: `http://localhost:${PORT}/sign-in`,
    timeout: 240_000,
    reuseExistingServer: false,
    stdout: "pipe",
    stderr: "pipe",
  },
});
