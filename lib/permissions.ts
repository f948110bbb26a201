/**
 * The permission table: which role may do what. Deny by default. Every route handler and server
 * action asks `authorize(actor, action, resource)`; nothing relies on a hidden button or on proxy.ts.
 */
import type { Role } from "@/db/schema";
import { AppError } from "./errors";

export const ACTIONS = [
  "profile:read",
  "users:manage",
  "mail-log:read",
  "jobs:read",
  "jobs:write",
  "components:read",
  "components:write",
  "assessments:read",
  "assessments:write",
  "assessments:submit",
  "reviews:read",
  "reviews:decide",
  "briefings:run",
  "site-notes:create",
  "score:use",
  "hazard-library:read",
  "hazard-library:manage",
] as const;

export type Action = (typeof ACTIONS)[number];

const ADVISER: readonly Action[] = [
  "profile:read",
  "jobs:read",
  "jobs:write",
  "components:read",
  "components:write",
  "assessments:read",
  "assessments:write",
  "assessments:submit",
  "score:use",
  "hazard-library:read",
];

export const PERMISSIONS: Record<Role, readonly Action[]> = {
  admin: ["users:manage", "mail-log:read", "hazard-library:manage", ...ADVISER],
  adviser: ADVISER,
  approver: ["profile:read", "reviews:read", "reviews:decide", "score:use"],
  foreman: ["profile:read", "briefings:run", "site-notes:create", "score:use"],
};

export interface Actor {
  id: string;
  organisationId: string;
  role: Role;
  name: string;
  email: string;
}

export interface OwnedResource {
  organisationId: string;
}

/** May this actor do this, to this resource (when there is one)? */
export function can(actor: Actor | null, action: Action, resource?: OwnedResource | null): boolean {
  if (!actor) return false;
  if (!PERMISSIONS[actor.role].includes(action)) return false;
  return resource ? resource.organisationId === actor.organisationId : true;
}

/**
 * Throws unless allowed: 401 without an actor, 404 for another organisation's record (never a
 * hint that it exists), 403 when the role lacks the action.
 */
export function authorize(
  actor: Actor | null,
  action: Action,
  resource?: OwnedResource | null,
): asserts actor is Actor {
  if (!actor) throw new AppError("unauthenticated", "Sign in to continue");
  if (resource && resource.organisationId !== actor.organisationId) throw AppError.notFound();
  if (!PERMISSIONS[actor.role].includes(action)) throw new AppError("forbidden", "Your role does not allow this");
}
