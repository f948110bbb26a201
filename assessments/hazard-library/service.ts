/**
 * The organisation's hazard library: advisers read it to copy hazards into an assessment; admins
 * add, change and remove entries, and can add the starter set at any time (entries already there by
 * name are left alone). Another organisation's entry is "not found".
 */
import "server-only";
import { and, eq } from "drizzle-orm";
import { z } from "zod";
import { getDb, type Queryable } from "@/db/client";
import { hazardLibrary } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, isUniqueViolation, parseOrThrow } from "@/lib/errors";
import { authorize, type Actor } from "@/lib/permissions";
import type { Hazard } from "../method-statement/content";
import { libraryEntrySchema, type LibraryEntry, type LibraryEntryInput } from "./schemas";
import { STARTER_HAZARDS } from "./starter";
import { toEntry } from "./queries";

/** Adds the starter hazards an organisation does not have yet (by name); returns how many were added. */
export async function addStarterHazards(tx: Queryable, organisationId: string): Promise<number> {
  const added = await tx
    .insert(hazardLibrary)
    .values(STARTER_HAZARDS.map((h) => ({ ...h, organisationId })))
    .onConflictDoNothing({ target: [hazardLibrary.organisationId, hazardLibrary.hazard] })
    .returning({ id: hazardLibrary.id });
  return added.length;
}

const entryId = z.uuid();

async function ownEntry(actor: Actor, id: string) {
  if (!entryId.safeParse(id).success) throw AppError.notFound("Hazard");
  const db = await getDb();
  const [row] = await db.select().from(hazardLibrary).where(eq(hazardLibrary.id, id));
  if (!row || row.organisationId !== actor.organisationId) throw AppError.notFound("Hazard");
  return row;
}

/** One entry of the actor's organisation, as the admin form edits it. */
export async function getEntry(actor: Actor | null, id: string): Promise<{ id: string; input: LibraryEntryInput }> {
  authorize(actor, "hazard-library:manage");
  const row = await ownEntry(actor, id);
  const { hazard, whoIsAtRisk, likelihoodBefore, severityBefore, likelihoodAfter, severityAfter } = row;
  const input = {
    hazard,
    whoIsAtRisk,
    likelihoodBefore,
    severityBefore,
    controls: row.controls as Hazard["controls"],
    likelihoodAfter,
    severityAfter,
  };
  return { id, input };
}

const duplicate = () =>
  new AppError("conflict", "The library already has a hazard of that name", [
    { path: "hazard", message: "Already in the library: change the name, or edit that entry" },
  ]);

export async function createEntry(actor: Actor | null, input: unknown): Promise<LibraryEntry> {
  authorize(actor, "hazard-library:manage");
  const data = parseOrThrow(libraryEntrySchema, input);
  const db = await getDb();
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx
        .insert(hazardLibrary)
        .values({ ...data, organisationId: actor.organisationId })
        .returning();
      await recordAudit(tx, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: "hazard-library.added",
        entityType: "hazard",
        entityId: row.id,
      });
      return toEntry(row);
    });
  } catch (e) {
    if (isUniqueViolation(e)) throw duplicate();
    throw e;
  }
}

export async function updateEntry(actor: Actor | null, id: string, input: unknown): Promise<LibraryEntry> {
  authorize(actor, "hazard-library:manage");
  await ownEntry(actor, id);
  const data = parseOrThrow(libraryEntrySchema, input);
  const db = await getDb();
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx
        .update(hazardLibrary)
        .set({ ...data, updatedAt: new Date() })
        .where(and(eq(hazardLibrary.id, id), eq(hazardLibrary.organisationId, actor.organisationId)))
        .returning();
      await recordAudit(tx, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: "hazard-library.changed",
        entityType: "hazard",
        entityId: id,
      });
      return toEntry(row);
    });
  } catch (e) {
    if (isUniqueViolation(e)) throw duplicate();
    throw e;
  }
}

export async function deleteEntry(actor: Actor | null, id: string): Promise<void> {
  authorize(actor, "hazard-library:manage");
  await ownEntry(actor, id);
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx
      .delete(hazardLibrary)
      .where(and(eq(hazardLibrary.id, id), eq(hazardLibrary.organisationId, actor.organisationId)));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "hazard-library.removed",
      entityType: "hazard",
      entityId: id,
    });
  });
}

/** The starter set, for an admin; entries already in the library by name are kept as they are. */
export async function restoreStarter(actor: Actor | null): Promise<number> {
  authorize(actor, "hazard-library:manage");
  const db = await getDb();
  return db.transaction(async (tx) => {
    const added = await addStarterHazards(tx, actor.organisationId);
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "hazard-library.starter-added",
      entityType: "organisation",
      entityId: actor.organisationId,
      details: { added },
    });
    return added;
  });
}
