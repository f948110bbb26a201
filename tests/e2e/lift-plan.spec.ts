import { expect, test } from "@playwright/test";
import { readFileSync, writeFileSync } from "node:fs";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import { signIn, steps, waitForMail } from "./helpers";

// One story in order: the adviser plans the lifts and submits; the approver countersigns from the
// e-mail; the signed pack is downloaded and checked on /verify.
test.describe.configure({ mode: "serial" });

test("an adviser plans a lift: sling diagram, bad input refused, a complete plan lets the assessment be submitted", async ({
  page,
}) => {
  await signIn(page, "adviser@brackenfold.example");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Assessments" }).click();
  await page.getByRole("link", { name: "Cabinet and chamber ring by lorry-loader crane" }).click();
  await steps(page)
    .getByRole("button", { name: /Loads & lifts/ })
    .click();
  await page.getByRole("link", { name: "Open the lift plan" }).first().click();

  const diagram = page.getByTestId("sling-diagram");
  await expect(diagram).toBeVisible();
  await expect(diagram).toContainText("β 30°");
  const result = page.getByTestId("task-result");
  await expect(result).toContainText("category complex");
  await expect(result.locator("[data-band]").first()).toHaveAttribute("data-band", "clear");

  // A wider angle changes the tension live; beyond 60° is refused.
  await page.getByLabel("Angle from vertical").fill("45");
  await expect(diagram).toContainText("β 45°");
  await page.getByLabel("Angle from vertical").fill("70");
  await expect(page.getByText("must be at most 60° from vertical")).toBeVisible();
  await page.getByRole("button", { name: "Save lift plan" }).click();
  await expect(page.getByText("Lift plan saved.")).toHaveCount(0);

  // Remove the appointed person: the plan saves, but the assessment cannot be submitted.
  await page.getByLabel("Angle from vertical").fill("30");
  await page.getByLabel("Appointed person").fill("");
  await page.getByRole("button", { name: "Save lift plan" }).click();
  await expect(page.getByText("Lift plan saved.")).toBeVisible();
  await expect(result).toContainText("No appointed person");

  await page.getByRole("link", { name: "← Back to Loads & lifts" }).click();
  await steps(page)
    .getByRole("button", { name: /Review & submit/ })
    .click();
  await expect(page.getByTestId("missing")).toContainText("appointed person");
  await expect(page.getByRole("button", { name: "Submit for approval" })).toBeDisabled();

  // Put the appointed person back; then submit.
  await steps(page)
    .getByRole("button", { name: /Loads & lifts/ })
    .click();
  await page.getByRole("link", { name: "Open the lift plan" }).first().click();
  await page.getByLabel("Appointed person").fill("Gwenllian Marsh");
  await page.getByRole("button", { name: "Save lift plan" }).click();
  await expect(page.getByText("Lift plan saved.")).toBeVisible();
  await page.getByRole("link", { name: "← Back to Loads & lifts" }).click();
  await steps(page)
    .getByRole("button", { name: /Review & submit/ })
    .click();
  await expect(page.getByText("Nothing required is missing.")).toBeVisible();
  await page.getByRole("button", { name: "Submit for approval" }).click();
  await expect(page.getByText("Submitted — waiting for approval")).toBeVisible();
  await expect(page.getByText("The approver has been e-mailed the link and the draft pack.")).toBeVisible();
  await expect(page.getByText("cannot be edited here")).toBeVisible();
});

test("the approver opens the e-mailed link, draws a signature and approves; the adviser downloads the signed pack", async ({
  browser,
}) => {
  const mail = await waitForMail("approver@brackenfold.example");
  expect(mail.subject).toContain("Review requested: Cabinet and chamber ring");
  const link = mail.text.match(/https?:\/\/\S+\/reviews\/[0-9a-f-]+/)![0];

  const approverContext = await browser.newContext();
  const approver = await approverContext.newPage();
  await signIn(approver, "approver@brackenfold.example");
  await approver.goto(link);
  await expect(approver.getByRole("heading", { name: /Review: Cabinet and chamber ring/ })).toBeVisible();
  await expect(approver.getByText("Waiting for your decision")).toBeVisible();

  // Nothing drawn: refused with the reason.
  await approver.getByLabel("Your role").fill("Contracts manager");
  await approver.getByRole("button", { name: "Countersign and approve…" }).click();
  await expect(approver.getByText("Draw your signature")).toBeVisible();

  const pad = approver.getByTestId("signature-pad");
  await pad.scrollIntoViewIfNeeded();
  const box = (await pad.boundingBox())!;
  await approver.mouse.move(box.x + 20, box.y + box.height / 2);
  await approver.mouse.down();
  for (let i = 1; i <= 20; i++)
    await approver.mouse.move(box.x + 20 + i * 12, box.y + box.height / 2 + Math.sin(i) * 25, { steps: 2 });
  await approver.mouse.up();
  await approver.getByRole("button", { name: "Countersign and approve…" }).click();
  const dialog = approver.getByRole("dialog");
  await expect(dialog).toContainText("Approve this revision?");
  // Step-up: an open session is not enough; a wrong password is refused inside the dialog.
  await dialog.getByRole("button", { name: "Approve and sign" }).click();
  await expect(dialog.getByText("Enter your password to confirm it is you")).toBeVisible();
  await dialog.getByLabel("Your password").fill("not-the-password");
  await dialog.getByRole("button", { name: "Approve and sign" }).click();
  await expect(dialog.getByText("That password is not right")).toBeVisible();
  await expect(approver.getByTestId("review-status")).toHaveText("Waiting for your decision");
  await dialog.getByLabel("Your password").fill(DEMO_PASSWORD);
  await dialog.getByRole("button", { name: "Approve and sign" }).click();
  await expect(approver.getByText(/Countersigned by Ruth Okonjo-Vale, Contracts manager/)).toBeVisible();
  await expect(approver.getByText("Approved and countersigned. The signed pack is issued")).toBeVisible();
  await expect(approver.getByTestId("review-status")).toHaveText("Approved");
  await approverContext.close();

  const approved = await waitForMail("adviser@brackenfold.example");
  expect(approved.subject).toMatch(/^Approved: Cabinet and chamber ring/);

  const adviserContext = await browser.newContext();
  const adviser = await adviserContext.newPage();
  await signIn(adviser, "adviser@brackenfold.example");
  await adviser.goto(approved.text.match(/https?:\/\/\S+\/revisions\/[0-9a-f-]+/)![0]);
  await expect(adviser.getByTestId("revision-status")).toHaveText("Approved");
  const downloadPromise = adviser.waitForEvent("download");
  await adviser.getByRole("link", { name: "Download the signed pack (PDF)" }).click();
  const download = await downloadPromise;
  const file = test.info().outputPath("pack.pdf");
  await download.saveAs(file);
  const pdf = readFileSync(file);
  expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
  expect(pdf.toString("latin1")).toContain("/adbe.pkcs7.detached");

  // Anyone can check it on /verify, signed in or not; one changed byte is caught.
  const anyone = await browser.newContext();
  const visitor = await anyone.newPage();
  await visitor.goto("/verify");
  await visitor.getByLabel("Pack (PDF, at most 20 MB)").setInputFiles(file);
  await visitor.getByRole("button", { name: "Check" }).click();
  await expect(visitor.getByTestId("verify-answer")).toHaveAttribute("data-result", "authentic");
  await expect(visitor.getByTestId("verify-answer")).toContainText("approved and current");
  const tampered = Buffer.from(pdf);
  tampered[tampered.indexOf("Hollin Vale")] = "J".charCodeAt(0);
  const tamperedFile = test.info().outputPath("tampered.pdf");
  writeFileSync(tamperedFile, tampered);
  await visitor.getByLabel("Pack (PDF, at most 20 MB)").setInputFiles(tamperedFile);
  await visitor.getByRole("button", { name: "Check" }).click();
  await expect(visitor.getByTestId("verify-answer")).toHaveAttribute("data-result", "altered");
  await visitor
    .getByLabel("Pack (PDF, at most 20 MB)")
    .setInputFiles({ name: "notes.pdf", mimeType: "application/pdf", buffer: Buffer.from("plain words, not a PDF") });
  await visitor.getByRole("button", { name: "Check" }).click();
  await expect(visitor.getByText("This file is not a PDF")).toBeVisible();
  await anyone.close();
  await adviserContext.close();
});
