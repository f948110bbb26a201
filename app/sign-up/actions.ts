"use server";

import { after } from "next/server";
import { runAction } from "@/lib/actions";
import { confirmEmail, signUp } from "@/lib/account/service";

// No session here by design: a new organisation has none yet; the e-mailed link proves the address.
export async function signUpAction(values: unknown) {
  return runAction(async () => {
    const { deliver } = await signUp(values);
    after(deliver);
  });
}

export async function confirmEmailAction(token: string) {
  return runAction(async () => {
    await confirmEmail(String(token));
  });
}
