"use server";

import { runAction } from "@/lib/actions";
import { acceptInvite } from "@/lib/users/service";

// No session here by design: the one-time token in the link is the credential.
export async function acceptInviteAction(token: string, values: unknown) {
  return runAction(async () => {
    await acceptInvite(String(token), values);
  });
}
