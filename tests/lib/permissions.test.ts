import { describe, expect, it } from "vitest";
import { ROLES } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { ACTIONS, authorize, can, PERMISSIONS, type Actor } from "@/lib/permissions";

const actor = (role: Actor["role"], organisationId = "org-a"): Actor => ({
  id: "u",
  organisationId,
  role,
  name: "N",
  email: "n@x.example",
});

describe("permission table (DESIGN.md, Roles)", () => {
  it("admin may manage users and do all an adviser may", () => {
    for (const action of PERMISSIONS.adviser) expect(can(actor("admin"), action)).toBe(true);
    expect(can(actor("admin"), "users:manage")).toBe(true);
  });
  it("an adviser may not manage users, review or brief", () => {
    expect(can(actor("adviser"), "users:manage")).toBe(false);
    expect(can(actor("adviser"), "reviews:decide")).toBe(false);
    expect(can(actor("adviser"), "briefings:run")).toBe(false);
  });
  it("an approver never edits content", () => {
    for (const action of ["assessments:write", "jobs:write", "components:write"] as const)
      expect(can(actor("approver"), action)).toBe(false);
    expect(can(actor("approver"), "reviews:decide")).toBe(true);
  });
  it("a foreman briefs and records site changes, and edits nothing", () => {
    expect(can(actor("foreman"), "briefings:run")).toBe(true);
    expect(can(actor("foreman"), "site-notes:create")).toBe(true);
    expect(can(actor("foreman"), "assessments:write")).toBe(false);
  });
  it("denies by default: no actor may do nothing", () => {
    for (const action of ACTIONS) expect(can(null, action)).toBe(false);
  });
  it("every role's actions are known actions", () => {
    for (const role of ROLES) for (const action of PERMISSIONS[role]) expect(ACTIONS).toContain(action);
  });
  it("another organisation's record: can() is false and authorize() answers 404, not 403", () => {
    expect(can(actor("admin"), "jobs:read", { organisationId: "org-b" })).toBe(false);
    const err = (() => {
      try {
        authorize(actor("admin"), "jobs:read", { organisationId: "org-b" });
      } catch (e) {
        return e as AppError;
      }
    })();
    expect(err?.status).toBe(404);
  });
  it("authorize() answers 401 without an actor and 403 for a role without the action", () => {
    expect(() => authorize(null, "jobs:read")).toThrow(expect.objectContaining({ code: "unauthenticated" }));
    expect(() => authorize(actor("foreman"), "jobs:write")).toThrow(expect.objectContaining({ code: "forbidden" }));
  });
});
