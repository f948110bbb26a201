import { expect, test } from "@playwright/test";
import { DEMO_USERS } from "@/assessments/demo/scenario";
import { signIn, waitForMail } from "./helpers";

const navigationByRole = {
  admin: { shows: ["Overview", "Jobs", "Load register", "People", "Sent e-mail"], hides: ["For review", "Briefings"] },
  adviser: {
    shows: ["Overview", "Jobs", "Load register"],
    hides: ["People", "Sent e-mail", "For review", "Briefings"],
  },
  approver: { shows: ["Overview", "For review"], hides: ["Jobs", "Load register", "People", "Briefings"] },
  foreman: { shows: ["Overview", "Briefings"], hides: ["Jobs", "Load register", "People", "For review"] },
} as const;

for (const user of DEMO_USERS) {
  test(`${user.role} signs in and sees the navigation for the role`, async ({ page }) => {
    await signIn(page, user.email);
    const nav = page.getByRole("navigation", { name: "Main" });
    for (const label of navigationByRole[user.role].shows)
      await expect(nav.getByRole("link", { name: label, exact: true })).toBeVisible();
    for (const label of navigationByRole[user.role].hides)
      await expect(nav.getByRole("link", { name: label, exact: true })).toHaveCount(0);
    await expect(page.getByRole("note")).toContainText("does not replace");
  });
}

test("a wrong password is refused with a clear message, and so is an unknown address", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("adviser@brackenfold.example");
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.locator("form").getByRole("alert")).toHaveText("E-mail or password not recognised.");
  await page.getByLabel("E-mail").fill("nobody@brackenfold.example");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.locator("form").getByRole("alert")).toHaveText("E-mail or password not recognised.");
  await expect(page).toHaveURL(/\/sign-in/);
});

test("an empty form says what is missing without a round trip", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("Enter an e-mail address")).toBeVisible();
  await expect(page.getByText("Enter your password")).toBeVisible();
});

test("an adviser cannot open the admin pages (403)", async ({ page }) => {
  await signIn(page, "adviser@brackenfold.example");
  for (const path of ["/admin/users", "/admin/mail"]) {
    const response = await page.goto(path);
    expect(response?.status()).toBe(403);
    await expect(page.getByRole("heading", { name: "Not available for your role" })).toBeVisible();
  }
});

test("signed out, an app page sends you to sign in", async ({ page }) => {
  await page.goto("/load-register");
  await expect(page).toHaveURL(/\/sign-in/);
});

test("an invited user sets a password from the e-mail and signs in", async ({ page, browser }) => {
  await signIn(page, "admin@brackenfold.example");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "People" }).click();
  const form = page.getByRole("form", { name: "Invite someone" });
  // Bad input first: nothing is sent, the fields say why.
  await form.getByLabel("E-mail").fill("not-an-address");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(form.getByText("Enter the person's name")).toBeVisible();
  await expect(form.getByText("Enter a valid e-mail address")).toBeVisible();

  await form.getByLabel("Name").fill("Wynne Caddow");
  await form.getByLabel("E-mail").fill("wynne.caddow@brackenfold.example");
  await form.getByLabel("Role").selectOption("foreman");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(form.getByRole("status")).toContainText("The invitation e-mail was sent.");
  await expect(page.getByTestId("person-wynne.caddow@brackenfold.example")).toContainText("Invited, no password yet");

  const mail = await waitForMail("wynne.caddow@brackenfold.example");
  const link = mail.text.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/)![0];

  const invitee = await browser.newContext();
  const p = await invitee.newPage();
  await p.goto(link);
  await expect(p.getByRole("heading", { name: "Set your password" })).toBeVisible();
  await p.getByLabel("New password").fill("short");
  await p.getByLabel("Repeat the password").fill("short");
  await p.getByRole("button", { name: "Set password" }).click();
  await expect(p.getByText("Use at least 10 characters")).toBeVisible();
  await p.getByLabel("New password").fill("caddow-at-carrowby");
  await p.getByLabel("Repeat the password").fill("caddow-at-carrowby");
  await p.getByRole("button", { name: "Set password" }).click();
  await expect(p.getByText("Your password is set. Sign in to continue.")).toBeVisible();
  await signIn(p, "wynne.caddow@brackenfold.example", "caddow-at-carrowby");
  await expect(p.getByRole("link", { name: "Briefings" })).toBeVisible();

  // The link is spent.
  await p.goto(link);
  await expect(p.getByTestId("invite-problem")).toContainText("already been used");
  await invitee.close();
});

test("a tampered invite link shows a clear page", async ({ page }) => {
  await page.goto("/invite/this-is-not-a-real-invitation-token");
  await expect(page.getByRole("heading", { name: "This link cannot be used" })).toBeVisible();
  await expect(page.getByTestId("invite-problem")).toContainText("not valid");
});

test("deactivating a user stops their session at once", async ({ page, browser }) => {
  const other = await browser.newContext();
  const approverPage = await other.newPage();
  await signIn(approverPage, "approver@brackenfold.example");

  await signIn(page, "admin@brackenfold.example");
  await page.goto("/admin/users");
  const row = page.getByTestId("person-approver@brackenfold.example");
  await row.getByRole("button", { name: "Deactivate" }).click();
  const dialog = page.getByRole("dialog");
  await expect(dialog).toContainText("signed out at once");
  await dialog.getByRole("button", { name: "Deactivate" }).click();
  await expect(row).toContainText("Deactivated");

  await approverPage.reload();
  await expect(approverPage).toHaveURL(/\/sign-in/);

  await row.getByRole("button", { name: "Reactivate" }).click();
  await expect(row).toContainText("Active");
  // Reactivation revives no old session: the approver's page still needs a fresh sign-in.
  await approverPage.goto("/reviews");
  await expect(approverPage).toHaveURL(/\/sign-in/);
  await other.close();
});

test("signing out ends the session: a copy of its cookie no longer works; 'everywhere' ends the other devices' too", async ({
  page,
  browser,
}) => {
  await signIn(page, "adviser@brackenfold.example");
  const copied = await page.context().cookies();
  await page.goto("/sign-out");
  await page.getByRole("button", { name: "Sign out", exact: true }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  const thief = await browser.newContext();
  await thief.addCookies(copied);
  const stolen = await thief.newPage();
  await stolen.goto("/assessments");
  await expect(stolen).toHaveURL(/\/sign-in/);
  await thief.close();

  // Signed in on two devices; "Sign out everywhere" on one ends the other.
  const office = await browser.newContext();
  const officePage = await office.newPage();
  await signIn(officePage, "adviser@brackenfold.example");
  await signIn(page, "adviser@brackenfold.example");
  await page.goto("/sign-out");
  await page.getByRole("button", { name: "Sign out everywhere" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await officePage.goto("/assessments");
  await expect(officePage).toHaveURL(/\/sign-in/);
  await office.close();
});

test("the server answers like a careful colleague: security headers on every page, 413 for an oversized form, 403 for a cross-site write", async ({
  page,
  request,
}) => {
  const blocked: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy|Refused to (execute|load)/i.test(m.text())) blocked.push(m.text());
  });
  const res = await page.goto("/sign-in");
  const headers = res!.headers();
  expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");
  // Scripts only with this response's nonce; never eval.
  const nonce = headers["content-security-policy"].match(/'nonce-([^']+)'/)?.[1];
  expect(nonce).toBeTruthy();
  expect(headers["content-security-policy"]).not.toContain("unsafe-eval");
  expect(await page.locator(`script[nonce]`).count()).toBeGreaterThan(0);
  // The page still works under the policy: signing in runs the form's scripts.
  await page.getByLabel("E-mail").fill("adviser@brackenfold.example");
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("E-mail or password not recognised.")).toBeVisible();
  expect(blocked).toEqual([]);
  const again = (await page.request.get("/sign-in")).headers()["content-security-policy"];
  expect(again.match(/'nonce-([^']+)'/)?.[1]).not.toBe(nonce);
  expect(headers["x-content-type-options"]).toBe("nosniff");
  expect(headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
  expect(headers["permissions-policy"]).toContain("camera=()");
  expect(headers["x-powered-by"]).toBeUndefined();

  // A server action sent more than its limit: a clear 413, not an error from inside the framework.
  const big = await request.post("/jobs/new", {
    headers: { "next-action": "0123456789abcdef", "content-type": "text/plain;charset=UTF-8" },
    data: "x".repeat(1_100_000),
  });
  expect(big.status()).toBe(413);
  expect((await big.json()).error.code).toBe("payload_too_large");

  // A server action posted from another site's page.
  const foreignAction = await request.post("/jobs/new", {
    headers: {
      "next-action": "0123456789abcdef",
      origin: "https://evil.example",
      "content-type": "text/plain;charset=UTF-8",
    },
    data: "[]",
  });
  expect(foreignAction.status()).toBe(403);

  // A write from another site's page, with a simple content type a plain form can send.
  const crossSite = await request.post("/api/v1/components/import", {
    headers: { origin: "https://evil.example", "content-type": "text/plain" },
    data: "name,mass_kg,grip,mass_source\n",
  });
  expect(crossSite.status()).toBe(403);
});
