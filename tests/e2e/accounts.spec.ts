import { expect, test, type Page } from "@playwright/test";
import { generate } from "otplib";
import { signIn, waitForMail } from "./helpers";

// One story in order: a contractor signs up and confirms the address, invites its approver, makes an
// API token and uses it, turns on a second factor, and resets a forgotten password.
test.describe.configure({ mode: "serial" });

const ADMIN = "mara.quell@fenwickrail.example";
const PASSWORD = "fenwick-rail-2026";
const NEW_PASSWORD = "fenwick-rail-reset-1";

test("a new organisation signs up, confirms its address from the e-mail, and signs in", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByRole("link", { name: "Set up a new organisation" }).click();
  await page.getByRole("button", { name: "Set up the organisation" }).click();
  await expect(page.getByText("Enter your organisation's name")).toBeVisible();
  await expect(page.getByText("Enter a valid e-mail address")).toBeVisible();

  await page.getByLabel("Organisation").fill("Fenwick Rail Services");
  await page.getByLabel("Your name").fill("Mara Quell");
  await page.getByLabel("Your work e-mail").fill(ADMIN);
  await page.getByLabel("Password", { exact: true }).fill(PASSWORD);
  await page.getByLabel("Repeat the password").fill("something-else-entirely");
  await page.getByRole("button", { name: "Set up the organisation" }).click();
  await expect(page.getByText("The two passwords differ")).toBeVisible();
  await page.getByLabel("Repeat the password").fill(PASSWORD);
  await page.getByRole("button", { name: "Set up the organisation" }).click();
  await expect(page.getByTestId("sign-up-sent")).toContainText(ADMIN);

  // Not confirmed yet: the password alone does not open the account.
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(ADMIN);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.locator("form").getByRole("alert")).toContainText("Confirm your e-mail address first");

  const mail = await waitForMail(ADMIN);
  const link = mail.text.match(/https?:\/\/\S+\/sign-up\/confirm\/[A-Za-z0-9_-]+/)![0];
  await page.goto(link);
  await page.getByRole("button", { name: "Confirm my address" }).click();
  await expect(page.getByText("Your e-mail address is confirmed")).toBeVisible();
  await signIn(page, ADMIN, PASSWORD);
  await expect(page.getByTestId("signed-in-as")).toContainText("Mara Quell");

  // The link works once.
  await page.goto(link);
  await expect(page.getByTestId("link-problem")).toContainText("already been used");
});

test("the administrator invites an approver, sets the organisation up, and checks the audit trail", async ({
  page,
}) => {
  await signIn(page, ADMIN, PASSWORD);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "People" }).click();
  await page.getByLabel("Name").fill("Orrin Blaydon");
  await page.getByLabel("E-mail").fill("orrin.blaydon@fenwickrail.example");
  await page.getByLabel("Role").selectOption("approver");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText("Invited. The invitation e-mail was sent.")).toBeVisible();
  expect((await waitForMail("orrin.blaydon@fenwickrail.example")).text).toMatch(/\/invite\//);

  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Organisation" }).click();
  await page.getByLabel("Organisation name").fill("");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Enter the organisation's name")).toBeVisible();
  await page.getByLabel("Organisation name").fill("Fenwick Rail Services Ltd");
  await page.getByLabel(/Default review period/).selectOption("12");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Settings saved.")).toBeVisible();

  // A file that is not an image is refused by its content.
  await page.getByLabel("Logo file").setInputFiles({
    name: "logo.png",
    mimeType: "image/png",
    buffer: Buffer.from("not really a picture"),
  });
  await page.getByRole("button", { name: "Upload logo" }).click();
  await expect(page.getByText(/The logo must be a PNG or JPEG image/)).toBeVisible();

  await page.getByRole("navigation", { name: "Organisation" }).getByRole("link", { name: "Audit trail" }).click();
  await expect(page.getByTestId("chain-intact")).toContainText("Intact");

  // The API reference, drawn from the description of every route.
  await page.getByRole("navigation", { name: "Organisation" }).getByRole("link", { name: "API reference" }).click();
  await expect(page.getByRole("heading", { name: "Heftwise API", level: 1 })).toBeVisible();
  await expect(page.getByText("Countersign: the approver's drawn signature").first()).toBeVisible();
});

test("an API token lists assessments with a bearer header, and stops working once revoked", async ({
  page,
  request,
}) => {
  await signIn(page, ADMIN, PASSWORD);
  await page.goto("/admin/tokens");
  await page.getByRole("button", { name: "Create token" }).click();
  await expect(page.getByText("Name the integration this token is for")).toBeVisible();
  await page.getByLabel("What it is for").fill("Document control sync");
  await page.getByLabel("Scope").selectOption("adviser");
  await page.getByRole("button", { name: "Create token" }).click();
  const token = (await page.getByTestId("new-token").textContent())!.trim();
  expect(token).toMatch(/^hw_/);

  const me = await request.get("/api/v1/me", { headers: { authorization: `Bearer ${token}` } });
  expect(await me.json()).toMatchObject({ email: ADMIN, role: "adviser", via: "token" });
  const listed = await request.get("/api/v1/assessments", { headers: { authorization: `Bearer ${token}` } });
  expect(listed.status()).toBe(200);
  expect(await listed.json()).toMatchObject({ items: [], total: 0 });
  const tooMuch = await request.get("/api/v1/audit/check", { headers: { authorization: `Bearer ${token}` } });
  expect(tooMuch.status()).toBe(403);
  // A token never opens the app's pages: they read the session only.
  const page2 = await request.get("/account", { headers: { authorization: `Bearer ${token}` }, maxRedirects: 0 });
  expect(page2.status()).toBe(307);

  await page.reload();
  await page.getByTestId("token-Document control sync").getByRole("button", { name: "Revoke…" }).click();
  await page.getByRole("dialog").getByRole("button", { name: "Revoke" }).click();
  await expect(page.getByTestId("token-Document control sync")).toContainText("Revoked");
  const revoked = await request.get("/api/v1/assessments", { headers: { authorization: `Bearer ${token}` } });
  expect(revoked.status()).toBe(401);
});

async function signInWithCode(page: Page, code: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(ADMIN);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByLabel("Code from your authenticator app").fill(code);
  await page.getByRole("button", { name: "Confirm and sign in" }).click();
}

test("the administrator turns on a second factor; signing in then needs a code", async ({ page }) => {
  await signIn(page, ADMIN, PASSWORD);
  await page.getByTestId("signed-in-as").click();
  await page.getByRole("link", { name: /Second factor: off/ }).click();
  await page.getByRole("button", { name: "Set up an authenticator app" }).click();
  const secret = (await page.getByTestId("totp-secret").textContent())!.trim();
  await page.getByLabel("Code from the app").fill("12345");
  await page.getByRole("button", { name: "Turn on" }).click();
  await expect(page.getByText("Enter the six digits the app shows")).toBeVisible();
  await page.getByLabel("Code from the app").fill(await generate({ secret }));
  await page.getByRole("button", { name: "Turn on" }).click();
  await expect(page.getByTestId("recovery-codes").locator("li")).toHaveCount(10);
  const codes = (await page.getByTestId("recovery-codes").locator("li").allTextContents()).map((c) => c.trim());
  await page.getByRole("button", { name: /I have saved them/ }).click();

  await page.getByRole("link", { name: "Sign out" }).click();
  await page.getByRole("button", { name: "Sign out", exact: true }).click();
  await expect(page.getByRole("button", { name: "Sign in" })).toBeVisible();
  await signInWithCode(page, "000000");
  await expect(page.locator("form").getByRole("alert")).toContainText("That code was not recognised");
  // The code just used for enrolment cannot be replayed; a recovery code stands in for the phone.
  await page.getByLabel("Code from your authenticator app").fill(codes[0]);
  await page.getByRole("button", { name: "Confirm and sign in" }).click();
  await expect(page.getByTestId("signed-in-as")).toContainText("Mara Quell");
});

test("a forgotten password is reset from the e-mailed link", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByRole("link", { name: "Forgotten your password?" }).click();
  await page.getByLabel("E-mail").fill("not-an-address");
  await page.getByRole("button", { name: "Send the reset link" }).click();
  await expect(page.getByText("Enter a valid e-mail address")).toBeVisible();
  await page.getByLabel("E-mail").fill("orrin.blaydon@fenwickrail.example");
  await page.getByRole("button", { name: "Send the reset link" }).click();
  // The same answer whether or not the address can sign in (the invited approver has no password yet).
  await expect(page.getByText("If that address has a Heftwise account")).toBeVisible();

  await page.goto("/forgot-password");
  await page.getByLabel("E-mail").fill(ADMIN);
  await page.getByRole("button", { name: "Send the reset link" }).click();
  await expect(page.getByText("If that address has a Heftwise account")).toBeVisible();
  let mail = await waitForMail(ADMIN);
  for (let i = 0; i < 40 && !/reset-password/.test(mail.text); i++) {
    await page.waitForTimeout(250);
    mail = await waitForMail(ADMIN);
  }
  const link = mail.text.match(/https?:\/\/\S+\/reset-password\/[A-Za-z0-9_-]+/)![0];
  await page.goto(link);
  await page.getByLabel("New password").fill(NEW_PASSWORD);
  await page.getByLabel("Repeat the password").fill("does-not-match-it");
  await page.getByRole("button", { name: "Set the new password" }).click();
  await expect(page.getByText("The two passwords differ")).toBeVisible();
  await page.getByLabel("Repeat the password").fill(NEW_PASSWORD);
  await page.getByRole("button", { name: "Set the new password" }).click();
  await expect(page.getByText("Your password is changed")).toBeVisible();

  await page.goto(link);
  await expect(page.getByTestId("link-problem")).toContainText("already been used");
});
