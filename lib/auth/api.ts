import { authorize, type Action, type Actor } from "@/lib/permissions";
import { getActor } from "./session";

/** For route handlers: the caller, checked against the permission table before any body is read. */
export async function requireApiActor(action: Action): Promise<Actor> {
  const actor = await getActor();
  authorize(actor, action);
  return actor;
}

/** A request's query string as a plain object, for a zod query schema. */
export const queryOf = (request: Request) => Object.fromEntries(new URL(request.url).searchParams);
