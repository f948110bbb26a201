/** The hazard library: read by advisers, kept by admins, organisations apart, a starter set that can be added again safely. */
import { beforeAll, describe, expect, it } from "vitest";
import { createEntry, deleteEntry, getEntry, restoreStarter, updateEntry } from "@/assessments/hazard-library/service";
import { listLibrary } from "@/assessments/hazard-library/queries";
import { STARTER_HAZARDS } from "@/assessments/hazard-library/starter";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation, otherOrganisation } from "./helpers";

let admin: Actor;
let adviser: Actor;
let foreman: Actor;
let approver: Actor;
let other: Actor;

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  admin = await actorFor("admin", organisationId);
  adviser = await actorFor("adviser", organisationId);
  foreman = await actorFor("foreman", organisationId);
  approver = await actorFor("approver", organisationId);
  other = (await otherOrganisation()).admin;
});

const code = (p: Promise<unknown>) =>
  p.then(
    () => "ok",
    (e) => (e instanceof AppError ? e.code : String(e)),
  );
const entry = (hazard: string) => ({
  hazard,
  whoIsAtRisk: "Gang",
  likelihoodBefore: 3,
  severityBefore: 4,
  controls: [{ text: "Barrier round the work", level: "engineering" }],
  likelihoodAfter: 1,
  severityAfter: 4,
});

describe("the hazard library", () => {
  it("the demo organisation starts with the starter hazards; advisers read them, foremen and approvers do not", async () => {
    const list = await listLibrary(adviser);
    expect(list.map((e) => e.hazard).sort()).toEqual(STARTER_HAZARDS.map((h) => h.hazard).sort());
    expect(list.some((e) => /buried cable/i.test(e.hazard))).toBe(true);
    expect(await code(listLibrary(foreman))).toBe("forbidden");
    expect(await code(listLibrary(approver))).toBe("forbidden");
    expect(await code(listLibrary(null))).toBe("unauthenticated");
  });

  it("admins add, change and remove entries; advisers may not", async () => {
    expect(await code(createEntry(adviser, entry("Hot work near the cable route")))).toBe("forbidden");
    const added = await createEntry(admin, entry("Hot work near the cable route"));
    expect((await listLibrary(adviser)).map((e) => e.hazard)).toContain("Hot work near the cable route");
    await updateEntry(admin, added.id, { ...entry("Hot work near the cable route"), whoIsAtRisk: "Welder and gang" });
    expect((await getEntry(admin, added.id)).input.whoIsAtRisk).toBe("Welder and gang");
    expect(await code(deleteEntry(adviser, added.id))).toBe("forbidden");
    await deleteEntry(admin, added.id);
    expect((await listLibrary(admin)).map((e) => e.hazard)).not.toContain("Hot work near the cable route");
  });

  it("a name already in the library answers 409 on the field; bad input 422 with field messages; nothing is written", async () => {
    const before = (await listLibrary(admin)).length;
    const clash = await createEntry(admin, entry(STARTER_HAZARDS[0].hazard)).catch((e) => e);
    expect(clash).toBeInstanceOf(AppError);
    expect(clash.code).toBe("conflict");
    expect(clash.issues[0].path).toBe("hazard");
    const bad = await createEntry(admin, { ...entry(""), likelihoodBefore: 9, controls: [] }).catch((e) => e);
    expect(bad.code).toBe("validation");
    expect(bad.issues.map((i: { path: string }) => i.path).sort()).toEqual(["controls", "hazard", "likelihoodBefore"]);
    expect((await listLibrary(admin)).length).toBe(before);
  });

  it("another organisation's entry is not found, and its library is its own", async () => {
    const [first] = await listLibrary(admin);
    expect(await code(getEntry(other, first.id))).toBe("not_found");
    expect(await code(updateEntry(other, first.id, entry("Taken over")))).toBe("not_found");
    expect(await code(deleteEntry(other, first.id))).toBe("not_found");
    expect(await listLibrary(other)).toEqual([]);
  });

  it("the starter set can be added again: what is there by name stays as it is", async () => {
    const [first] = await listLibrary(admin);
    await updateEntry(admin, first.id, { ...entry(first.hazard), whoIsAtRisk: "Changed by the admin" });
    await deleteEntry(admin, (await listLibrary(admin))[1].id);
    expect(await restoreStarter(admin)).toBe(1);
    expect(await restoreStarter(admin)).toBe(0);
    expect((await getEntry(admin, first.id)).input.whoIsAtRisk).toBe("Changed by the admin");
    expect(await restoreStarter(other)).toBe(STARTER_HAZARDS.length);
  });
});
