"use server";

import { revalidatePath } from "next/cache";
import { createEntry, deleteEntry, restoreStarter, updateEntry } from "@/assessments/hazard-library/service";
import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";

export async function saveEntryAction(entryId: string | null, values: unknown) {
  return runAction(async () => {
    const actor = await getActor();
    const entry = entryId ? await updateEntry(actor, entryId, values) : await createEntry(actor, values);
    revalidatePath("/hazard-library");
    return { message: "Saved to the library.", data: { id: entry.id } };
  });
}

export async function deleteEntryAction(entryId: string) {
  return runAction(async () => {
    await deleteEntry(await getActor(), entryId);
    revalidatePath("/hazard-library");
    return { message: "Removed from the library." };
  });
}

export async function restoreStarterAction() {
  return runAction(async () => {
    const added = await restoreStarter(await getActor());
    revalidatePath("/hazard-library");
    return {
      message: added
        ? `${added} starter hazard${added === 1 ? "" : "s"} added.`
        : "Every starter hazard is already in the library.",
    };
  });
}
