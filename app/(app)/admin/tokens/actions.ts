"use server";

import { revalidatePath } from "next/cache";
import { runAction } from "@/lib/actions";
import { createApiToken, revokeApiToken } from "@/lib/api-tokens/service";
import { getActor } from "@/lib/auth/session";

export async function createTokenAction(values: unknown) {
  return runAction(async () => {
    const created = await createApiToken(await getActor(), values);
    revalidatePath("/admin/tokens");
    return { data: created };
  });
}

export async function revokeTokenAction(values: unknown) {
  return runAction(async () => {
    await revokeApiToken(await getActor(), values);
    revalidatePath("/admin/tokens");
    return { message: "Revoked: the token stops working at once." };
  });
}
