"use server";

import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";
import { closeAllSessions } from "@/lib/auth/sessions";
import { AppError } from "@/lib/errors";

/** Ends every session of the signed-in user, on every device; the caller then signs this one out. */
export async function signOutEverywhereAction() {
  return runAction(async () => {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Sign in to continue");
    await closeAllSessions(actor.id);
    return { message: "Signed out on every device." };
  });
}
