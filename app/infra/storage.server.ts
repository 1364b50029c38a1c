// Where uploaded bytes live. The default (and only) store is PostgreSQL, so app servers
// hold nothing on disk and can run as many copies as needed. Callers pass a transaction
// so a file and the record that points at it are written together.
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db, schema, type Tx } from "./db.server";

export type NewFile = { organizationId: string; purpose: string; fileName: string; mediaType: string; bytes: Buffer };
export type StoredFileInfo = { id: string; fileName: string; mediaType: string; byteSize: number; sha256: string };

export async function putFile(tx: Tx, file: NewFile): Promise<StoredFileInfo> {
  const sha256 = createHash("sha256").update(file.bytes).digest("hex");
  const [row] = await tx
    .insert(schema.storedFile)
    .values({ ...file, byteSize: file.bytes.length, sha256 })
    .returning({ id: schema.storedFile.id });
  return { id: row.id, fileName: file.fileName, mediaType: file.mediaType, byteSize: file.bytes.length, sha256 };
}

/** The file's bytes, only within its organisation; null when there is no such file there. */
export async function getFile(organizationId: string, fileId: string) {
  const [row] = await db
    .select()
    .from(schema.storedFile)
    .where(and(eq(schema.storedFile.id, fileId), eq(schema.storedFile.organizationId, organizationId)));
  return row ?? null;
}

export async function deleteFile(tx: Tx, organizationId: string, fileId: string) {
  await tx.delete(schema.storedFile).where(and(eq(schema.storedFile.id, fileId), eq(schema.storedFile.organizationId, organizationId)));
}
