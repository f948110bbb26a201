import { expect, test } from "@playwright/test";
import { signIn, steps } from "./helpers";

test("an adviser plans a lift: sling diagram, bad input refused, a complete plan lets the assessment be submitted", async ({ page }) => {
  await signIn(page, "adviser@brackenfold.example");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Assessments" }).click();
  await page.getByRole("link", { name: "Cabinet and chamber ring by lorry-loader crane" }).click();
  await steps(page).getByRole("button", { name: /Loads & lifts/ }).click();
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
  await steps(page).getByRole("button", { name: /Review & submit/ }).click();
  await expect(page.getByTestId("missing")).toContainText("appointed person");
  await expect(page.getByRole("button", { name: "Submit for approval" })).toBeDisabled();

  // Put the appointed person back; then submit.
  await steps(page).getByRole("button", { name: /Loads & lifts/ }).click();
  await page.getByRole("link", { name: "Open the lift plan" }).first().click();
  await page.getByLabel("Appointed person").fill("Gwenllian Marsh");
  await page.getByRole("button", { name: "Save lift plan" }).click();
  await expect(page.getByText("Lift plan saved.")).toBeVisible();
  await page.getByRole("link", { name: "← Back to Loads & lifts" }).click();
  await steps(page).getByRole("button", { name: /Review & submit/ }).click();
  await expect(page.getByText("Nothing required is missing.")).toBeVisible();
  await page.getByRole("button", { name: "Submit for approval" }).click();
  await expect(page.getByText("Submitted — waiting for approval")).toBeVisible();
  await expect(page.getByText("cannot be edited here")).toBeVisible();
});
