/** The hazard library, read: the list advisers copy hazards from. Writes are in service.ts. */
import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { hazardLibrary } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";
import { cachedRead, readKey } from "@/lib/read-cache";
import type { Hazard } from "../method-statement/content";
import type { LibraryEntry } from "./schemas";

export const toEntry = (row: typeof hazardLibrary.$inferSelect): LibraryEntry => ({
  id: row.id,
  hazard: row.hazard,
  whoIsAtRisk: row.whoIsAtRisk,
  likelihoodBefore: row.likelihoodBefore,
  severityBefore: row.severityBefore,
  controls: row.controls as Hazard["controls"],
  likelihoodAfter: row.likelihoodAfter,
  severityAfter: row.severityAfter,
});

export async function listLibrary(actor: Actor | null): Promise<LibraryEntry[]> {
  authorize(actor, "hazard-library:read");
  return cachedRead(readKey("hazard-library", actor.organisationId), async () => {
    const db = await getDb();
    const rows = await db
      .select()
      .from(hazardLibrary)
      .where(eq(hazardLibrary.organisationId, actor.organisationId))
      .orderBy(asc(hazardLibrary.hazard));
    return rows.map(toEntry);
  });
}
