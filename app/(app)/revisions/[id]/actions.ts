"use server";

import { revalidatePath } from "next/cache";
import { decideSiteChanges } from "@/assessments/briefing/service";
import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";

export async function decideSiteChangesAction(revisionId: string, values: unknown) {
  return runAction(async () => {
    await decideSiteChanges(await getActor(), String(revisionId), values);
    revalidatePath(`/revisions/${revisionId}`);
    return { message: "Recorded: the assessment still holds. Briefings no longer warn of these notes." };
  });
}
