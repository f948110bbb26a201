/** People: invitations by e-mail through the SMTP fake, setting a password, roles, deactivation. */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import { auditEvents, invites, outboundEmails, signInAttempts, users } from "@/db/schema";
import { checkCredentials, SIGN_IN_FAILED } from "@/lib/auth/credentials";
import { AppError } from "@/lib/errors";
import { startMailFake, type MailFake } from "@/lib/mail/fake-server";
import type { Actor } from "@/lib/permissions";
import {
  acceptInvite,
  changeRole,
  inspectInvite,
  inviteUser,
  listUsers,
  resendInvite,
  setActive,
} from "@/lib/users/service";
import { actorFor, demoOrganisation, otherOrganisation } from "./helpers";

let fake: MailFake;
let admin: Actor;
let adviser: Actor;
let organisationId: string;

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
  ({ organisationId } = await demoOrganisation());
  admin = await actorFor("admin", organisationId);
  adviser = await actorFor("adviser", organisationId);
});
afterAll(() => fake.close());

const tokenFrom = (text: string) => text.match(/\/invite\/([A-Za-z0-9_-]+)/)![1];

async function expectAppError(promise: Promise<unknown>, code: string) {
  const err = await promise.then(
    () => null,
    (e) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  expect((err as AppError).code).toBe(code);
  return err as AppError;
}

describe("inviting someone", () => {
  it("sends a one-time link through SMTP, logs the e-mail, and the link sets a password once", async () => {
    const { mail } = await inviteUser(admin, {
      email: "  New.Person@Brackenfold.example ",
      name: "Nell Quarry",
      role: "foreman",
    });
    expect(mail.status).toBe("sent");
    const received = fake.messages.find((m) => m.to.includes("new.person@brackenfold.example"))!;
    expect(received.subject).toBe("Your Heftwise account");
    expect(received.kind).toBe("invite");
    const token = tokenFrom(received.text);

    const db = await getDb();
    const [logged] = await db.select().from(outboundEmails).where(eq(outboundEmails.id, mail.id));
    expect(logged).toMatchObject({
      status: "sent",
      kind: "invite",
      toAddress: "new.person@brackenfold.example",
      attempts: 1,
    });

    expect(await inspectInvite(token)).toEqual({
      state: "valid",
      name: "Nell Quarry",
      email: "new.person@brackenfold.example",
    });
    await expect(
      checkCredentials({ email: "new.person@brackenfold.example", password: "anything-at-all" }, null),
    ).rejects.toThrow(SIGN_IN_FAILED);

    // Bad input: too short, and not matching. Nothing changes and the link still works.
    const short = await expectAppError(acceptInvite(token, { password: "short", confirm: "short" }), "validation");
    expect(short.issues?.[0].path).toBe("password");
    const differ = await expectAppError(
      acceptInvite(token, { password: "long-enough-pass", confirm: "long-enough-pasS" }),
      "validation",
    );
    expect(differ.issues?.[0].path).toBe("confirm");
    expect((await inspectInvite(token)).state).toBe("valid");

    await acceptInvite(token, { password: "a-new-long-password", confirm: "a-new-long-password" });
    const actor = await checkCredentials(
      { email: "new.person@brackenfold.example", password: "a-new-long-password" },
      null,
    );
    expect(actor.actor).toMatchObject({ role: "foreman", organisationId });

    // The link is spent.
    expect((await inspectInvite(token)).state).toBe("used");
    await expectAppError(
      acceptInvite(token, { password: "another-long-password", confirm: "another-long-password" }),
      "conflict",
    );
    await checkCredentials({ email: "new.person@brackenfold.example", password: "a-new-long-password" }, null);
  });

  it("an expired link is refused and changes nothing", async () => {
    await inviteUser(admin, { email: "late@brackenfold.example", name: "Lettice Late", role: "adviser" });
    const token = tokenFrom(fake.messages.at(-1)!.text);
    const db = await getDb();
    const user = await db.query.users.findFirst({ where: eq(users.email, "late@brackenfold.example") });
    await db
      .update(invites)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invites.userId, user!.id));
    expect((await inspectInvite(token)).state).toBe("expired");
    await expectAppError(
      acceptInvite(token, { password: "a-long-password!", confirm: "a-long-password!" }),
      "conflict",
    );
    const after = await db.query.users.findFirst({ where: eq(users.id, user!.id) });
    expect(after!.passwordHash).toBeNull();
  });

  it("a tampered link is unknown", async () => {
    await inviteUser(admin, { email: "tamper@brackenfold.example", name: "Tam Per", role: "adviser" });
    const token = tokenFrom(fake.messages.at(-1)!.text);
    const tampered = (token[0] === "A" ? "B" : "A") + token.slice(1);
    expect((await inspectInvite(tampered)).state).toBe("unknown");
    expect((await inspectInvite("../../etc/passwd")).state).toBe("unknown");
  });

  it("resending replaces the earlier link", async () => {
    await inviteUser(admin, { email: "twice@brackenfold.example", name: "Tw Ice", role: "approver" });
    const first = tokenFrom(fake.messages.at(-1)!.text);
    const db = await getDb();
    const user = await db.query.users.findFirst({ where: eq(users.email, "twice@brackenfold.example") });
    const outcome = await resendInvite(admin, { userId: user!.id });
    expect(outcome.status).toBe("sent");
    const second = tokenFrom(fake.messages.at(-1)!.text);
    expect(second).not.toBe(first);
    expect((await inspectInvite(first)).state).toBe("unknown");
    expect((await inspectInvite(second)).state).toBe("valid");
  });

  it("an address with an account in another organisation is not revealed: nothing is created, its owner is told, the admin sees an invitation", async () => {
    const other = await otherOrganisation();
    const theirs = other.admin.email;
    const db = await getDb();
    const before = await db.select().from(users).where(eq(users.organisationId, organisationId));
    const result = await inviteUser(admin, { email: theirs, name: "Someone Else", role: "adviser" });
    expect(result.mail.status).toBe("sent");
    expect(result.userId).toBeNull();
    expect(await db.select().from(users).where(eq(users.organisationId, organisationId))).toHaveLength(before.length);
    const notice = fake.messages.filter((m) => m.to.includes(theirs)).at(-1)!;
    expect(notice.text).toContain("already has a Heftwise account with another organisation");
  });

  it("refuses an address that already has an account here, with the field named", async () => {
    const err = await expectAppError(
      inviteUser(admin, { email: "adviser@brackenfold.example", name: "Dup", role: "adviser" }),
      "validation",
    );
    expect(err.issues).toEqual([{ path: "email", message: "This person is already in your organisation" }]);
  });

  it("names every bad field", async () => {
    const err = await expectAppError(
      inviteUser(admin, { email: "not-an-address", name: "", role: "boss" }),
      "validation",
    );
    expect(err.issues!.map((i) => i.path).sort()).toEqual(["email", "name", "role"]);
  });

  it("only an admin may invite; an adviser is refused (403)", async () => {
    await expectAppError(
      inviteUser(adviser, { email: "x@brackenfold.example", name: "X Y", role: "adviser" }),
      "forbidden",
    );
    await expectAppError(
      inviteUser(null, { email: "x@brackenfold.example", name: "X Y", role: "adviser" }),
      "unauthenticated",
    );
  });

  it("a failed send is logged as failed after retries and reported, and the invitation stands", async () => {
    // Point the mail transport at a port where nothing listens (the transport is memoised per process).
    const g = globalThis as unknown as { __heftwiseTransport?: unknown };
    g.__heftwiseTransport = undefined;
    const { config } = await import("@/lib/config");
    const cfg = config() as { smtpUrl: string };
    const original = cfg.smtpUrl;
    cfg.smtpUrl = "smtp://127.0.0.1:9";
    try {
      const { userId, mail } = await inviteUser(admin, {
        email: "offline@brackenfold.example",
        name: "Off Line",
        role: "foreman",
      });
      expect(mail.status).toBe("failed");
      const db = await getDb();
      const [logged] = await db.select().from(outboundEmails).where(eq(outboundEmails.id, mail.id));
      expect(logged.status).toBe("failed");
      expect(logged.attempts).toBe(3);
      expect(logged.lastError).toBeTruthy();
      expect(await db.query.users.findFirst({ where: eq(users.id, userId!) })).toBeTruthy();
    } finally {
      cfg.smtpUrl = original;
      g.__heftwiseTransport = undefined;
    }
  });
});

describe("roles and deactivation", () => {
  it("an admin changes a role; it is audited", async () => {
    const foreman = await actorFor("foreman", organisationId);
    await changeRole(admin, { userId: foreman.id, role: "approver" });
    const db = await getDb();
    expect((await db.query.users.findFirst({ where: eq(users.id, foreman.id) }))!.role).toBe("approver");
    const events = await db.select().from(auditEvents).where(eq(auditEvents.entityId, foreman.id));
    expect(events.map((e) => e.action)).toContain("user.role-changed");
    await changeRole(admin, { userId: foreman.id, role: "foreman" });
  });

  it("an admin cannot change their own role or deactivate themselves", async () => {
    await expectAppError(changeRole(admin, { userId: admin.id, role: "adviser" }), "conflict");
    await expectAppError(setActive(admin, { userId: admin.id, active: false }), "conflict");
  });

  it("a deactivated user cannot sign in; reactivated, they can", async () => {
    const approver = await actorFor("approver", organisationId);
    await checkCredentials({ email: approver.email, password: DEMO_PASSWORD }, null);
    await setActive(admin, { userId: approver.id, active: false });
    await expect(checkCredentials({ email: approver.email, password: DEMO_PASSWORD }, null)).rejects.toThrow(
      SIGN_IN_FAILED,
    );
    await setActive(admin, { userId: approver.id, active: true });
    await checkCredentials({ email: approver.email, password: DEMO_PASSWORD }, null);
  });

  it("another organisation's user is not found (404), never forbidden", async () => {
    const other = await otherOrganisation();
    await expectAppError(changeRole(admin, { userId: other.adminId, role: "adviser" }), "not_found");
    await expectAppError(setActive(admin, { userId: other.adminId, active: false }), "not_found");
    const listed = await listUsers(admin);
    expect(listed.some((u) => u.id === other.adminId)).toBe(false);
    expect((await listUsers(other.admin)).map((u) => u.id)).toEqual([other.adminId]);
  });
});

describe("signing in", () => {
  it("unknown address and wrong password give the same message", async () => {
    const unknown = await checkCredentials(
      { email: "nobody@nowhere.example", password: "whatever-pass" },
      "10.0.0.1",
    ).catch((e: Error) => e.message);
    const wrong = await checkCredentials(
      { email: "adviser@brackenfold.example", password: "wrong-password" },
      "10.0.0.2",
    ).catch((e: Error) => e.message);
    expect(unknown).toBe(SIGN_IN_FAILED);
    expect(wrong).toBe(SIGN_IN_FAILED);
  });

  it("five failures on an account from one address make that address wait, even with the right password; kept in the database", async () => {
    const email = "admin@brackenfold.example";
    for (let i = 0; i < 5; i++)
      await checkCredentials({ email, password: `wrong-${i}-password` }, "10.1.0.9").catch(() => undefined);
    await expect(checkCredentials({ email, password: DEMO_PASSWORD }, "10.1.0.9")).rejects.toThrow(/Too many attempts/);
    const db = await getDb();
    expect((await db.select().from(signInAttempts)).map((r) => r.key)).toEqual(
      expect.arrayContaining([`pair:${email}|10.1.0.9`, `account:${email}`, "address:10.1.0.9"]),
    );
  });

  it("the owner signing in from an address that has not failed is slowed a little, never locked out", async () => {
    const email = "admin@brackenfold.example";
    // Someone else keeps failing on the admin's account from their own address.
    for (let i = 0; i < 3; i++)
      await checkCredentials({ email, password: `guess-${i}-password` }, "10.1.0.9").catch(() => undefined);
    const actor = await checkCredentials({ email, password: DEMO_PASSWORD }, "10.2.0.1");
    expect(actor.actor.email).toBe(email);
  });

  it("an address that tries many accounts waits, for any account", async () => {
    for (let i = 0; i < 20; i++)
      await checkCredentials({ email: `nobody-${i}@nowhere.example`, password: "whatever-pass" }, "10.3.0.3").catch(
        () => undefined,
      );
    await expect(
      checkCredentials({ email: "adviser@brackenfold.example", password: DEMO_PASSWORD }, "10.3.0.3"),
    ).rejects.toThrow(/Too many attempts/);
    expect(
      (await checkCredentials({ email: "adviser@brackenfold.example", password: DEMO_PASSWORD }, "10.3.0.4")).actor
        .email,
    ).toBe("adviser@brackenfold.example");
  });
});

describe("invitations under concurrency", () => {
  it("two simultaneous invitations of one address make one person with one invitation; the other is refused", async () => {
    const email = "at-once@brackenfold.example";
    const results = await Promise.allSettled([
      inviteUser(admin, { name: "Twice Invited", email, role: "foreman" }),
      inviteUser(admin, { name: "Twice Invited", email, role: "foreman" }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual(["fulfilled", "rejected"]);
    const refused = results.find((r) => r.status === "rejected") as PromiseRejectedResult;
    expect(refused.reason).toBeInstanceOf(AppError);
    expect([409, 422]).toContain((refused.reason as AppError).status);
    const db = await getDb();
    const people = await db.select().from(users).where(eq(users.email, email));
    expect(people).toHaveLength(1);
    expect(await db.select().from(invites).where(eq(invites.userId, people[0].id))).toHaveLength(1);
  });
});
