/**
 * Accounts: sign-up confirmed by e-mail, password reset and change, the second factor at sign-in,
 * and what an organisation's "second factor required" does to a role. E-mail goes through the
 * SMTP fake; links are read from the messages it received.
 */
import { and, eq } from "drizzle-orm";
import { generate } from "otplib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import { getDb } from "@/db/client";
import { accountLinks, organisations, users, userSessions } from "@/db/schema";
import {
  changePassword,
  confirmEmail,
  confirmSecondFactor,
  disableSecondFactor,
  inspectAccountLink,
  requestPasswordReset,
  resetPassword,
  signUp,
  startSecondFactor,
} from "@/lib/account/service";
import {
  checkCredentials,
  CODE_NOT_RECOGNISED,
  EMAIL_NOT_CONFIRMED,
  SECOND_FACTOR_NEEDED,
  SIGN_IN_FAILED,
} from "@/lib/auth/credentials";
import { openSession } from "@/lib/auth/sessions";
import { AppError } from "@/lib/errors";
import { startMailFake, type MailFake } from "@/lib/mail/fake-server";
import { authorize, can, type Actor } from "@/lib/permissions";
import { updateOrganisationSettings } from "@/lib/organisations/service";
import { actorFor, demoOrganisation } from "./helpers";

let fake: MailFake;
let organisationId: string;
let admin: Actor;

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
  ({ organisationId } = await demoOrganisation());
  admin = await actorFor("admin", organisationId);
});
afterAll(() => fake.close());

const lastMailTo = (address: string) => fake.messages.filter((m) => m.to.includes(address)).at(-1);
const linkToken = (text: string, path: string) => text.match(new RegExp(`${path}/([A-Za-z0-9_-]+)`))![1];

async function failure(promise: Promise<unknown>): Promise<AppError> {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
}

const signUpInput = (email: string) => ({
  organisation: "Culverdale Civils",
  name: "Wren Ashby",
  email,
  password: "a-long-enough-password",
  confirm: "a-long-enough-password",
});

describe("signing up a new organisation", () => {
  it("creates the organisation and its administrator, who can sign in only after confirming the address", async () => {
    const { deliver } = await signUp(signUpInput("Wren@Culverdale.example"));
    await deliver();
    const mail = lastMailTo("wren@culverdale.example")!;
    expect(mail.subject).toBe("Confirm your address to start with Heftwise");
    const token = linkToken(mail.text, "/sign-up/confirm");
    // Signing up again at once sends nothing more (and changes nothing): no flooding an inbox.
    await (await signUp(signUpInput("wren@culverdale.example"))).deliver();
    expect(fake.messages.filter((m) => m.to.includes("wren@culverdale.example"))).toHaveLength(1);

    await expect(
      checkCredentials({ email: "wren@culverdale.example", password: "a-long-enough-password" }, "10.9.0.1"),
    ).rejects.toThrow(EMAIL_NOT_CONFIRMED);
    // Opening the link changes nothing; the button does.
    expect(await inspectAccountLink(token, "verify-email")).toMatchObject({ state: "valid" });
    await confirmEmail(token);
    const { actor, method } = await checkCredentials(
      { email: "wren@culverdale.example", password: "a-long-enough-password" },
      "10.9.0.1",
    );
    expect(actor.role).toBe("admin");
    expect(method).toBe("password");
    const db = await getDb();
    const [org] = await db.select().from(organisations).where(eq(organisations.id, actor.organisationId));
    expect(org.name).toBe("Culverdale Civils");

    // The link is spent; a forged one is unknown; neither changes anything.
    expect((await failure(confirmEmail(token))).message).toMatch(/already been used/);
    expect(await inspectAccountLink("forged-token-forged-token-forged", "verify-email")).toMatchObject({
      state: "unknown",
    });
  });

  it("an expired confirmation link is refused and the account stays unconfirmed", async () => {
    const { deliver } = await signUp(signUpInput("late@culverdale.example"));
    await deliver();
    const token = linkToken(lastMailTo("late@culverdale.example")!.text, "/sign-up/confirm");
    const db = await getDb();
    const [user] = await db.select().from(users).where(eq(users.email, "late@culverdale.example"));
    await db
      .update(accountLinks)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(accountLinks.userId, user.id));
    expect((await failure(confirmEmail(token))).message).toMatch(/expired/);
    const [after] = await db.select().from(users).where(eq(users.id, user.id));
    expect(after.emailVerifiedAt).toBeNull();
  });

  it("an address with an account already gets a notice, not a second account, and the same answer", async () => {
    const db = await getDb();
    const before = (await db.select().from(organisations)).length;
    const { deliver } = await signUp(signUpInput("adviser@brackenfold.example"));
    await deliver();
    expect((await db.select().from(organisations)).length).toBe(before);
    expect(lastMailTo("adviser@brackenfold.example")!.subject).toBe("Your Heftwise account");
  });

  it("refuses bad input on its fields", async () => {
    const err = await failure(signUp({ organisation: "", name: "W", email: "nope", password: "short", confirm: "x" }));
    expect(err.code).toBe("validation");
    expect(err.issues!.map((i) => i.path).sort()).toEqual(["confirm", "email", "name", "organisation", "password"]);
  });
});

describe("resetting a forgotten password", () => {
  it("answers the same for an unknown address and sends nothing", async () => {
    const count = fake.messages.length;
    const { deliver } = await requestPasswordReset({ email: "nobody@nowhere.example" });
    await deliver();
    expect(fake.messages.length).toBe(count);
  });

  it("e-mails a one-time link; the new password works, the old does not, every session ends", async () => {
    const email = "foreman@brackenfold.example";
    const foreman = await actorFor("foreman", organisationId);
    await openSession(foreman.id);
    const { deliver } = await requestPasswordReset({ email: "Foreman@Brackenfold.example " });
    await deliver();
    const token = linkToken(lastMailTo(email)!.text, "/reset-password");
    const bad = await failure(resetPassword(token, { password: "short", confirm: "short" }));
    expect(bad.issues![0].path).toBe("password");
    await resetPassword(token, { password: "a-brand-new-password", confirm: "a-brand-new-password" });
    const db = await getDb();
    expect(await db.select().from(userSessions).where(eq(userSessions.userId, foreman.id))).toEqual([]);
    await expect(checkCredentials({ email, password: DEMO_PASSWORD }, "10.9.1.1")).rejects.toThrow(SIGN_IN_FAILED);
    expect((await checkCredentials({ email, password: "a-brand-new-password" }, "10.9.1.1")).actor.id).toBe(foreman.id);
    // Used once: reusing it changes nothing.
    expect(
      (await failure(resetPassword(token, { password: "another-password-1", confirm: "another-password-1" }))).message,
    ).toMatch(/already been used/);
    expect((await checkCredentials({ email, password: "a-brand-new-password" }, "10.9.1.1")).actor.id).toBe(foreman.id);
  });

  it("an expired reset link is refused", async () => {
    const email = "admin@brackenfold.example";
    const { deliver } = await requestPasswordReset({ email });
    await deliver();
    const token = linkToken(lastMailTo(email)!.text, "/reset-password");
    const db = await getDb();
    await db
      .update(accountLinks)
      .set({ expiresAt: new Date(Date.now() - 1) })
      .where(and(eq(accountLinks.userId, admin.id), eq(accountLinks.purpose, "reset-password")));
    expect(
      (await failure(resetPassword(token, { password: "never-applied-pw", confirm: "never-applied-pw" }))).message,
    ).toMatch(/expired/);
    expect((await checkCredentials({ email, password: DEMO_PASSWORD }, "10.9.2.1")).actor.id).toBe(admin.id);
  });
});

describe("changing the password", () => {
  it("needs the current password; ends every other session and keeps this one", async () => {
    const adviser = await actorFor("adviser", organisationId);
    const here = await openSession(adviser.id);
    const elsewhere = await openSession(adviser.id);
    const wrong = await failure(
      changePassword(adviser, here, {
        current: "not-it-at-all",
        password: "new-password-123",
        confirm: "new-password-123",
      }),
    );
    expect(wrong.issues).toEqual([{ path: "current", message: "Your current password is not right" }]);
    const { deliver } = await changePassword(adviser, here, {
      current: DEMO_PASSWORD,
      password: "new-password-123",
      confirm: "new-password-123",
    });
    await deliver();
    const db = await getDb();
    const open = (await db.select().from(userSessions).where(eq(userSessions.userId, adviser.id))).map((s) => s.id);
    expect(open).toContain(here);
    expect(open).not.toContain(elsewhere);
    expect(lastMailTo(adviser.email)!.subject).toBe("Your Heftwise password was changed");
  });
});

describe("the second factor", () => {
  it("is asked for after a right password; a wrong code is a failure; a code works once; recovery codes work once", async () => {
    const approver = await actorFor("approver", organisationId);
    const { secret } = await startSecondFactor(approver);
    const wrong = await failure(confirmSecondFactor(approver, { code: "000000" }));
    expect(wrong.issues![0].path).toBe("code");
    const { recoveryCodes } = await confirmSecondFactor(approver, { code: await generate({ secret }) });
    expect(recoveryCodes).toHaveLength(10);

    const email = approver.email;
    await expect(checkCredentials({ email, password: DEMO_PASSWORD }, "10.9.3.1")).rejects.toThrow(
      SECOND_FACTOR_NEEDED,
    );
    await expect(checkCredentials({ email, password: DEMO_PASSWORD, code: "123456" }, "10.9.3.1")).rejects.toThrow(
      CODE_NOT_RECOGNISED,
    );
    // The enrolment's own code was spent: the current code is accepted only if the step moved on,
    // so sign in with a recovery code, then check it cannot be used again.
    const viaRecovery = await checkCredentials(
      { email, password: DEMO_PASSWORD, code: recoveryCodes[0].toUpperCase() },
      "10.9.3.1",
    );
    expect(viaRecovery.method).toBe("password+recovery-code");
    await expect(
      checkCredentials({ email, password: DEMO_PASSWORD, code: recoveryCodes[0] }, "10.9.3.1"),
    ).rejects.toThrow(CODE_NOT_RECOGNISED);
    // A wrong password never reveals that a code would be asked for.
    await expect(checkCredentials({ email, password: "wrong-password" }, "10.9.3.2")).rejects.toThrow(SIGN_IN_FAILED);

    await disableSecondFactor(approver, { password: DEMO_PASSWORD, code: recoveryCodes[1] });
    expect((await checkCredentials({ email, password: DEMO_PASSWORD }, "10.9.3.3")).method).toBe("password");
  });

  it("wrong codes are throttled like wrong passwords", async () => {
    const foremanEmail = "briefing-test-2fa@brackenfold.example";
    const db = await getDb();
    const [user] = await db
      .insert(users)
      .values({
        organisationId,
        email: foremanEmail,
        name: "Tamsin Reed",
        role: "foreman",
        passwordHash: (await db.select().from(users).where(eq(users.id, admin.id)))[0].passwordHash,
        emailVerifiedAt: new Date(),
      })
      .returning();
    const actor: Actor = { id: user.id, organisationId, role: "foreman", name: user.name, email: foremanEmail };
    const { secret } = await startSecondFactor(actor);
    await confirmSecondFactor(actor, { code: await generate({ secret }) });
    for (let i = 0; i < 5; i++)
      await expect(
        checkCredentials({ email: foremanEmail, password: DEMO_PASSWORD, code: `00000${i}` }, "10.9.4.1"),
      ).rejects.toThrow(CODE_NOT_RECOGNISED);
    await expect(
      checkCredentials({ email: foremanEmail, password: DEMO_PASSWORD, code: "999999" }, "10.9.4.1"),
    ).rejects.toThrow(/Too many attempts/);
  });

  it("required for a role: until set up, that role can reach only its account", async () => {
    await updateOrganisationSettings(admin, {
      name: "Brackenfold Lineside Ltd",
      reviewPeriodMonths: 6,
      secondFactorRoles: ["adviser"],
      reviewReminders: "30,7",
      approvalReminderDays: 3,
    });
    const pending: Actor = { ...(await actorFor("adviser", organisationId)), mustEnrolSecondFactor: true };
    expect(can(pending, "assessments:read")).toBe(false);
    expect(can(pending, "profile:read")).toBe(true);
    expect(() => authorize(pending, "assessments:read")).toThrow(/requires a second factor/);
    const refused = await failure(
      updateOrganisationSettings(admin, {
        name: "B",
        reviewPeriodMonths: 5,
        secondFactorRoles: ["pilot"],
        reviewReminders: "every day",
        approvalReminderDays: 0,
      }),
    );
    expect(refused.issues!.map((i) => i.path).sort()).toEqual([
      "approvalReminderDays",
      "name",
      "reviewPeriodMonths",
      "reviewReminders",
      "secondFactorRoles.0",
    ]);
  });
});
