import { expect, test, type BrowserContext, type Page, type Route } from "@playwright/test";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import { drawSignature, signIn, signOnOperative, steps, waitForMail } from "./helpers";

// A foreman's phone: the briefing must work at an access point without signal, after one visit with it.
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true, serviceWorkers: "allow" });

/** Airplane mode: the page and the service worker both lose the network. */
const noNetwork = (route: Route) => route.abort("internetdisconnected");
async function airplane(context: BrowserContext, on: boolean) {
  if (on) {
    await context.setOffline(true);
    await context.route("**/*", noNetwork);
  } else {
    await context.unroute("**/*", noNetwork);
    await context.setOffline(false);
  }
}

/** The foreman's list entry of one approved assessment. */
const briefable = (page: Page, title: string) => page.locator('[data-testid^="briefable-"]').filter({ hasText: title });
const HAND_CARRY = "Equipment base by hand at Hollin Vale";

const packHash = async (page: Page, revisionId: string) =>
  page.evaluate(async (id) => {
    const bytes = await (await fetch(`/api/v1/revisions/${id}/pack`, { cache: "no-store" })).arrayBuffer();
    return Array.from(new Uint8Array(await crypto.subtle.digest("SHA-256", bytes)), (b) =>
      b.toString(16).padStart(2, "0"),
    ).join("");
  }, revisionId);

test("installable, and a briefing taken in airplane mode is recorded once when the signal returns", async ({
  page,
  context,
}) => {
  await signIn(page, "foreman@brackenfold.example");
  await page.goto("/briefings");

  // Install prerequisites: a manifest with Heftwise's name and icons, and a registered service worker.
  const manifestHref = await page.locator('link[rel="manifest"]').getAttribute("href");
  const manifest = await (await page.request.get(manifestHref!)).json();
  expect(manifest.name).toBe("Heftwise");
  expect(manifest.display).toBe("standalone");
  expect(manifest.icons.map((i: { sizes: string }) => i.sizes)).toEqual(expect.arrayContaining(["192x192", "512x512"]));
  for (const icon of manifest.icons) expect((await page.request.get(icon.src)).status()).toBe(200);
  // Browsers still ask for the classic address on their own; it answers with the same mark.
  const favicon = await page.request.get("/favicon.ico");
  expect(favicon.status()).toBe(200);
  expect((await favicon.body()).subarray(0, 4)).toEqual(Buffer.from([0, 0, 1, 0]));
  const scope = await page.evaluate(async () => (await navigator.serviceWorker.ready).scope);
  expect(new URL(scope).pathname).toBe("/");
  await expect(page.getByTestId("copies-state")).toContainText("kept for use without signal");

  const revisionId = (await briefable(page, HAND_CARRY)
    .getByRole("link", { name: "Brief the gang" })
    .getAttribute("href"))!.split("/")[2];
  const packBefore = await packHash(page, revisionId);

  // Airplane mode, and the app opened again from scratch.
  await airplane(context, true);
  expect(
    await page.evaluate(() =>
      fetch("/api/health").then(
        () => "reached",
        () => "no network",
      ),
    ),
  ).toBe("no network");
  await page.reload();
  await expect(page.getByRole("heading", { name: "Your jobs" })).toBeVisible();
  await expect(page.getByTestId("copies-state")).toContainText("No signal");
  // The briefing sheet is kept too.
  const sheet = await page.evaluate(async (id) => {
    const res = await fetch(`/api/v1/revisions/${id}/briefing-sheet`);
    return { status: res.status, start: new TextDecoder().decode((await res.arrayBuffer()).slice(0, 5)) };
  }, revisionId);
  expect(sheet).toEqual({ status: 200, start: "%PDF-" });
  await page.screenshot({ path: "test-results/offline-list.png", fullPage: true });
  // As a foreman would: the link on the kept list opens the kept briefing.
  await briefable(page, HAND_CARRY).getByRole("link", { name: "Brief the gang" }).click();
  await expect(page).toHaveURL(new RegExp(`/briefings/${revisionId}$`));
  await expect(page.getByTestId("copy-line")).toContainText("No signal · the copy kept on this phone");

  // Bad input first: no place.
  await page.getByLabel("Where are you briefing?").fill("");
  await page.getByRole("button", { name: "Start" }).click();
  await expect(page.getByText("Say where the briefing is held")).toBeVisible();
  await page.getByLabel("Where are you briefing?").fill("Gorsey Lane access gate (no signal)");
  await page.getByRole("button", { name: "Start" }).click();
  while (!(await page.getByRole("heading", { name: "Sign on" }).isVisible()))
    await page.getByRole("button", { name: "Next" }).click();
  await signOnOperative(page, "Kieran Lusk", "Brackenfold Lineside", "PTS 77120");
  await signOnOperative(page, "Aled Menhenick", "Tarnbrook Plant Hire", "CPCS 55012");
  await signOnOperative(page, "Bethan Quayle", "Brackenfold Lineside", "PTS 90331");
  await expect(page.getByTestId("sign-on-list")).toContainText(
    "Bethan Quayle (Brackenfold Lineside) — waiting for signal",
  );
  await expect(page.getByTestId("sign-on-status")).toContainText("No signal · 3 signed on · 4 waiting to send");
  await page.screenshot({ path: "test-results/offline-sign-on.png", fullPage: true });
  await page.getByRole("button", { name: "Next" }).click();
  await expect(page.getByText(/3 operatives signed on \(3 still waiting for signal/)).toBeVisible();
  await drawSignature(page);
  await page.getByRole("button", { name: "Sign off the briefing" }).click();
  await expect(page.getByRole("heading", { name: "Briefing signed off on this phone" })).toBeVisible();
  await expect(page.getByTestId("sign-on-status")).toContainText("5 waiting to send");
  await page.screenshot({ path: "test-results/offline-signed-off.png", fullPage: true });

  // Signal returns: everything goes, in order, once.
  await airplane(context, false);
  await expect(page.getByRole("heading", { name: "Briefing recorded" })).toBeVisible({ timeout: 20_000 });
  await expect(page.getByTestId("sign-on-status")).toContainText("Online · 3 signed on · all recorded");
  await page.getByRole("link", { name: "See the briefing record" }).click();
  await expect(page.getByTestId("record-state")).toContainText("Signed off");
  await expect(page.getByTestId("attendees").locator("tbody tr")).toHaveCount(3);
  const recordUrl = page.url();
  // The approved pack was re-issued with the briefing's record.
  expect(await packHash(page, revisionId)).not.toBe(packBefore);

  // A second reconnection, with the phone sending every record again: nothing is duplicated.
  await airplane(context, true);
  await page.evaluate(
    () =>
      new Promise<void>((resolve, reject) => {
        const open = indexedDB.open("heftwise-phone");
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const tx = open.result.transaction("outbox", "readwrite");
          const store = tx.objectStore("outbox");
          store.getAll().onsuccess = (e) => {
            for (const r of (e.target as IDBRequest).result) store.put({ ...r, state: "waiting" });
          };
          tx.oncomplete = () => resolve();
        };
      }),
  );
  await airplane(context, false);
  await page.goto("/briefings");
  const records = page.getByTestId("phone-records");
  await expect(records).toContainText("Sign-off: Signed off by");
  await expect(records.getByText(/waiting for signal/)).toHaveCount(0, { timeout: 20_000 });
  await expect(records.getByText(/refused/)).toHaveCount(0);
  await page.goto(recordUrl);
  await expect(page.getByTestId("attendees").locator("tbody tr")).toHaveCount(3);
  // One briefing on the server, not two.
  await page.goto("/briefings");
  await expect(page.getByRole("link", { name: /at Gorsey Lane access gate \(no signal\)/ })).toHaveCount(1);

  // Signing out leaves no copy of the foreman's work readable on a shared phone.
  expect(await page.evaluate(() => caches.has("heftwise-briefing-copies"))).toBe(true);
  await page.goto("/sign-out");
  await page.getByRole("button", { name: "Sign out", exact: true }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  expect(await page.evaluate(() => caches.has("heftwise-briefing-copies"))).toBe(false);
});

test("a briefing taken offline from a revision superseded meanwhile is flagged on reconnection and reported to the adviser", async ({
  page,
  context,
  browser,
}) => {
  await signIn(page, "foreman@brackenfold.example");
  await page.goto("/briefings");
  await expect(page.getByTestId("copies-state")).toContainText("kept for use without signal");
  const oldRevision = (await briefable(page, HAND_CARRY)
    .getByRole("link", { name: "Brief the gang" })
    .getAttribute("href"))!.split("/")[2];

  // At the access point without signal, the foreman briefs from the copy on the phone.
  await airplane(context, true);
  await page.goto(`/briefings/${oldRevision}`);
  await page.getByLabel("Where are you briefing?").fill("Gorsey Lane access gate (old copy)");
  await page.getByRole("button", { name: "Start" }).click();
  while (!(await page.getByRole("heading", { name: "Sign on" }).isVisible()))
    await page.getByRole("button", { name: "Next" }).click();
  await signOnOperative(page, "Kieran Lusk", "Brackenfold Lineside", "PTS 77120");
  await page.getByRole("button", { name: "Next" }).click();
  await drawSignature(page);
  await page.getByRole("button", { name: "Sign off the briefing" }).click();
  await expect(page.getByRole("heading", { name: "Briefing signed off on this phone" })).toBeVisible();

  // Meanwhile the office approves a new revision.
  const office = await browser.newContext();
  const adviser = await office.newPage();
  await signIn(adviser, "adviser@brackenfold.example");
  const next = await adviser.evaluate(async (id) => {
    const res = await fetch(`/api/v1/revisions/${id}/new-revision`, { method: "POST" });
    return ((await res.json()) as { revisionId: string }).revisionId;
  }, oldRevision);
  await adviser.goto(`/revisions/${next}`);
  await steps(adviser)
    .getByRole("button", { name: /Review & submit/ })
    .click();
  await adviser.getByRole("button", { name: "Submit for approval" }).click();
  await expect(adviser.getByText("Submitted — waiting for approval")).toBeVisible();
  const approverContext = await browser.newContext();
  const approver = await approverContext.newPage();
  await signIn(approver, "approver@brackenfold.example");
  await approver.goto(`/reviews/${next}`);
  await approver.getByLabel("Your role").fill("Contracts manager");
  await drawSignature(approver);
  await approver.getByRole("button", { name: "Countersign and approve…" }).click();
  const dialog = approver.getByRole("dialog");
  await dialog.getByLabel("Your password").fill(DEMO_PASSWORD);
  await dialog.getByRole("button", { name: "Approve and sign" }).click();
  await expect(approver.getByTestId("review-status")).toHaveText("Approved");
  await office.close();
  await approverContext.close();

  // Signal returns: the briefing is recorded against the old revision, flagged on the phone, and the
  // copy is replaced by the new revision.
  await airplane(context, false);
  const flag = page.getByTestId("superseded");
  await expect(flag).toContainText(
    "Revision 1 of Equipment base by hand at Hollin Vale had been superseded by revision 2",
    {
      timeout: 20_000,
    },
  );
  await expect(page.getByTestId("sign-on-status")).toContainText("1 signed on · all recorded");
  await page.screenshot({ path: "test-results/offline-superseded.png", fullPage: true });
  await page.goto("/briefings");
  await expect(page.getByTestId("replaced").filter({ hasText: HAND_CARRY })).toContainText(
    "revision 1 was replaced by revision 2",
    {
      timeout: 20_000,
    },
  );
  await expect(briefable(page, HAND_CARRY).getByRole("link", { name: "Brief the gang" })).toHaveAttribute(
    "href",
    `/briefings/${next}`,
  );

  // The adviser is told, and the record says so.
  const mail = await waitForMail("adviser@brackenfold.example", 15_000, /^Briefed from a superseded revision/);
  expect(mail.subject).toBe("Briefed from a superseded revision: Equipment base by hand at Hollin Vale");
  const recordLink = mail.text.match(/https?:\/\/\S+\/briefings\/record\/[0-9a-f-]+/)![0];
  const check = await browser.newContext();
  const reader = await check.newPage();
  await signIn(reader, "adviser@brackenfold.example");
  await reader.goto(recordLink);
  await expect(reader.getByTestId("against-superseded")).toContainText("after it had been superseded");
  await expect(reader.getByTestId("attendees").locator("tbody tr")).toHaveCount(1);
  await check.close();
});
