// A visit's readings: list, add many at once (table row, JSON or CSV; all or nothing unless the
// caller asks for the valid ones only), edit one (optimistic concurrency), delete one.
import { and, asc, eq, sql } from "drizzle-orm";
import { siteScope, type Scope } from "~/features/sites/scope.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChange, auditChanges, type Actor } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { changedFields, snapshot } from "~/lib/snapshot";
import { resolveSurface, toNewReading, type NewReading, type SurfaceRef } from "./readings-check";
import type { ReadingInput } from "./schemas";
import { inVisit } from "./visits.server";

const { reading, surface, visit, site } = schema;
type Who = Actor & Scope;
type Where = { visitId?: string; siteId?: string };

/** The site's surfaces by id and name, for resolving the surface a reading names. */
export function siteSurfaces(siteId: string, tx: Tx | typeof db = db): Promise<SurfaceRef[]> {
  return tx.select({ id: surface.id, name: surface.name }).from(surface).where(eq(surface.siteId, siteId)).orderBy(asc(surface.position), asc(surface.createdAt));
}

export type ReadingView = Awaited<ReturnType<typeof listReadings>>[number];

export async function listReadings(visitId: string) {
  const rows = await db.select({ reading, surfaceName: surface.name }).from(reading).leftJoin(surface, eq(surface.id, reading.surfaceId)).where(eq(reading.visitId, visitId)).orderBy(asc(reading.position), asc(reading.createdAt));
  return rows.map((r) => ({ ...r.reading, surfaceName: r.surfaceName }));
}

export async function findReading(scope: Scope, readingId: string, where: Where = {}) {
  const [row] = await db
    .select({ reading })
    .from(reading)
    .innerJoin(visit, eq(visit.id, reading.visitId))
    .innerJoin(site, eq(site.id, visit.siteId))
    .where(and(siteScope(scope), eq(reading.id, readingId), where.visitId ? eq(reading.visitId, where.visitId) : undefined, where.siteId ? eq(visit.siteId, where.siteId) : undefined));
  return row?.reading ?? null;
}

/** A batch refused for its rows' problems: the message, and each problem for the report. */
export class ReadingsRefused<P> extends DomainError {
  constructor(
    message: string,
    readonly problems: P[],
    readonly validCount = 0,
  ) {
    super(message, 400);
  }
}

export type ReadingsCheck<P> = { valid: NewReading[]; problems: P[] };

/**
 * Adds the readings `check` accepts, checked against the site's surfaces under the site's lock.
 * Any problem refuses the whole batch, unless `validOnly`: then the valid ones are stored and the problems returned.
 */
export async function addReadings<P>(who: Who, visitId: string, check: (surfaces: SurfaceRef[]) => ReadingsCheck<P>, options: { validOnly?: boolean; siteId?: string } = {}) {
  return inVisit(who, visitId, options.siteId, async (tx, current) => {
    const { valid, problems } = check(await siteSurfaces(current.siteId, tx));
    if (problems.length && !options.validOnly) {
      const n = problems.length;
      throw new ReadingsRefused(`${n} problem${n === 1 ? "" : "s"} in the readings; nothing was stored. Fix ${n === 1 ? "it" : "them"}, or store the valid readings only.`, problems, valid.length);
    }
    if (valid.length === 0) throw new ReadingsRefused("There is no valid reading to store.", problems);
    const [{ next }] = await tx.select({ next: sql<number>`coalesce(max(${reading.position}) + 1, 0)::int` }).from(reading).where(eq(reading.visitId, visitId));
    const rows: (typeof reading.$inferSelect)[] = [];
    for (let i = 0; i < valid.length; i += 1000) {
      const chunk = valid.slice(i, i + 1000).map((r, j) => ({ ...r, visitId, organizationId: who.organizationId, position: next + i + j }));
      rows.push(...(await tx.insert(reading).values(chunk).returning()));
    }
    await auditChanges(tx, who, rows.map((row) => ({ action: "reading.created", entity: "reading", entityId: row.id, siteId: current.siteId, before: null, after: snapshot(row) })));
    return { readings: rows, skipped: problems };
  });
}

async function requireReading(scope: Scope, readingId: string, where: Where) {
  const found = await findReading(scope, readingId, where);
  if (!found) throw new DomainError("No such reading.", 404);
  return found;
}

export async function updateReading(who: Who, readingId: string, input: ReadingInput & { version: number }, where: Where = {}) {
  const found = await requireReading(who, readingId, where);
  return inVisit(who, found.visitId, where.siteId, async (tx, current) => {
    const [row] = await tx.select().from(reading).where(eq(reading.id, readingId)).for("update");
    if (!row) throw new DomainError("No such reading.", 404);
    if (row.version !== input.version) throw staleEdit({ ...snapshot(row), version: row.version });
    const surfaceChoice = resolveSurface(input, await siteSurfaces(current.siteId, tx));
    if (!surfaceChoice.ok) throw new DomainError(surfaceChoice.message, 400, "surfaceId");
    const [updated] = await tx.update(reading).set({ ...toNewReading(input, surfaceChoice.id), version: row.version + 1 }).where(eq(reading.id, readingId)).returning();
    const diff = changedFields(snapshot(row), snapshot(updated));
    if (diff.keys.length) await auditChange(tx, who, { action: "reading.updated", entity: "reading", entityId: readingId, siteId: current.siteId, before: { label: row.label, ...diff.before }, after: { label: updated.label, ...diff.after } });
    return updated;
  });
}

export async function deleteReading(who: Who, readingId: string, where: Where = {}) {
  const found = await requireReading(who, readingId, where);
  return inVisit(who, found.visitId, where.siteId, async (tx, current) => {
    const [row] = await tx.delete(reading).where(eq(reading.id, readingId)).returning();
    if (!row) throw new DomainError("No such reading.", 404);
    await auditChange(tx, who, { action: "reading.deleted", entity: "reading", entityId: readingId, siteId: current.siteId, before: snapshot(row), after: null });
    return row;
  });
}
