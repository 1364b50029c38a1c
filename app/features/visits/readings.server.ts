// A visit's readings: list, add many at once (table row, JSON or CSV; all or nothing unless the
// caller asks for the valid ones only), edit one (optimistic concurrency), delete one.
import { randomUUID } from "node:crypto";
import { and, asc, eq, gte, sql } from "drizzle-orm";
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
    await insertReadings(tx, who.organizationId, visitId, next, valid);
    const rows = await tx.select().from(reading).where(and(eq(reading.visitId, visitId), gte(reading.position, next))).orderBy(asc(reading.position));
    await auditChanges(tx, who, rows.map((row) => ({ action: "reading.created", entity: "reading", entityId: row.id, siteId: current.siteId, before: null, after: snapshot(row) })));
    return { readings: rows, skipped: problems };
  });
}

/** Many readings in one statement: the rows travel as one JSON parameter (a VALUES list of thousands of parameters is many times slower). */
async function insertReadings(tx: Tx, organizationId: string, visitId: string, firstPosition: number, readings: NewReading[]) {
  const records = readings.map((r, i) => ({
    id: randomUUID(),
    surface_id: r.surfaceId,
    position: firstPosition + i,
    label: r.label,
    x: r.x,
    y: r.y,
    height_m: r.heightM,
    value: r.value,
    unit: r.unit,
    percent_standard: r.percentStandard,
    percent_tier: r.percentTier,
    frequency_mhz: r.frequencyMHz,
    power_density_wm2: r.powerDensityWm2,
    notes: r.notes,
  }));
  await tx.execute(sql`
    insert into reading (id, organization_id, visit_id, surface_id, position, label, x, y, height_m, value, unit, percent_standard, percent_tier, frequency_mhz, power_density_wm2, notes)
    select r.id, ${organizationId}, ${visitId}, r.surface_id, r.position, r.label, r.x, r.y, r.height_m, r.value, r.unit, r.percent_standard, r.percent_tier, r.frequency_mhz, r.power_density_wm2, r.notes
    from jsonb_to_recordset(${JSON.stringify(records)}::jsonb) as r(id text, surface_id text, position int, label text, x float8, y float8, height_m float8, value float8, unit text,
      percent_standard text, percent_tier text, frequency_mhz float8, power_density_wm2 float8, notes text)`);
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
