import { expect, test } from "@playwright/test";
import { createAssessment, signIn, steps } from "./helpers";

test("an admin keeps the hazard library; an adviser copies a hazard from it into an assessment", async ({
  page,
  browser,
}) => {
  await signIn(page, "admin@brackenfold.example");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Hazard library" }).click();
  await expect(
    page.getByTestId("library-entry").filter({ hasText: "Striking a buried cable or pipe while digging" }),
  ).toBeVisible();
  await page.getByRole("link", { name: "New hazard" }).click();
  const form = page.getByRole("form", { name: "Library hazard" });
  await form.getByRole("button", { name: "Save to the library" }).click();
  await expect(form.getByText("Describe the hazard").first()).toBeVisible();
  await form.getByLabel("Hazard", { exact: true }).fill("Striking a buried cable or pipe while digging");
  await form.getByLabel("Who is at risk").fill("Gang");
  await form.getByLabel("Control 1", { exact: true }).fill("Scan before digging");
  await form.getByRole("button", { name: "Save to the library" }).click();
  await expect(form.getByText("Already in the library")).toBeVisible();
  await form.getByLabel("Hazard", { exact: true }).fill("Hot work near the cable route");
  await form.getByRole("button", { name: "Save to the library" }).click();
  await expect(page.getByTestId("library-entry").filter({ hasText: "Hot work near the cable route" })).toBeVisible();

  const adviserContext = await browser.newContext();
  const adviser = await adviserContext.newPage();
  await signIn(adviser, "adviser@brackenfold.example");
  await adviser.goto("/hazard-library");
  await expect(adviser.getByRole("link", { name: "New hazard" })).toHaveCount(0);
  await adviser.goto("/assessments");
  await adviser.getByRole("link", { name: "Equipment base and cable chamber at Carrowby" }).click();
  await steps(adviser)
    .getByRole("button", { name: /Hazards & controls/ })
    .click();
  const before = await adviser.getByRole("article", { name: /^Hazard \d+$/ }).count();
  await adviser
    .getByLabel("From the hazard library")
    .selectOption({ label: "Striking a buried cable or pipe while digging" });
  await adviser.getByRole("button", { name: "Add with its controls" }).click();
  const added = adviser.getByRole("article", { name: `Hazard ${before + 1}` });
  await expect(added.getByLabel("Hazard", { exact: true })).toHaveValue(
    "Striking a buried cable or pipe while digging",
  );
  await expect(added.getByLabel("Control 2", { exact: true })).toHaveValue(/cable locating tool/);
  await expect(adviser.getByText(/All changes saved/)).toBeVisible();
  await adviserContext.close();
});

test("the lineside template: a braked trolley on rails, parts passed into an excavation, and a crane lift on mats", async ({
  page,
}) => {
  await signIn(page, "adviser@brackenfold.example");
  await page.goto("/assessments");
  await page.getByRole("link", { name: "Equipment base and cable chamber at Carrowby" }).click();
  await steps(page)
    .getByRole("button", { name: /Loads & lifts/ })
    .click();
  const band = (i: number) => page.getByTestId(`task-${i}`).getByTestId("task-result").locator("[data-band]").first();

  // Trolley: braked, so Watch until the brake's operator is named — and the result says it.
  const trolley = page.getByTestId("task-0");
  await expect(trolley.getByTestId("gradient-reading")).toContainText("1 in 200");
  await expect(band(0)).toHaveAttribute("data-band", "watch");
  await expect(trolley.getByTestId("task-result")).toContainText("name who works the trolley's brake");
  await trolley.getByLabel("Who works the brake").fill("Kieran Lusk");
  await expect(trolley.getByTestId("task-result")).not.toContainText("name who works the trolley's brake");

  // Passing sections down into the excavation: never Clear; the what-if offers a receiver in the excavation.
  await expect(band(2)).toHaveAttribute("data-band", "act");
  await expect(page.getByTestId("task-2").getByTestId("what-if-suggestion").first()).toContainText(
    "second person standing in the excavation",
  );

  // The crane lift on mats: ground bearing shown on the lift plan; bad input refused; soft ground stops it.
  await page.getByRole("link", { name: "Open the lift plan" }).click();
  await page.waitForURL(/\/lifts\//);
  const result = page.getByTestId("task-result");
  await expect(result).toContainText("Ground pressure (kPa)");
  await expect(result).toContainText("69 of 75");
  await expect(result.locator("[data-band]").first()).toHaveAttribute("data-band", "watch");
  await expect(
    result
      .getByTestId("what-if-suggestion")
      .filter({ hasText: "Outrigger mats of at least 1.3 m" })
      .locator("[data-band]"),
  ).toHaveAttribute("data-band", "clear");
  await page.getByLabel("Mat length").fill("0");
  await expect(page.getByText("must be greater than 0")).toBeVisible();
  await page.getByLabel("Mat length").fill("1.2");
  await page.getByLabel("Ground", { exact: true }).selectOption("soft-clay");
  await expect(result.locator("[data-band]").first()).toHaveAttribute("data-band", "stop");
  await expect(result).toContainText("No presumed bearing value for soft clays and silts");
  await page.getByLabel("Allowable bearing pressure").fill("120");
  await expect(result.locator("[data-band]").first()).toHaveAttribute("data-band", "clear");
  await expect(page.getByTestId("sling-diagram")).toHaveAttribute("data-hitch", "straight");
  await page.getByLabel("Hitch").selectOption("basket");
  await expect(page.getByText("a basket or endless sling is one sling: 1 leg")).toBeVisible();
});

test("the review step blocks lineside gaps: no protection arrangement, no responsible person, a permit without its reference", async ({
  page,
}) => {
  await signIn(page, "adviser@brackenfold.example");
  await createAssessment(
    page,
    "Carrowby cutting: troughing route renewal",
    "Trough route near the line",
    /Laying a cable trough route/,
  );

  await steps(page)
    .getByRole("button", { name: /Review & submit/ })
    .click();
  const missing = page.getByTestId("missing");
  await expect(missing).toContainText("Name the person responsible for the safe system of work.");
  await expect(missing).toContainText("Say where the positions of safety are.");
  await expect(page.getByRole("button", { name: "Submit for approval" })).toBeDisabled();

  // Near the line: clearing the arrangement is a blocker too; the caution says what Heftwise does not do.
  await missing.getByRole("button", { name: "Near the line" }).first().click();
  await expect(page.getByText("it does not plan protection from trains")).toBeVisible();
  await page.getByLabel("Protection arrangement").selectOption("");
  await page.getByLabel("Person responsible for the safe system of work").fill("Nerys Caldwell");
  await page.getByLabel("Their competence reference").fill("SSOW-PL 3318");
  await page.getByLabel("Planning reference of the arrangement").fill("WHV <0417>");
  await expect(page.getByText("Use letters, digits, spaces and - / . _ : # only")).toBeVisible();
  await page.getByLabel("Planning reference of the arrangement").fill("WHV-SSOW-0417");
  await page.getByLabel("Positions of safety").fill("The cess beyond the fence line, every 20 m");

  // A permit listed without its reference; its dates the wrong way round.
  await steps(page)
    .getByRole("button", { name: /Permits, services & digging/ })
    .click();
  await page.getByRole("button", { name: "Add a permit" }).click();
  const permit = page.getByRole("group", { name: "Permit 1" });
  await permit.getByLabel("Permit", { exact: true }).selectOption("hot-work");
  await permit.getByLabel("Issued by").fill("Site permit office");
  await permit.getByLabel("Valid from").fill("10-03-2027");
  await permit.getByLabel("Valid to").fill("01-03-2027");
  await expect(permit.getByText("Must be on or after the start date")).toBeVisible();
  await permit.getByLabel("Valid to").fill("31-03-2O27");
  await expect(permit.getByText("Use a real date")).toBeVisible();
  await permit.getByLabel("Valid to").fill("12-03-2027");
  await expect(permit.getByText("Use a real date")).toHaveCount(0);

  await steps(page)
    .getByRole("button", { name: /Review & submit/ })
    .click();
  await expect(missing).toContainText("Choose the protection arrangement for working on or near the line.");
  await expect(missing).toContainText("Hot work permit: the permit is listed as needed but has no reference.");
  await expect(missing).not.toContainText("Name the person responsible");
  await expect(page.getByRole("button", { name: "Submit for approval" })).toBeDisabled();

  await steps(page)
    .getByRole("button", { name: /Near the line/ })
    .click();
  await page.getByLabel("Protection arrangement").selectOption("line-blockage");
  await steps(page)
    .getByRole("button", { name: /Permits, services & digging/ })
    .click();
  await page.getByRole("group", { name: "Permit 1" }).getByLabel("Reference").fill("HW-0093");
  await steps(page)
    .getByRole("button", { name: /Review & submit/ })
    .click();
  await expect(missing).not.toContainText("protection arrangement");
  await expect(missing).not.toContainText("Hot work permit");
});
