/**
 * The permission table: which role may do what. Deny by default. Every route handler and server
 * action asks `authorize(actor, action, resource)`; nothing relies on a hidden button or on proxy.ts.
 */
import type { Role } from "@/db/schema";
import type { AuthRecord } from "./audit";
import { AppError } from "./errors";

export const ACTIONS = [
  "profile:read",
  "users:manage",
  "organisation:manage",
  "api-tokens:manage",
  "audit:read",
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
  admin: [
    "users:manage",
    "organisation:manage",
    "api-tokens:manage",
    "audit:read",
    "mail-log:read",
    "hazard-library:manage",
    ...ADVISER,
  ],
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
  /** An API token's permissions: its scope's, never more than its creator's. A session has its role's. */
  permissions?: readonly Action[];
  /** How this request was authenticated, for the audit trail. */
  auth?: AuthRecord;
  /** The organisation requires a second factor for this role and none is set up: only the account pages work. */
  mustEnrolSecondFactor?: boolean;
}

/** What someone who must still set up a second factor may do: see and change their own account. */
const BEFORE_SECOND_FACTOR: readonly Action[] = ["profile:read"];

/** What this actor may do: the role's permissions, or a token's narrower set. */
export const permissionsOf = (actor: Actor): readonly Action[] =>
  actor.mustEnrolSecondFactor ? BEFORE_SECOND_FACTOR : (actor.permissions ?? PERMISSIONS[actor.role]);

export interface OwnedResource {
  organisationId: string;
}

/** May this actor do this, to this resource (when there is one)? */
export function can(actor: Actor | null, action: Action, resource?: OwnedResource | null): boolean {
  if (!actor) return false;
  if (!permissionsOf(actor).includes(action)) return false;
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
  if (!permissionsOf(actor).includes(action))
    throw new AppError(
      "forbidden",
      actor.auth?.via === "token"
        ? `This token's scope does not include the permission "${action}"`
        : actor.mustEnrolSecondFactor
          ? "Your organisation requires a second factor: set one up under Account first"
          : "Your role does not allow this",
    );
}
