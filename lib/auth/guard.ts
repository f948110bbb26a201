import { forbidden, redirect } from "next/navigation";
import { can, type Action, type Actor } from "@/lib/permissions";
import { requireActor } from "./session";

/** For pages: the signed-in actor if their role allows `action`; otherwise sign-in or a 403 page. */
export async function requirePermission(action: Action): Promise<Actor> {
  const actor = await requireActor();
  if (actor.mustEnrolSecondFactor && !can(actor, action)) redirect("/account/security?required=1");
  if (!can(actor, action)) forbidden();
  return actor;
}
