/** Sessions on the server: sign-out ends one, "everywhere" and deactivation end all, nothing comes back. */
import { beforeAll, describe, expect, it } from "vitest";
import { closeAllSessions, closeSession, openSession, sessionIsOpen } from "@/lib/auth/sessions";
import { setActive } from "@/lib/users/service";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation } from "./helpers";

let admin: Actor;
let foreman: Actor;
beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  admin = await actorFor("admin", organisationId);
  foreman = await actorFor("foreman", organisationId);
});

describe("server-side sessions", () => {
  it("a session is open until it is signed out; another of the same user stays open", async () => {
    const phone = await openSession(foreman.id);
    const office = await openSession(foreman.id);
    expect(await sessionIsOpen(phone, foreman.id)).toBe(true);
    await closeSession(phone);
    expect(await sessionIsOpen(phone, foreman.id)).toBe(false);
    expect(await sessionIsOpen(office, foreman.id)).toBe(true);
    expect(await sessionIsOpen(office, admin.id)).toBe(false);
    expect(await sessionIsOpen("not-a-session", foreman.id)).toBe(false);
    expect(await sessionIsOpen(undefined, foreman.id)).toBe(false);
  });

  it("signing out everywhere ends every session of the user", async () => {
    const a = await openSession(foreman.id);
    const b = await openSession(foreman.id);
    await closeAllSessions(foreman.id);
    expect([await sessionIsOpen(a, foreman.id), await sessionIsOpen(b, foreman.id)]).toEqual([false, false]);
  });

  it("deactivation ends every session, and reactivation revives none", async () => {
    const s = await openSession(foreman.id);
    await setActive(admin, { userId: foreman.id, active: false });
    await setActive(admin, { userId: foreman.id, active: true });
    expect(await sessionIsOpen(s, foreman.id)).toBe(false);
  });
});
