"use server";

import { revalidatePath } from "next/cache";
import { createComponent, updateComponent } from "@/assessments/load-register/service";
import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";

export async function saveComponentAction(componentId: string | null, values: unknown) {
  return runAction(async () => {
    const actor = await getActor();
    const row = componentId ? await updateComponent(actor, componentId, values) : await createComponent(actor, values);
    revalidatePath("/load-register");
    return { message: "Component saved.", data: { id: row.id } };
  });
}
