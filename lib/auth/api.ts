import { actorForToken } from "@/lib/api-tokens/service";
import { currentRequest } from "@/lib/api";
import { config } from "@/lib/config";
import { AppError } from "@/lib/errors";
import { authorize, type Action, type Actor } from "@/lib/permissions";
import { originOf } from "./request-context";
import { getActor } from "./session";

/**
 * For route handlers: the caller — an API token (`Authorization: Bearer …`) or the signed-in
 * session — checked against the permission table before any body is read. Only route handlers
 * accept tokens: pages and server actions (the account pages among them) read the session alone.
 */
export async function requireApiActor(action: Action): Promise<Actor> {
  const request = currentRequest();
  const header = request?.headers.get("authorization") ?? "";
  const bearer = header.match(/^Bearer\s+(\S+)$/)?.[1];
  if (!bearer && /^bearer\b/i.test(header))
    throw new AppError("unauthenticated", "Send the token as: Authorization: Bearer <token>");
  const actor = bearer
    ? await actorForToken(bearer, originOf(request!.headers, config().HEFTWISE_TRUSTED_PROXIES))
    : await getActor();
  authorize(actor, action);
  return actor;
}

/** A request's query string as a plain object, for a zod query schema. */
export const queryOf = (request: Request) => Object.fromEntries(new URL(request.url).searchParams);
