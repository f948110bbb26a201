/**
 * Renders the pack of one revision from what is stored: its content, the results snapshot saved with
 * it (so an approved pack never changes when the rules do), names, signatures.
 */
import "server-only";
import { readFile } from "node:fs/promises";
import path from "node:path";
import { and, asc, eq, inArray, isNotNull } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import {
  assessments,
  briefingAttendees,
  briefings,
  components,
  jobs,
  organisations,
  revisions,
  signatures,
  users,
} from "@/db/schema";
import { appUrl } from "@/lib/config";
import { woffToTtf } from "@/lib/woff";
import { isUuid } from "@/lib/ids";
import { contentSchema } from "../method-statement/content";
import type { TaskScore } from "../method-statement/score-task";
import { buildPack } from "./document";
import { PackFont, type PackFonts } from "./fonts";
import { savePack } from "./sign";

let fonts: Promise<PackFonts> | undefined;
/** The shipped fonts, read, converted to TrueType and prepared for PDFs once per process. */
export function packFonts(): Promise<PackFonts> {
  const dir = path.join(process.cwd(), "fonts");
  fonts ??= Promise.all(
    [
      "atkinson-hyperlegible-latin-400-normal.woff",
      "atkinson-hyperlegible-latin-700-normal.woff",
      "atkinson-hyperlegible-latin-400-italic.woff",
    ].map(async (f) => PackFont.load(woffToTtf(await readFile(path.join(dir, f))))),
  ).then(([regular, bold, italic]) => ({ regular, bold, italic }));
  return fonts;
}

import { signingRecord } from "../revisions/signing-record";

export const verifyUrl = () => appUrl("/verify");

/**
 * The pack PDF of a revision; signed when the organisation's key is given (fetch it before any
 * transaction: PGlite serves one connection, so a query outside an open transaction would wait on it).
 */
export async function renderPack(
  tx: Queryable,
  revisionId: string,
  key?: { p12: Uint8Array; passphrase: string },
): Promise<Uint8Array> {
  const [row] = await tx
    .select({ revision: revisions, assessment: assessments, job: jobs, organisation: organisations })
    .from(revisions)
    .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
    .innerJoin(jobs, eq(jobs.id, assessments.jobId))
    .innerJoin(organisations, eq(organisations.id, revisions.organisationId))
    .where(eq(revisions.id, revisionId));
  const { revision, assessment, job, organisation } = row;
  const nameOf = async (id: string | null) =>
    id ? ((await tx.select({ name: users.name }).from(users).where(eq(users.id, id)))[0]?.name ?? null) : null;
  // The names of the components the tasks use (the rest of the register is not in the pack).
  const content = contentSchema.parse(revision.content);
  const componentIds = [...new Set(content.tasks.map((t) => t.componentId).filter(isUuid))];
  const register = componentIds.length
    ? await tx
        .select({ id: components.id, name: components.name })
        .from(components)
        .where(and(eq(components.organisationId, organisation.id), inArray(components.id, componentIds)))
    : [];
  const signed = await tx
    .select()
    .from(signatures)
    .where(eq(signatures.revisionId, revisionId))
    .orderBy(asc(signatures.signedAt));
  const held = await tx
    .select()
    .from(briefings)
    .where(and(eq(briefings.revisionId, revisionId), isNotNull(briefings.completedAt)))
    .orderBy(asc(briefings.startedAt));
  const attendees = held.length
    ? await tx
        .select()
        .from(briefingAttendees)
        .where(
          inArray(
            briefingAttendees.briefingId,
            held.map((b) => b.id),
          ),
        )
        .orderBy(asc(briefingAttendees.signedAt))
    : [];
  const doc = await buildPack(
    {
      organisation: organisation.name,
      logo:
        organisation.logo && organisation.logoType ? { data: organisation.logo, type: organisation.logoType } : null,
      signingRecord: await signingRecord(tx, organisation.id, revisionId),
      title: assessment.title,
      job,
      revision: {
        id: revision.id,
        number: revision.number,
        status: revision.status,
        authorName: await nameOf(revision.authorId),
        approverName: await nameOf(revision.approverId),
        submittedAt: revision.submittedAt,
        approvedAt: revision.approvedAt,
        reviewDate: revision.reviewDate,
        contentHash: revision.contentHash ?? "",
      },
      content,
      scores: (revision.results ?? []) as TaskScore[],
      componentNames: Object.fromEntries(register.map((c) => [c.id, c.name])),
      signatures: signed.map((s) => ({ name: s.signerName, role: s.signerRole, signedAt: s.signedAt, png: s.image })),
      briefings: held.map((b) => ({
        place: b.place,
        startedAt: b.startedAt,
        completedAt: b.completedAt!,
        foremanName: b.foremanName,
        foremanSignature: b.foremanSignature,
        receivedAt: b.receivedAt,
        againstSuperseded: b.againstSuperseded,
        attendees: attendees
          .filter((a) => a.briefingId === b.id)
          .map((a) => ({
            name: a.name,
            employer: a.employer,
            cardNumber: a.cardNumber,
            signedAt: a.signedAt,
            png: a.signature,
          })),
      })),
      verifyUrl: verifyUrl(),
    },
    await packFonts(),
  );
  if (!key) return savePack(doc);
  return savePack(doc, {
    p12: key.p12,
    passphrase: key.passphrase,
    signerName: organisation.name,
    location: job.location,
  });
}
