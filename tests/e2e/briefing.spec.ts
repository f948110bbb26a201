import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { drawSignature, signIn, signOnOperative, waitForMail } from "./helpers";

test.use({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });

async function axe(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(" ")).join(", ")})`);
}

test("a foreman briefs from a phone: three operatives and the foreman sign, one of them while offline, each recorded once", async ({
  page,
  context,
}) => {
  await signIn(page, "foreman@brackenfold.example");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Briefings" }).click();
  expect(await axe(page)).toEqual([]);
  await page.getByRole("link", { name: "Brief the gang" }).click();
  await page.getByLabel("Where are you briefing?").fill("Gorsey Lane access gate");
  await page.getByRole("button", { name: "Start" }).click();
  // First of all, how the gang is kept safe from trains: the arrangement, the positions of safety, the permits.
  const line = page.getByTestId("line-screen");
  await expect(line.getByRole("heading", { name: "Safe from trains" })).toBeVisible();
  await expect(line).toContainText("Separated from the line by a fence or barrier");
  await expect(line).toContainText("Nerys Caldwell");
  await expect(line.getByRole("heading", { name: "Positions of safety" })).toBeVisible();
  await expect(line).toContainText("Behind the temporary fence");
  await expect(line).toContainText("PTD-HV-0142");
  expect(await axe(page)).toEqual([]);
  await page.getByRole("button", { name: "Next" }).click();
  await expect(page.getByRole("heading", { name: "The job, step by step" })).toBeVisible();
  expect(await axe(page)).toEqual([]);
  await page.getByRole("button", { name: "Next" }).click();
  await expect(page.getByText("Load 1 of")).toBeVisible();
  await expect(page.getByText(/rest at least every 10 m/)).toBeVisible();
  expect(await axe(page)).toEqual([]);
  // Through the loads, hazards, PPE and emergency to sign-on.
  while (!(await page.getByRole("heading", { name: "Sign on" }).isVisible()))
    await page.getByRole("button", { name: "Next" }).click();
  expect(await axe(page)).toEqual([]);

  // Bad input: nothing signed on.
  await page.getByRole("button", { name: "Sign on" }).click();
  await expect(page.getByText("Enter your name")).toBeVisible();
  await expect(page.getByText("Sign in the box")).toBeVisible();

  await signOnOperative(page, "Kieran Lusk", "Brackenfold Lineside", "PTS 77120");
  await expect(page.getByTestId("sign-on-status")).toContainText("1 signed on · all recorded");

  // The signal drops: the next sign-on waits on the phone.
  await context.setOffline(true);
  await signOnOperative(page, "Aled Menhenick", "Tarnbrook Plant Hire", "CPCS 55012");
  await expect(page.getByTestId("sign-on-list")).toContainText(
    "Aled Menhenick (Tarnbrook Plant Hire) — waiting for signal",
  );
  await expect(page.getByTestId("sign-on-status")).toContainText("No signal · 2 signed on · 1 waiting to send");
  await page.getByRole("button", { name: "Next" }).click();
  await expect(page.getByText(/1 still waiting for signal: they are sent first, then your sign-off/)).toBeVisible();
  await page.getByRole("button", { name: "Back" }).click();

  // Signal back: sent, once.
  await context.setOffline(false);
  await expect(page.getByTestId("sign-on-list")).toContainText("Aled Menhenick (Tarnbrook Plant Hire) — recorded");
  await expect(page.getByTestId("sign-on-status")).toContainText("Online · 2 signed on · all recorded");
  await signOnOperative(page, "Bethan Quayle", "Brackenfold Lineside", "PTS 90331");
  await expect(page.getByTestId("sign-on-status")).toContainText("3 signed on · all recorded");

  // A phone retrying an old sign-on (same key) records nothing new.
  const replay = await page.evaluate(async () => {
    const read = <T>(store: string) =>
      new Promise<T[]>((resolve, reject) => {
        const open = indexedDB.open("heftwise-phone");
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const all = open.result.transaction(store).objectStore(store).getAll();
          all.onsuccess = () => resolve(all.result as T[]);
        };
      });
    const [briefing] = await read<{ serverId: string }>("briefings");
    const first = (await read<{ kind: string; body: unknown }>("outbox")).find((r) => r.kind === "sign-on")!;
    const res = await fetch(`/api/v1/briefings/${briefing.serverId}/attendees`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(first.body),
    });
    return { status: res.status, body: await res.json() };
  });
  expect(replay.status).toBe(200);
  expect(replay.body.duplicate).toBe(true);

  await page.getByRole("button", { name: "Next" }).click();
  await drawSignature(page);
  await page.getByRole("button", { name: "Sign off the briefing" }).click();
  await expect(page.getByRole("heading", { name: "Briefing recorded" })).toBeVisible();
  await page.getByRole("link", { name: "See the briefing record" }).click();
  await expect(page.getByTestId("record-state")).toContainText("Signed off");
  const rows = page.getByTestId("attendees").locator("tbody tr");
  await expect(rows).toHaveCount(3);
  await expect(page.getByTestId("attendees")).toContainText("Aled Menhenick");
});

test("a foreman cannot see drafts or another organisation's work", async ({ page, browser }) => {
  const adviserContext = await browser.newContext();
  const adviser = await adviserContext.newPage();
  await signIn(adviser, "adviser@brackenfold.example");
  const drafts = await adviser.evaluate(
    async () => (await (await fetch("/api/v1/assessments?status=draft")).json()).items as { revisionId: string }[],
  );
  await adviserContext.close();
  expect(drafts.length).toBeGreaterThan(0);

  await signIn(page, "foreman@brackenfold.example");
  await page.goto("/briefings");
  for (const d of drafts) await expect(page.getByTestId(`briefable-${d.revisionId}`)).toHaveCount(0);
  expect((await page.goto(`/briefings/${drafts[0].revisionId}`))?.status()).toBe(404);
  expect((await page.goto(`/revisions/${drafts[0].revisionId}`))?.status()).toBe(403);
  expect((await page.goto("/briefings/7b1e9c52-0d6f-4c1a-9a51-2f7d0f1e9a10"))?.status()).toBe(404);
  const api = await page.evaluate(
    async (id) => (await fetch(`/api/v1/revisions/${id}/briefing-sheet`)).status,
    drafts[0].revisionId,
  );
  expect(api).toBe(404);
});

test("a site change note reaches the adviser's inbox and warns the next briefing until the adviser decides", async ({
  page,
  browser,
}) => {
  await signIn(page, "foreman@brackenfold.example");
  await page.goto("/briefings");
  await page.getByRole("link", { name: "Report a site change" }).first().click();
  await page.getByRole("button", { name: "Send the site change" }).click();
  await expect(page.getByText(/at least 10 characters/)).toBeVisible();
  await page.getByLabel("What is different?").fill("Access point moved to the north gate: carry distance now 60 m.");
  await page.getByRole("button", { name: "Send the site change" }).click();
  await expect(page.getByText("Recorded, and the safety adviser has been e-mailed.")).toBeVisible();
  const mail = await waitForMail("adviser@brackenfold.example");
  expect(mail.subject).toContain("Site change reported");
  expect(mail.text).toContain("carry distance now 60 m");

  await page.goto("/briefings");
  await expect(page.getByText("Site change reported — needs review")).toBeVisible();
  await page.getByRole("link", { name: "Brief the gang" }).first().click();
  await expect(page.getByRole("alert").filter({ hasText: "Site change reported" })).toContainText(
    "carry distance now 60 m",
  );

  // The adviser opens the e-mailed link: the revision needs review until they decide.
  const adviserContext = await browser.newContext();
  const adviser = await adviserContext.newPage();
  await signIn(adviser, "adviser@brackenfold.example");
  await adviser.goto(mail.text.match(/https?:\/\/\S+\/revisions\/[0-9a-f-]+/)![0]);
  const review = adviser.getByTestId("needs-review");
  await expect(review).toContainText("carry distance now 60 m");
  await review.getByRole("button", { name: "Record: no change needed" }).click();
  await expect(review.getByText(/Say why the assessment still holds/).last()).toBeVisible();
  await review
    .getByLabel(/No change needed\? Say why/)
    .fill("Carry re-measured: 55 m, within the trolley task's plan.");
  await review.getByRole("button", { name: "Record: no change needed" }).click();
  await expect(adviser.getByTestId("needs-review")).toHaveCount(0);
  await adviserContext.close();

  await page.goto("/briefings");
  await expect(page.getByText("Site change reported — needs review")).toHaveCount(0);
});
