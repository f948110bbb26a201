"use server";

import { after } from "next/server";
import { runAction } from "@/lib/actions";
import { requestPasswordReset, resetPassword } from "@/lib/account/service";

// No session here by design: the person cannot sign in. The e-mail goes after the answer, which is
// the same whether or not the address has an account.
export async function requestPasswordResetAction(values: unknown) {
  return runAction(async () => {
    const { deliver } = await requestPasswordReset(values);
    after(deliver);
  });
}

export async function resetPasswordAction(token: string, values: unknown) {
  return runAction(async () => {
    await resetPassword(String(token), values);
  });
}
