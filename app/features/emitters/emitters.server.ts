// A site's emitters: list, add, edit one (optimistic concurrency: the row's version), delete one.
// Each command is one transaction under the site's lock, with its audit row.
import { and, asc, eq, sql } from "drizzle-orm";
import { lockSite, touchSite } from "~/features/sites/sites.server";
import type { Scope } from "~/features/sites/scope.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { changedFields, snapshot } from "~/lib/snapshot";
import type { EmitterValues } from "./convert";
import { emitterJson } from "./json";

const { emitter, antennaPattern } = schema;
export type Who = Actor & Scope;
export type EmitterRow = typeof emitter.$inferSelect;

const emittersQuery = (handle: Tx | typeof db, siteId: string | ReturnType<typeof sql.placeholder>) =>
  handle.select().from(emitter).where(eq(emitter.siteId, siteId)).orderBy(asc(emitter.position), asc(emitter.createdAt));
const libraryQuery = (handle: Tx | typeof db, organizationId: string | ReturnType<typeof sql.placeholder>) =>
  handle
    .select({ id: antennaPattern.id, name: antennaPattern.name, kind: antennaPattern.kind, hBeamwidthDeg: antennaPattern.hBeamwidthDeg, vBeamwidthDeg: antennaPattern.vBeamwidthDeg })
    .from(antennaPattern)
    .where(eq(antennaPattern.organizationId, organizationId))
    .orderBy(asc(antennaPattern.name));
/** Prepared once for the pages' reads; a transaction builds its own. */
const emittersOfSite = emittersQuery(db, sql.placeholder("siteId")).prepare("emitters_of_site");
const libraryOfOrganization = libraryQuery(db, sql.placeholder("organizationId")).prepare("library_refs");

export function listEmitters(siteId: string, tx: Tx | typeof db = db) {
  return tx === db ? emittersOfSite.execute({ siteId }) : emittersQuery(tx, siteId);
}

/** The organisation's pattern library by id and name (for choosing and for the CSV's `pattern` column). */
export function libraryRefs(organizationId: string, tx: Tx | typeof db = db) {
  return tx === db ? libraryOfOrganization.execute({ organizationId }) : libraryQuery(tx, organizationId);
}

/** Refuses a pattern id that is not in this organisation's library. */
export async function checkPattern(tx: Tx, organizationId: string, patternId: string | null, field = "patternChoice") {
  if (!patternId) return;
  const [found] = await tx.select({ id: antennaPattern.id }).from(antennaPattern).where(and(eq(antennaPattern.organizationId, organizationId), eq(antennaPattern.id, patternId)));
  if (!found) throw new DomainError("No such pattern in your organisation's library.", 400, field);
}

/** The row as History and a 409 show it. */
export const emitterRecord = (row: EmitterRow) => ({ ...snapshot(row), version: row.version });

export async function createEmitter(who: Who, siteId: string, values: EmitterValues) {
  return db.transaction(async (tx) => {
    await lockSite(tx, who, siteId);
    await checkPattern(tx, who.organizationId, values.patternId);
    const [{ next }] = await tx.select({ next: sql<number>`coalesce(max(${emitter.position}) + 1, 0)::int` }).from(emitter).where(eq(emitter.siteId, siteId));
    const [row] = await tx.insert(emitter).values({ ...values, siteId, organizationId: who.organizationId, position: next }).returning();
    await auditChange(tx, who, { action: "emitter.created", entity: "emitter", entityId: row.id, siteId, before: null, after: snapshot(row) });
    await touchSite(tx, siteId);
    return row;
  });
}

/** Saves an edit made on the row's `version`; a row saved by someone since answers 409 with its current values. */
export async function updateEmitter(who: Who, siteId: string, emitterId: string, values: EmitterValues, version: number) {
  return db.transaction(async (tx) => {
    await lockSite(tx, who, siteId);
    const [current] = await tx.select().from(emitter).where(and(eq(emitter.id, emitterId), eq(emitter.siteId, siteId))).for("update");
    if (!current) throw new DomainError("No such emitter on this site. Someone may have deleted it.", 404);
    if (current.version !== version) throw staleEdit({ ...emitterJson(current), patternChoice: null });
    await checkPattern(tx, who.organizationId, values.patternId);
    const [row] = await tx.update(emitter).set({ ...values, version: current.version + 1, updatedAt: new Date() }).where(eq(emitter.id, emitterId)).returning();
    const diff = changedFields(snapshot(current), snapshot(row));
    if (diff.keys.length) await auditChange(tx, who, { action: "emitter.updated", entity: "emitter", entityId: emitterId, siteId, before: { label: current.label, ...diff.before }, after: { label: row.label, ...diff.after } });
    await touchSite(tx, siteId);
    return row;
  });
}

export async function deleteEmitter(who: Who, siteId: string, emitterId: string) {
  return db.transaction(async (tx) => {
    await lockSite(tx, who, siteId);
    const [row] = await tx.delete(emitter).where(and(eq(emitter.id, emitterId), eq(emitter.siteId, siteId))).returning();
    if (!row) throw new DomainError("No such emitter on this site. Someone may have deleted it already.", 404);
    await auditChange(tx, who, { action: "emitter.deleted", entity: "emitter", entityId: emitterId, siteId, before: snapshot(row), after: null });
    await touchSite(tx, siteId);
    return row;
  });
}
