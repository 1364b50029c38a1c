// A site's layout: read it whole, and replace it whole in one transaction. Rows sent with their id
// are updated in place (so readings and, later, assessments that point at a surface keep pointing
// at it), rows without one are added, rows left out are removed; each change is an audit event
// in the same transaction. The site's version guards against saving over someone else's edit.
import { and, eq, inArray, sql } from "drizzle-orm";
import { lockSite } from "~/features/sites/sites.server";
import type { Scope } from "~/features/sites/scope.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChanges, type Actor, type RecordChange } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { changedFields, snapshot } from "~/lib/snapshot";
import { issuesByPath, validateLayout } from "./geometry";
import { accessPointJson, backdropJson, obstructionJson, surfaceJson, type AccessPointFields, type BackdropFields, type LayoutJson, type ObstructionFields, type SurfaceFields } from "./json";
import { duplicateIds, type LayoutInput } from "./schemas";

const { surface, obstruction, accessPoint, siteBackdrop, site } = schema;
type Who = Actor & Scope;

// The layout's four lists in one statement (one round trip instead of four): each list as a JSON
// array in its stored order, read back through the same record mappers as the rows were. Numbers
// survive the trip exactly (PostgreSQL 12+ prints double precision in its shortest exact form);
// none of the fields the mappers keep is a date.
// Written out with its table: inside a select list Drizzle prints a column bare ("id"), which the
// subqueries would take for their own row's id.
const siteOfRow = sql.raw('"site"."id"');
const layoutColumn = sql<string>`json_build_array(
  (select coalesce(json_agg(json_build_object('id', s.id, 'name', s.name, 'kind', s.kind, 'polygon', s.polygon, 'line', s.line,
      'elevationM', s.elevation_m, 'bottomM', s.bottom_m, 'topM', s.top_m, 'access', s.access) order by s.position, s.created_at), '[]')
    from ${surface} s where s.site_id = ${siteOfRow}),
  (select coalesce(json_agg(json_build_object('id', o.id, 'name', o.name, 'polygon', o.polygon, 'baseM', o.base_m, 'heightM', o.height_m)
      order by o.position, o.created_at), '[]')
    from ${obstruction} o where o.site_id = ${siteOfRow}),
  (select coalesce(json_agg(json_build_object('id', a.id, 'name', a.name, 'kind', a.kind, 'x', a.x, 'y', a.y, 'z', a.z, 'locked', a.locked)
      order by a.position, a.created_at), '[]')
    from ${accessPoint} a where a.site_id = ${siteOfRow}),
  (select json_build_object('fileId', b.file_id, 'widthPx', b.width_px, 'heightPx', b.height_px, 'p1', b.p1, 'p2', b.p2,
      'distanceM', b.distance_m, 'originX', b.origin_x, 'originY', b.origin_y, 'rotationDeg', b.rotation_deg, 'opacity', b.opacity)
    from ${siteBackdrop} b where b.site_id = ${siteOfRow})
)::text`;

const layoutOf = (handle: typeof db | Tx) => handle.select({ layout: layoutColumn }).from(site);
/** Prepared once: every Layout section and the layout API read it. */
const layoutBySite = layoutOf(db).where(eq(site.id, sql.placeholder("siteId"))).prepare("layout_by_site");

type LayoutLists = [SurfaceFields[], ObstructionFields[], AccessPointFields[], BackdropFields | null];

/** The layout of a site already known to be in scope, with the site's version. */
export async function readLayout(siteId: string, version: number, handle: typeof db | Tx = db): Promise<LayoutJson> {
  const [row] = handle === db ? await layoutBySite.execute({ siteId }) : await layoutOf(handle).where(eq(site.id, siteId));
  const [surfaces, obstructions, accessPoints, backdrop]: LayoutLists = row ? JSON.parse(row.layout) : [[], [], [], null];
  return {
    version,
    surfaces: surfaces.map(surfaceJson),
    obstructions: obstructions.map(obstructionJson),
    accessPoints: accessPoints.map(accessPointJson),
    backdrop: backdrop ? backdropJson(backdrop) : null,
  };
}

/** A layout refused before anything is written: 400 for a repeated id, 422 for geometry. */
export function checkLayout(input: LayoutInput) {
  const repeated = duplicateIds(input);
  if (Object.keys(repeated).length) throw new DomainError("Some records are sent twice.", 400, undefined, { fields: repeated });
  const issues = validateLayout(input);
  if (issues.length) {
    const message = issues.length === 1 ? issues[0].message : `${issues[0].message} (and ${issues.length - 1} more problem${issues.length === 2 ? "" : "s"})`;
    throw new DomainError(message, 422, undefined, { fields: issuesByPath(issues) });
  }
}

// What History keeps of a row: its fields without bookkeeping, nor its place in the list.
const recordOf = (row: Record<string, unknown>) => {
  const { position: _p, siteId: _s, ...rest } = snapshot(row);
  return rest;
};

type Table = typeof surface | typeof obstruction | typeof accessPoint;

/** Replaces one list: updates kept rows, inserts new ones, deletes the rest; returns the audit changes. */
async function replaceList(tx: Tx, who: Who, siteId: string, table: Table, entity: string, listKey: string, rows: ({ id?: string } & Record<string, unknown>)[]) {
  const existing = (await tx.select().from(table).where(eq(table.siteId, siteId))) as ({ id: string } & Record<string, unknown>)[];
  const byId = new Map(existing.map((r) => [r.id, r]));
  const unknown: Record<string, string> = {};
  rows.forEach((r, i) => {
    if (r.id && !byId.has(r.id)) unknown[`${listKey}[${i}].id`] = "No such record on this site; leave the id out to add a new one.";
  });
  if (Object.keys(unknown).length) throw new DomainError("Some ids are not this site's records.", 422, undefined, { fields: unknown });
  const changes: RecordChange[] = [];
  const kept = new Set(rows.map((r) => r.id).filter(Boolean));
  const gone = existing.filter((r) => !kept.has(r.id));
  if (gone.length) {
    await tx.delete(table).where(and(eq(table.siteId, siteId), inArray(table.id, gone.map((r) => r.id))));
    for (const r of gone) changes.push({ action: `${entity}.deleted`, entity, entityId: r.id, siteId, before: recordOf(r), after: null });
  }
  for (const [position, { id, ...fields }] of rows.entries()) {
    if (id) {
      const before = byId.get(id)!;
      const [after] = (await tx.update(table).set({ ...fields, position }).where(eq(table.id, id)).returning()) as Record<string, unknown>[];
      const diff = changedFields(recordOf(before), recordOf(after));
      if (diff.keys.length) changes.push({ action: `${entity}.updated`, entity, entityId: id, siteId, before: { name: before.name, ...diff.before }, after: { name: after.name, ...diff.after } });
    } else {
      const [added] = (await tx.insert(table).values({ ...fields, position, siteId, organizationId: who.organizationId } as never).returning()) as ({ id: string } & Record<string, unknown>)[];
      changes.push({ action: `${entity}.created`, entity, entityId: added.id, siteId, before: null, after: recordOf(added) });
    }
  }
  return changes;
}

function surfaceRow(s: LayoutInput["surfaces"][number]) {
  return s.kind === "area"
    ? { id: s.id, name: s.name, kind: s.kind, polygon: s.polygon, line: null, elevationM: s.elevationM, bottomM: null, topM: null, access: s.access, updatedAt: new Date() }
    : { id: s.id, name: s.name, kind: s.kind, polygon: null, line: s.line as [[number, number], [number, number]], elevationM: null, bottomM: s.bottomM, topM: s.topM, access: s.access, updatedAt: new Date() };
}

/**
 * Replaces the site's surfaces (and the obstructions and access points when sent; the roof
 * drawing's placement when sent and there is one) in one transaction. A `version` other than the
 * site's answers 409 with the layout as it now stands; nothing is written.
 */
export async function saveLayout(who: Who, siteId: string, input: LayoutInput): Promise<LayoutJson> {
  checkLayout(input);
  return db.transaction(async (tx) => {
    const current = await lockSite(tx, who, siteId);
    if (input.version !== undefined && input.version !== current.version) {
      throw new DomainError(
        "Someone else saved this site's layout after you opened it. Your changes were not saved; the layout as it now stands is shown, with your version kept to compare and apply again.",
        409,
        undefined,
        { current: await readLayout(siteId, current.version, tx) },
      );
    }
    const changes = [
      ...(await replaceList(tx, who, siteId, surface, "surface", "surfaces", input.surfaces.map(surfaceRow))),
      ...(input.obstructions ? await replaceList(tx, who, siteId, obstruction, "obstruction", "obstructions", input.obstructions) : []),
      ...(input.accessPoints ? await replaceList(tx, who, siteId, accessPoint, "access-point", "accessPoints", input.accessPoints) : []),
    ];
    if (input.backdrop) {
      const [before] = await tx.select().from(siteBackdrop).where(eq(siteBackdrop.siteId, siteId));
      if (!before) throw new DomainError("This site has no roof drawing to place; upload one first.", 422, "backdrop");
      const [after] = await tx.update(siteBackdrop).set({ ...input.backdrop, updatedAt: new Date() }).where(eq(siteBackdrop.siteId, siteId)).returning();
      const diff = changedFields(recordOf(before), recordOf(after));
      if (diff.keys.length) changes.push({ action: "backdrop.updated", entity: "backdrop", entityId: siteId, siteId, before: diff.before, after: diff.after });
    }
    let version = current.version;
    if (changes.length) {
      await auditChanges(tx, who, changes);
      version = current.version + 1;
      await tx.update(site).set({ version, updatedAt: new Date() }).where(eq(site.id, siteId));
    }
    return readLayout(siteId, version, tx);
  });
}
