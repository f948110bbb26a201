/**
 * The load register: components with their masses and where the masses came from, a CSV import
 * that is all-or-nothing, and attachments (data sheets, photographs) checked by their content.
 */
import "server-only";
import { and, asc, eq, ilike } from "drizzle-orm";
import Papa from "papaparse";
import { getDb } from "@/db/client";
import { componentAttachments, components } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, isUniqueViolation, parseOrThrow, type FieldIssue } from "@/lib/errors";
import { escapeLike } from "@/lib/sql";
import { formulaNote, parseCsvNumber } from "./csv-cells";
import { authorize, type Actor } from "@/lib/permissions";
import { deleteFile, getFile, putFile } from "@/lib/storage";
import { componentSchema, CSV_COLUMNS, MAX_IMPORT_ROWS } from "./schemas";
import { isUuid } from "@/lib/ids";
import { requireFileType } from "@/lib/files";

export async function getComponent(actor: Actor | null, componentId: string) {
  authorize(actor, "components:read");
  const db = await getDb();
  const component = isUuid(componentId)
    ? await db.query.components.findFirst({ where: eq(components.id, componentId) })
    : undefined;
  if (!component || component.organisationId !== actor.organisationId) throw AppError.notFound("Component");
  const attachments = await db
    .select({
      id: componentAttachments.id,
      filename: componentAttachments.filename,
      contentType: componentAttachments.contentType,
      size: componentAttachments.size,
      createdAt: componentAttachments.createdAt,
    })
    .from(componentAttachments)
    .where(eq(componentAttachments.componentId, component.id))
    .orderBy(asc(componentAttachments.createdAt));
  return { ...component, attachments };
}

const nameTaken = () =>
  new AppError("conflict", "A component with this name is already in the register", [
    { path: "name", message: "A component with this name is already in the register" },
  ]);

/** The register's unique index decides (parallel creates cannot both pass); this check only answers early. */
async function assertNameFree(organisationId: string, name: string, exceptId?: string) {
  const db = await getDb();
  const existing = await db
    .select({ id: components.id })
    .from(components)
    .where(and(eq(components.organisationId, organisationId), ilike(components.name, escapeLike(name))));
  if (existing.some((e) => e.id !== exceptId)) throw nameTaken();
}

/** Runs a write that may take a name another write took first: 409 on the name field, never a 500. */
async function guardName<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (err) {
    if (isUniqueViolation(err)) throw nameTaken();
    throw err;
  }
}

export async function createComponent(actor: Actor | null, input: unknown) {
  authorize(actor, "components:write");
  const data = parseOrThrow(componentSchema, input);
  await assertNameFree(actor.organisationId, data.name);
  const db = await getDb();
  return guardName(() =>
    db.transaction(async (tx) => {
      const [row] = await tx
        .insert(components)
        .values({ ...data, organisationId: actor.organisationId })
        .returning();
      await recordAudit(tx, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: "component.created",
        entityType: "component",
        entityId: row.id,
      });
      return row;
    }),
  );
}

export async function updateComponent(actor: Actor | null, componentId: string, input: unknown) {
  authorize(actor, "components:write");
  await getComponent(actor, componentId);
  const data = parseOrThrow(componentSchema, input);
  await assertNameFree(actor.organisationId, data.name, componentId);
  const db = await getDb();
  return guardName(() =>
    db.transaction(async (tx) => {
      const [row] = await tx
        .update(components)
        .set({ ...data, updatedAt: new Date() })
        .where(eq(components.id, componentId))
        .returning();
      await recordAudit(tx, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: "component.updated",
        entityType: "component",
        entityId: row.id,
      });
      return row;
    }),
  );
}

export interface ImportRow {
  line: number;
  values: Record<string, string>;
  errors: FieldIssue[];
  /** Stored as they are, but worth a look: text a spreadsheet would run as a formula. */
  notes: FieldIssue[];
}

const NUMBER_COLUMNS = {
  mass_kg: "massKg",
  length_mm: "lengthMm",
  width_mm: "widthMm",
  height_mm: "heightMm",
} as const;

/** A CSV row as the component schema's input, and the cells that could not be read as numbers. */
function rowCandidate(values: Record<string, string>) {
  const cellErrors: FieldIssue[] = [];
  const numbers: Record<string, number | null> = {};
  for (const [column, field] of Object.entries(NUMBER_COLUMNS)) {
    const cell = parseCsvNumber(values[column]);
    if ("error" in cell) {
      cellErrors.push({ path: field, message: cell.error });
      numbers[field] = field === "massKg" ? Number.NaN : null;
    } else numbers[field] = field === "massKg" ? (cell.value ?? Number.NaN) : cell.value;
  }
  const candidate = {
    name: values.name ?? "",
    massKg: numbers.massKg,
    lengthMm: numbers.lengthMm,
    widthMm: numbers.widthMm,
    heightMm: numbers.heightMm,
    grip: (values.grip ?? "").trim().toLowerCase(),
    massSource: (values.mass_source ?? "").trim().toLowerCase(),
    notes: values.notes ?? "",
  };
  return { candidate, cellErrors };
}

/** Parses and checks a CSV without writing anything: every row with its errors. */
export async function previewImport(
  actor: Actor | null,
  csv: string,
): Promise<{ rows: ImportRow[]; problems: string[] }> {
  authorize(actor, "components:write");
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const problems: string[] = [];
  const headers = parsed.meta.fields ?? [];
  const missing = CSV_COLUMNS.filter(
    (c) => ["name", "mass_kg", "grip", "mass_source"].includes(c) && !headers.includes(c),
  );
  if (missing.length)
    problems.push(
      `Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}. Download the template to see the expected columns.`,
    );
  const unknown = headers.filter((h) => !(CSV_COLUMNS as readonly string[]).includes(h));
  if (unknown.length) problems.push(`Unknown column${unknown.length > 1 ? "s" : ""}: ${unknown.join(", ")}.`);
  if (parsed.data.length === 0) problems.push("The file has no rows to import.");
  if (parsed.data.length > MAX_IMPORT_ROWS) problems.push(`At most ${MAX_IMPORT_ROWS} rows in one import.`);
  for (const e of parsed.errors.slice(0, 5)) problems.push(`Line ${(e.row ?? 0) + 2}: ${e.message}`);

  const db = await getDb();
  const existing = new Set(
    (
      await db
        .select({ name: components.name })
        .from(components)
        .where(eq(components.organisationId, actor.organisationId))
    ).map((c) => c.name.toLowerCase()),
  );
  const seen = new Set<string>();
  const rows = parsed.data.slice(0, MAX_IMPORT_ROWS).map((values, i): ImportRow => {
    const { candidate, cellErrors } = rowCandidate(values);
    const result = componentSchema.safeParse(candidate);
    // A cell that is not a number says why once, not again as the schema's "enter the mass".
    const errors: FieldIssue[] = [
      ...cellErrors,
      ...(result.success
        ? []
        : result.error.issues
            .map((issue) => ({ path: String(issue.path[0] ?? ""), message: issue.message }))
            .filter((e) => !cellErrors.some((c) => c.path === e.path))),
    ];
    const notes: FieldIssue[] = [];
    for (const column of ["name", "notes"] as const) {
      const note = formulaNote(values[column]);
      if (note) notes.push({ path: column, message: note });
    }
    const key = candidate.name.trim().toLowerCase();
    if (key && existing.has(key)) errors.push({ path: "name", message: "Already in the register" });
    else if (key && seen.has(key)) errors.push({ path: "name", message: "Appears twice in this file" });
    seen.add(key);
    return { line: i + 2, values, errors, notes };
  });
  return { rows, problems };
}

/** Imports every row or none: any error answers 422 with the rows' errors and writes nothing. */
export async function importComponents(actor: Actor | null, csv: string): Promise<{ imported: number }> {
  const { rows, problems } = await previewImport(actor, csv);
  const rowIssues = rows.flatMap((r) =>
    r.errors.map((e) => ({ path: `line ${r.line}.${e.path}`, message: e.message })),
  );
  if (problems.length || rowIssues.length)
    throw new AppError("validation", "Nothing was imported: fix the file and try again", [
      ...problems.map((p) => ({ path: "file", message: p })),
      ...rowIssues,
    ]);
  const db = await getDb();
  const values = rows.map((r) => ({
    ...componentSchema.parse(rowCandidate(r.values).candidate),
    organisationId: actor!.organisationId,
  }));
  await guardName(() =>
    db.transaction(async (tx) => {
      const inserted = await tx.insert(components).values(values).returning({ id: components.id });
      await recordAudit(tx, {
        organisationId: actor!.organisationId,
        actorId: actor!.id,
        action: "component.imported",
        entityType: "component",
        entityId: null,
        details: { count: inserted.length },
      });
    }),
  );
  return { imported: values.length };
}

export const ATTACHMENT_TYPES: Record<string, string> = {
  "application/pdf": "PDF",
  "image/jpeg": "JPEG photograph",
  "image/png": "PNG image",
  "image/webp": "WebP image",
};
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;

/** Attaches a data sheet or photograph; its type is read from the content, never from the name. */
export async function addAttachment(
  actor: Actor | null,
  componentId: string,
  file: { name: string; data: Uint8Array },
) {
  authorize(actor, "components:write");
  await getComponent(actor, componentId);
  if (file.data.byteLength === 0)
    throw new AppError("validation", "The file is empty", [{ path: "file", message: "The file is empty" }]);
  if (file.data.byteLength > MAX_ATTACHMENT_BYTES)
    throw new AppError("payload_too_large", `Files can be at most ${MAX_ATTACHMENT_BYTES / 1024 / 1024} MB`);
  const detected = await requireFileType(
    file.data,
    Object.keys(ATTACHMENT_TYPES),
    "Attach a PDF data sheet or a photograph (JPEG, PNG or WebP)",
  );
  const filename = file.name.replace(/[\\/\u0000-\u001f]/g, "_").slice(0, 200) || `attachment.${detected.ext}`;
  const db = await getDb();
  return db.transaction(async (tx) => {
    const stored = await putFile(tx, actor.organisationId, file.data, detected.mime);
    const [row] = await tx
      .insert(componentAttachments)
      .values({
        organisationId: actor.organisationId,
        componentId,
        fileId: stored.id,
        filename,
        contentType: detected.mime,
        size: stored.size,
        uploadedBy: actor.id,
      })
      .returning();
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "component.attachment-added",
      entityType: "component",
      entityId: componentId,
      details: { filename, sha256: stored.sha256 },
    });
    return row;
  });
}

async function attachmentOf(actor: Actor, attachmentId: string) {
  const db = await getDb();
  const row = isUuid(attachmentId)
    ? await db.query.componentAttachments.findFirst({ where: eq(componentAttachments.id, attachmentId) })
    : undefined;
  if (!row || row.organisationId !== actor.organisationId) throw AppError.notFound("Attachment");
  return row;
}

export async function readAttachment(actor: Actor | null, attachmentId: string) {
  authorize(actor, "components:read");
  const row = await attachmentOf(actor, attachmentId);
  const file = await getFile(actor.organisationId, row.fileId);
  if (!file) throw AppError.notFound("Attachment");
  return { filename: row.filename, contentType: row.contentType, data: file.data };
}

export async function removeAttachment(actor: Actor | null, attachmentId: string) {
  authorize(actor, "components:write");
  const row = await attachmentOf(actor, attachmentId);
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.delete(componentAttachments).where(eq(componentAttachments.id, row.id));
    await deleteFile(tx, actor.organisationId, row.fileId);
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "component.attachment-removed",
      entityType: "component",
      entityId: row.componentId,
      details: { filename: row.filename },
    });
  });
}
