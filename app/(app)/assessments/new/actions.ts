"use server";

import { createAssessment } from "@/assessments/revisions/service";
import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";

export async function createAssessmentAction(values: unknown) {
  return runAction(async () => {
    const { revisionId } = await createAssessment(await getActor(), values);
    return { data: { revisionId } };
  });
}
