// Visits: list a site's, read one, create, update (optimistic concurrency), delete. Each write
// is one transaction: the site locked, the change, its audit row, the site touched.
import { and, count, desc, eq, inArray, sql } from "drizzle-orm";
import { lockSite, touchSite } from "~/features/sites/sites.server";
import { siteScope, type Scope } from "~/features/sites/scope.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { changedFields, snapshot } from "~/lib/snapshot";
import type { VisitInput } from "./schemas";

const { visit, site, photo, reading } = schema;
export type VisitRow = typeof visit.$inferSelect;
type Who = Actor & Scope;

// Qualified by hand: in a one-table select Drizzle writes bare column names, which inside the
// subquery would name the photo's (or reading's) own columns.
const photoCount = sql<number>`(select count(*)::int from "photo" p where p."visit_id" = "visit"."id")`;
const readingCount = sql<number>`(select count(*)::int from "reading" r where r."visit_id" = "visit"."id")`;

/** A site's visits, newest first, with how many photos and readings each holds. The caller has checked the site is in scope. */
export function listVisits(siteId: string) {
  return db
    .select({ visit, photoCount, readingCount })
    .from(visit)
    .where(eq(visit.siteId, siteId))
    .orderBy(desc(visit.visitedOn), desc(visit.createdAt))
    .limit(1000);
}

/** One visit within the scope (and within the site, when the address names one), or null. */
export async function findVisit(scope: Scope, visitId: string, siteId?: string) {
  const [row] = await db
    .select({ visit, siteName: site.name })
    .from(visit)
    .innerJoin(site, eq(site.id, visit.siteId))
    .where(and(siteScope(scope), eq(visit.id, visitId), siteId ? eq(visit.siteId, siteId) : undefined));
  return row ? { ...row.visit, siteName: row.siteName } : null;
}

export async function requireVisit(scope: Scope, visitId: string, siteId?: string) {
  const found = await findVisit(scope, visitId, siteId);
  if (!found) throw new DomainError("No such visit.", 404);
  return found;
}

/**
 * Runs a change to a visit (or its photos and readings) in one transaction: the visit's site
 * locked, the visit re-read under the lock, the change, then the site marked as changed.
 */
export async function inVisit<T>(who: Who, visitId: string, siteId: string | undefined, change: (tx: Tx, current: VisitRow) => Promise<T>) {
  const found = await requireVisit(who, visitId, siteId);
  return db.transaction(async (tx) => {
    await lockSite(tx, who, found.siteId);
    const [current] = await tx.select().from(visit).where(eq(visit.id, visitId));
    if (!current) throw new DomainError("No such visit.", 404);
    const result = await change(tx, current);
    await touchSite(tx, current.siteId);
    return result;
  });
}

export async function createVisit(who: Who, siteId: string, input: VisitInput) {
  return db.transaction(async (tx) => {
    await lockSite(tx, who, siteId);
    const [row] = await tx.insert(visit).values({ ...input, siteId, organizationId: who.organizationId }).returning();
    await auditChange(tx, who, { action: "visit.created", entity: "visit", entityId: row.id, siteId, before: null, after: snapshot(row) });
    await touchSite(tx, siteId);
    return row;
  });
}

export async function updateVisit(who: Who, visitId: string, siteId: string | undefined, input: VisitInput & { version: number }) {
  return inVisit(who, visitId, siteId, async (tx, current) => {
    if (current.version !== input.version) throw staleEdit({ ...snapshot(current), version: current.version });
    const { version: _v, ...fields } = input;
    const [row] = await tx
      .update(visit)
      .set({ ...fields, version: current.version + 1, updatedAt: new Date() })
      .where(eq(visit.id, visitId))
      .returning();
    const diff = changedFields(snapshot(current), snapshot(row));
    if (diff.keys.length) await auditChange(tx, who, { action: "visit.updated", entity: "visit", entityId: visitId, siteId: row.siteId, before: { visitedOn: current.visitedOn, ...diff.before }, after: { visitedOn: row.visitedOn, ...diff.after } });
    return row;
  });
}

/** Deletes the visit with its photos (and their stored files) and readings; one event records what went. */
export async function deleteVisit(who: Who, visitId: string, siteId?: string) {
  return inVisit(who, visitId, siteId, async (tx, current) => {
    const photos = await tx.select({ fileId: photo.fileId, thumbFileId: photo.thumbFileId }).from(photo).where(eq(photo.visitId, visitId));
    const [{ n: readings }] = await tx.select({ n: count() }).from(reading).where(eq(reading.visitId, visitId));
    await tx.delete(visit).where(eq(visit.id, visitId));
    const fileIds = photos.flatMap((p) => [p.fileId, p.thumbFileId]);
    if (fileIds.length) await tx.delete(schema.storedFile).where(and(eq(schema.storedFile.organizationId, who.organizationId), inArray(schema.storedFile.id, fileIds)));
    await auditChange(tx, who, {
      action: "visit.deleted",
      entity: "visit",
      entityId: visitId,
      siteId: current.siteId,
      before: { ...snapshot(current), photoCount: photos.length, readingCount: readings },
      after: null,
    });
    return current;
  });
}
