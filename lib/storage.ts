/**
 * Where uploaded files are kept. The database is the default store (one table, `stored_files`), so
 * a backup of the database is a backup of everything; another store can implement the same three
 * functions.
 */
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { storedFiles } from "@/db/schema";

export interface StoredFile {
  id: string;
  contentType: string;
  size: number;
  sha256: string;
}

export async function putFile(
  tx: Tx,
  organisationId: string,
  data: Uint8Array,
  contentType: string,
): Promise<StoredFile> {
  const sha256 = createHash("sha256").update(data).digest("hex");
  const [row] = await tx
    .insert(storedFiles)
    .values({ organisationId, contentType, size: data.byteLength, sha256, data })
    .returning({
      id: storedFiles.id,
      contentType: storedFiles.contentType,
      size: storedFiles.size,
      sha256: storedFiles.sha256,
    });
  return row;
}

export async function getFile(
  organisationId: string,
  fileId: string,
): Promise<(StoredFile & { data: Uint8Array }) | null> {
  const db = await getDb();
  const [row] = await db
    .select()
    .from(storedFiles)
    .where(and(eq(storedFiles.id, fileId), eq(storedFiles.organisationId, organisationId)));
  return row ? { id: row.id, contentType: row.contentType, size: row.size, sha256: row.sha256, data: row.data } : null;
}

export async function deleteFile(tx: Tx, organisationId: string, fileId: string): Promise<void> {
  await tx.delete(storedFiles).where(and(eq(storedFiles.id, fileId), eq(storedFiles.organisationId, organisationId)));
}
