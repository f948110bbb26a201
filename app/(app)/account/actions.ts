"use server";

import { revalidatePath } from "next/cache";
import { cookies } from "next/headers";
import { after } from "next/server";
import { runAction } from "@/lib/actions";
import {
  changePassword,
  confirmSecondFactor,
  disableSecondFactor,
  renewRecoveryCodes,
  startSecondFactor,
  updateProfile,
} from "@/lib/account/service";
import { getActor, readSessionClaims } from "@/lib/auth/session";

// The account's own actions read the session cookie only (getActor): an API token never reaches them.

export async function updateProfileAction(values: unknown) {
  return runAction(async () => {
    await updateProfile(await getActor(), values);
    revalidatePath("/", "layout");
    return { message: "Saved." };
  });
}

export async function changePasswordAction(values: unknown) {
  return runAction(async () => {
    const claims = await readSessionClaims(await cookies());
    const { deliver } = await changePassword(await getActor(), claims?.sessionId, values);
    after(deliver);
    revalidatePath("/account");
    return { message: "Password changed. Every other session is signed out; this one stays." };
  });
}

export async function startSecondFactorAction() {
  return runAction(async () => ({ data: await startSecondFactor(await getActor()) }));
}

export async function confirmSecondFactorAction(values: unknown) {
  return runAction(async () => {
    // No revalidation here: the page must keep showing the recovery codes until they are saved.
    return { data: await confirmSecondFactor(await getActor(), values) };
  });
}

export async function disableSecondFactorAction(values: unknown) {
  return runAction(async () => {
    await disableSecondFactor(await getActor(), values);
    revalidatePath("/account/security");
    return { message: "The second factor is off." };
  });
}

export async function renewRecoveryCodesAction(values: unknown) {
  return runAction(async () => ({ data: await renewRecoveryCodes(await getActor(), values) }));
}
