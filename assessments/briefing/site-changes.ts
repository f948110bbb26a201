/** Closing a revision's open site change notes with the adviser's decision (shared by the decision and a new revision). */
import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { revisions, siteChangeNotes } from "@/db/schema";
import type { Actor } from "@/lib/permissions";

/** Records a decision on every open note of a revision and clears its "needs review"; how many were open. */
export async function closeSiteChanges(
  tx: Tx,
  actor: Actor,
  revisionId: string,
  decision: "no-change" | "new-revision",
  note: string | null,
): Promise<number> {
  const closed = await tx
    .update(siteChangeNotes)
    .set({ decision, decisionNote: note, decidedBy: actor.id, decidedAt: new Date() })
    .where(and(eq(siteChangeNotes.revisionId, revisionId), isNull(siteChangeNotes.decision)))
    .returning({ id: siteChangeNotes.id });
  await tx.update(revisions).set({ needsReview: false }).where(eq(revisions.id, revisionId));
  return closed.length;
}
