// A visit's photos: add (the original and its thumbnail stored in PostgreSQL), list, read one,
// change the caption (optimistic concurrency), delete (with its stored files).
import { and, asc, eq, inArray } from "drizzle-orm";
import { siteScope, type Scope } from "~/features/sites/scope.server";
import { db, schema } from "~/infra/db.server";
import { putFile } from "~/infra/storage.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { changedFields, snapshot } from "~/lib/snapshot";
import { processPhoto } from "./photo-image.server";
import type { PhotoUpload } from "./photo-upload.server";
import { captionSchema } from "./schemas";
import { inVisit } from "./visits.server";

const { photo, storedFile, visit, site } = schema;
type Who = Actor & Scope;

const photoColumns = { photo, fileName: storedFile.fileName, mediaType: storedFile.mediaType, byteSize: storedFile.byteSize };

export type PhotoView = Awaited<ReturnType<typeof listPhotos>>[number];

/** A visit's photos, oldest first, with the original file's name, type and size (not its bytes). */
export async function listPhotos(visitId: string) {
  const rows = await db.select(photoColumns).from(photo).innerJoin(storedFile, eq(storedFile.id, photo.fileId)).where(eq(photo.visitId, visitId)).orderBy(asc(photo.createdAt));
  return rows.map(({ photo: p, ...file }) => ({ ...p, ...file }));
}

/** One photo within the scope (and within the visit and site the address names), or null. */
export async function findPhoto(scope: Scope, photoId: string, where: { visitId?: string; siteId?: string } = {}) {
  const [row] = await db
    .select(photoColumns)
    .from(photo)
    .innerJoin(storedFile, eq(storedFile.id, photo.fileId))
    .innerJoin(visit, eq(visit.id, photo.visitId))
    .innerJoin(site, eq(site.id, visit.siteId))
    .where(and(siteScope(scope), eq(photo.id, photoId), where.visitId ? eq(photo.visitId, where.visitId) : undefined, where.siteId ? eq(visit.siteId, where.siteId) : undefined));
  return row ? { ...row.photo, fileName: row.fileName, mediaType: row.mediaType, byteSize: row.byteSize } : null;
}

function checkCaption(raw: unknown) {
  const parsed = captionSchema.safeParse({ caption: raw });
  if (!parsed.success) throw new DomainError(parsed.error.issues[0].message, 400, "caption");
  return parsed.data.caption;
}

/** Stores an uploaded photo: its bytes proven an image, a thumbnail made, then one transaction. */
export async function addPhoto(who: Who, visitId: string, upload: PhotoUpload, siteId?: string) {
  const caption = checkCaption(upload.caption);
  const image = await processPhoto(upload.bytes);
  return inVisit(who, visitId, siteId, async (tx, current) => {
    const original = await putFile(tx, { organizationId: who.organizationId, purpose: "photo", fileName: upload.fileName, mediaType: image.mediaType, bytes: upload.bytes });
    const thumbName = `${upload.fileName.replace(/\.[^.]*$/, "")}-thumbnail.webp`;
    const thumb = await putFile(tx, { organizationId: who.organizationId, purpose: "photo-thumbnail", fileName: thumbName, mediaType: image.thumbMediaType, bytes: image.thumb });
    const [row] = await tx
      .insert(photo)
      .values({
        organizationId: who.organizationId,
        visitId,
        fileId: original.id,
        thumbFileId: thumb.id,
        caption,
        widthPx: image.widthPx,
        heightPx: image.heightPx,
        takenAt: image.takenAt,
        latitude: image.latitude,
        longitude: image.longitude,
      })
      .returning();
    await auditChange(tx, who, { action: "photo.created", entity: "photo", entityId: row.id, siteId: current.siteId, before: null, after: { ...snapshot(row), fileName: upload.fileName } });
    return { ...row, fileName: upload.fileName, mediaType: image.mediaType, byteSize: upload.bytes.length };
  });
}

async function requirePhoto(scope: Scope, photoId: string, where: { visitId?: string; siteId?: string }) {
  const found = await findPhoto(scope, photoId, where);
  if (!found) throw new DomainError("No such photo.", 404);
  return found;
}

export async function updateCaption(who: Who, photoId: string, input: { caption: unknown; version: number }, where: { visitId?: string; siteId?: string } = {}) {
  const caption = checkCaption(input.caption);
  const found = await requirePhoto(who, photoId, where);
  return inVisit(who, found.visitId, where.siteId, async (tx, current) => {
    const [row] = await tx.select().from(photo).where(eq(photo.id, photoId)).for("update");
    if (!row) throw new DomainError("No such photo.", 404);
    if (row.version !== input.version) throw staleEdit({ caption: row.caption, version: row.version });
    const [updated] = await tx.update(photo).set({ caption, version: row.version + 1 }).where(eq(photo.id, photoId)).returning();
    const diff = changedFields(snapshot(row), snapshot(updated));
    if (diff.keys.length) await auditChange(tx, who, { action: "photo.updated", entity: "photo", entityId: photoId, siteId: current.siteId, before: { fileName: found.fileName, ...diff.before }, after: { fileName: found.fileName, ...diff.after } });
    return { ...updated, fileName: found.fileName, mediaType: found.mediaType, byteSize: found.byteSize };
  });
}

export async function deletePhoto(who: Who, photoId: string, where: { visitId?: string; siteId?: string } = {}) {
  const found = await requirePhoto(who, photoId, where);
  return inVisit(who, found.visitId, where.siteId, async (tx, current) => {
    const [row] = await tx.delete(photo).where(eq(photo.id, photoId)).returning();
    if (!row) throw new DomainError("No such photo.", 404);
    await tx.delete(storedFile).where(and(eq(storedFile.organizationId, who.organizationId), inArray(storedFile.id, [row.fileId, row.thumbFileId])));
    await auditChange(tx, who, { action: "photo.deleted", entity: "photo", entityId: photoId, siteId: current.siteId, before: { ...snapshot(row), fileName: found.fileName }, after: null });
    return row;
  });
}
