import { expect, type Locator, type Page } from "@playwright/test";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import { INBOX_URL } from "../../playwright.config";

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-as")).toBeVisible();
}

export interface InboxMessage {
  to: string[];
  subject: string;
  text: string;
  kind: string | null;
}

/** Waits for an e-mail to `to` (and with a subject matching `subject`) to reach the local mail fake. */
export async function waitForMail(to: string, timeoutMs = 15_000, subject?: RegExp): Promise<InboxMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const messages = (await (await fetch(`${INBOX_URL}/api/messages`)).json()) as InboxMessage[];
    const found = messages.filter((m) => m.to.includes(to) && (!subject || subject.test(m.subject))).at(-1);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no e-mail to ${to} within ${timeoutMs} ms`);
}

/** Creates an assessment for a demo job from the new-assessment form and opens it in the wizard. */
export async function createAssessment(page: Page, job: string, title: string, template: RegExp) {
  await page.goto("/assessments/new");
  const form = page.getByRole("form", { name: "New assessment" });
  await form.getByLabel("Job").selectOption({ label: job });
  await form.getByLabel("Title").fill(title);
  await form.getByLabel(template).check();
  await form.getByRole("button", { name: "Create and open" }).click();
}

/** The band a wizard task shows, when it shows one. */
export const taskBand = (task: Locator) => task.getByTestId("task-result").locator("[data-band]").first();

/** The wizard's step navigation. */
export const steps = (page: Page) => page.getByRole("navigation", { name: "Steps" });

/** Chooses a task's component by searching the load register, as an adviser does. */
export async function chooseComponent(task: Locator, label: string) {
  await task.getByLabel("Component").fill(label.split(" — ")[0]);
  await task.getByRole("button", { name: label, exact: true }).click();
  await expect(task.getByTestId("chosen-component")).toContainText(label);
}

/** Draws a signature with the finger (the last signature pad on the page). */
export async function drawSignature(page: Page) {
  const pad = page.getByTestId("signature-pad").last();
  await pad.scrollIntoViewIfNeeded();
  const box = (await pad.boundingBox())!;
  await page.mouse.move(box.x + 15, box.y + box.height / 2);
  await page.mouse.down();
  for (let i = 1; i <= 12; i++)
    await page.mouse.move(box.x + 15 + i * 20, box.y + box.height / 2 + Math.sin(i) * 20, { steps: 2 });
  await page.mouse.up();
}

/** One operative signs on at the briefing's sign-on screen. */
export async function signOnOperative(page: Page, name: string, employer: string, card: string) {
  await page.getByLabel("Your name").fill(name);
  await page.getByLabel("Employer").fill(employer);
  await page.getByLabel("Competence card number").fill(card);
  await drawSignature(page);
  await page.getByRole("button", { name: "Sign on" }).click();
  await expect(page.getByTestId("sign-on-list")).toContainText(`${name} (${employer})`);
}
