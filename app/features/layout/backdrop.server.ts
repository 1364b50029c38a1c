// The roof drawing under a site's plan: put (replacing any earlier one, with its stored file) and
// remove, each one transaction with its audit event. Its placement is saved with the layout.
import { eq } from "drizzle-orm";
import { lockSite } from "~/features/sites/sites.server";
import type { Scope } from "~/features/sites/scope.server";
import { db, schema } from "~/infra/db.server";
import { deleteFile, putFile } from "~/infra/storage.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import type { BackdropUpload } from "./backdrop-upload.server";
import { backdropJson } from "./json";

type Who = Actor & Scope;
const { siteBackdrop, site } = schema;

/** Where a new drawing first lies: 40 m across, centred on the site's origin, until it is placed. */
export function defaultPlacement(widthPx: number, heightPx: number) {
  const across = 40;
  return { p1: [0, 0] as [number, number], p2: [widthPx, 0] as [number, number], distanceM: across, originX: -across / 2, originY: (across * heightPx) / widthPx / 2, rotationDeg: 0, opacity: 0.5 };
}

export async function putBackdrop(who: Who, siteId: string, upload: BackdropUpload) {
  return db.transaction(async (tx) => {
    const current = await lockSite(tx, who, siteId);
    const [before] = await tx.select().from(siteBackdrop).where(eq(siteBackdrop.siteId, siteId));
    const file = await putFile(tx, { organizationId: who.organizationId, purpose: "backdrop", fileName: upload.fileName, mediaType: upload.mediaType, bytes: upload.bytes });
    const values = { fileId: file.id, widthPx: upload.widthPx, heightPx: upload.heightPx, ...defaultPlacement(upload.widthPx, upload.heightPx), updatedAt: new Date() };
    const [row] = before
      ? await tx.update(siteBackdrop).set(values).where(eq(siteBackdrop.siteId, siteId)).returning()
      : await tx.insert(siteBackdrop).values({ ...values, siteId, organizationId: who.organizationId }).returning();
    if (before) await deleteFile(tx, who.organizationId, before.fileId);
    await auditChange(tx, who, {
      action: before ? "backdrop.updated" : "backdrop.created",
      entity: "backdrop",
      entityId: siteId,
      siteId,
      before: before ? { fileId: before.fileId } : null,
      after: { fileName: upload.fileName, fileId: file.id, widthPx: upload.widthPx, heightPx: upload.heightPx },
    });
    await tx.update(site).set({ version: current.version + 1, updatedAt: new Date() }).where(eq(site.id, siteId));
    return { backdrop: backdropJson(row), version: current.version + 1 };
  });
}

export async function removeBackdrop(who: Who, siteId: string) {
  return db.transaction(async (tx) => {
    const current = await lockSite(tx, who, siteId);
    const [row] = await tx.delete(siteBackdrop).where(eq(siteBackdrop.siteId, siteId)).returning();
    if (!row) throw new DomainError("This site has no roof drawing.", 404);
    await deleteFile(tx, who.organizationId, row.fileId);
    await auditChange(tx, who, { action: "backdrop.deleted", entity: "backdrop", entityId: siteId, siteId, before: { fileId: row.fileId, widthPx: row.widthPx, heightPx: row.heightPx }, after: null });
    await tx.update(site).set({ version: current.version + 1, updatedAt: new Date() }).where(eq(site.id, siteId));
    return { version: current.version + 1 };
  });
}
