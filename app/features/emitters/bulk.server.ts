// Many emitters at once, in one transaction with their audit rows: the API's PUT (the site's list
// replaced; rows that keep their id are updated) and the CSV import (replace or append; all
// rows, or only the valid ones when asked). Inserts and audit rows travel as one JSON parameter.
import { randomUUID } from "node:crypto";
import { and, asc, eq, getTableColumns, inArray, sql } from "drizzle-orm";
import { lockSite, touchSite } from "~/features/sites/sites.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChanges, type RecordChange } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { changedFields, snapshot } from "~/lib/snapshot";
import { valuesFromInput, type EmitterValues } from "./convert";
import { emittersFromCsvBytes, type CsvProblem } from "./csv";
import { libraryRefs, type Who } from "./emitters.server";
import { emitterJson } from "./json";
import type { EmitterInput } from "./schemas";

const { emitter, antennaPattern } = schema;

/** Phase times of an import, printed when EMITTER_IMPORT_TIMING is set (the benchmark script sets it). */
function stopwatch() {
  let t0 = performance.now();
  return (phase: string) => {
    if (process.env.EMITTER_IMPORT_TIMING) console.log(`    ${phase}: ${(performance.now() - t0).toFixed(0)} ms`);
    t0 = performance.now();
  };
}

/** A list refused for its rows' problems: each by its field path (API) or row and column (CSV). */
export class EmittersRefused extends DomainError {
  constructor(
    message: string,
    readonly fields: Record<string, string>,
    readonly problems: CsvProblem[] = [],
    readonly validCount = 0,
  ) {
    super(message, 400);
  }
}

/**
 * Inserts the emitters at the given positions in one statement (no rows come back). With `audit`,
 * the same statement writes each new row's "emitter.created" audit row from what was inserted.
 */
async function insertEmitters(tx: Tx, organizationId: string, siteId: string, positions: number[], list: EmitterValues[], audit?: Who) {
  if (list.length === 0) return [];
  const records = list.map((e, i) => ({
    id: randomUUID(), position: positions[i], label: e.label, operator: e.operator, band: e.band, frequency_mhz: e.frequencyMHz,
    power_per_carrier_w: e.powerPerCarrierW, power_unit: e.powerUnit, carriers: e.carriers, loss_db: e.lossDb, gain_dbi: e.gainDbi, gain_unit: e.gainUnit,
    pattern_id: e.patternId, pattern: e.pattern, h_beamwidth_deg: e.hBeamwidthDeg, v_beamwidth_deg: e.vBeamwidthDeg, azimuth_deg: e.azimuthDeg,
    mechanical_tilt_deg: e.mechanicalTiltDeg, electrical_tilt_deg: e.electricalTiltDeg, x: e.x, y: e.y, z: e.z, model: e.model, aperture_m: e.apertureM,
    dish_diameter_m: e.dishDiameterM, duty_factor: e.dutyFactor, actual_max_factor: e.actualMaxFactor, tdd_factor: e.tddFactor, active: e.active, notes: e.notes,
  }));
  const insert = sql`
    insert into emitter (id, organization_id, site_id, position, label, operator, band, frequency_mhz, power_per_carrier_w, power_unit, carriers, loss_db, gain_dbi, gain_unit,
      pattern_id, pattern, h_beamwidth_deg, v_beamwidth_deg, azimuth_deg, mechanical_tilt_deg, electrical_tilt_deg, x, y, z, model, aperture_m, dish_diameter_m,
      duty_factor, actual_max_factor, tdd_factor, active, notes)
    select r.id, ${organizationId}, ${siteId}, r.position, r.label, r.operator, r.band, r.frequency_mhz, r.power_per_carrier_w, r.power_unit, r.carriers, r.loss_db, r.gain_dbi, r.gain_unit,
      r.pattern_id, r.pattern, r.h_beamwidth_deg, r.v_beamwidth_deg, r.azimuth_deg, r.mechanical_tilt_deg, r.electrical_tilt_deg, r.x, r.y, r.z, r.model, r.aperture_m, r.dish_diameter_m,
      r.duty_factor, r.actual_max_factor, r.tdd_factor, r.active, r.notes
    from jsonb_to_recordset(${JSON.stringify(records)}::jsonb) as r(id text, position int, label text, operator text, band text, frequency_mhz float8, power_per_carrier_w float8,
      power_unit text, carriers int, loss_db float8, gain_dbi float8, gain_unit text, pattern_id text, pattern jsonb, h_beamwidth_deg float8, v_beamwidth_deg float8,
      azimuth_deg float8, mechanical_tilt_deg float8, electrical_tilt_deg float8, x float8, y float8, z float8, model text, aperture_m float8, dish_diameter_m float8,
      duty_factor float8, actual_max_factor float8, tdd_factor float8, active boolean, notes text)`;
  if (audit) {
    await tx.execute(sql`
      with e as (${insert} returning *)
      insert into audit_event (organization_id, actor_user_id, action, subject_type, subject_id, site_id, before, after)
      select ${audit.organizationId}, ${audit.userId}, 'emitter.created', 'emitter', e.id, e.site_id, null, ${snapshotSql} from e`);
  } else await tx.execute(insert);
  return records.map((r) => r.id);
}

/** The rows just inserted, in list order (a PUT's few hundred at most). */
async function rowsById(tx: Tx, siteId: string, ids: string[]) {
  if (ids.length === 0) return [];
  const rows = await tx.select().from(emitter).where(and(eq(emitter.siteId, siteId), inArray(emitter.id, ids)));
  const order = new Map<string, number>(ids.map((id, i) => [id, i]));
  return rows.sort((a, b) => order.get(a.id)! - order.get(b.id)!);
}

const bookkeeping = new Set(["organizationId", "createdAt", "updatedAt", "version"]);
/**
 * An emitter row as `snapshot()` writes it (camelCase keys, no bookkeeping columns), built in SQL:
 * an import's thousands of audit rows are made from the table itself, not shipped to Node and back.
 */
const snapshotSql = sql.raw(
  `jsonb_build_object(${Object.entries(getTableColumns(emitter))
    .filter(([key]) => !bookkeeping.has(key))
    .map(([key, column]) => `'${key}', e.${column.name}`)
    .join(", ")})`,
);

/** Deletes every emitter of the site and writes each one's "emitter.deleted" audit row, in one statement; returns how many went. */
async function deleteAllAudited(tx: Tx, who: Who, siteId: string) {
  const result = await tx.execute(sql`
    with e as (delete from emitter where site_id = ${siteId} returning *)
    insert into audit_event (organization_id, actor_user_id, action, subject_type, subject_id, site_id, before, after)
    select ${who.organizationId}, ${who.userId}, 'emitter.deleted', 'emitter', e.id, e.site_id, ${snapshotSql}, null from e`);
  return (result as unknown as { count: number }).count;
}

const created = (siteId: string) => (row: typeof emitter.$inferSelect): RecordChange => ({ action: "emitter.created", entity: "emitter", entityId: row.id, siteId, before: null, after: snapshot(row) });

/** Library pattern ids the organisation does not have, by list index. */
async function unknownPatterns(tx: Tx, organizationId: string, ids: (string | null)[]) {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))];
  if (wanted.length === 0) return new Set<number>();
  const have = new Set((await tx.select({ id: antennaPattern.id }).from(antennaPattern).where(and(eq(antennaPattern.organizationId, organizationId), inArray(antennaPattern.id, wanted)))).map((r) => r.id));
  return new Set(ids.flatMap((id, i) => (id && !have.has(id) ? [i] : [])));
}

/**
 * PUT /api/v1/sites/:id/emitters: the list becomes exactly `inputs`, in their order. An input with
 * an id updates that emitter (refused with 409 when it names a `version` that is no longer current);
 * emitters left out are deleted; the others are added. All or nothing.
 */
export async function replaceEmitters(who: Who, siteId: string, inputs: EmitterInput[]) {
  return db.transaction(async (tx) => {
    await lockSite(tx, who, siteId);
    const existing = await tx.select().from(emitter).where(eq(emitter.siteId, siteId)).for("update");
    const byId = new Map(existing.map((r) => [r.id, r]));
    const fields: Record<string, string> = {};
    const seen = new Set<string>();
    inputs.forEach((e, i) => {
      if (!e.id) return;
      if (!byId.has(e.id)) fields[`emitters[${i}].id`] = "No such emitter on this site; leave the id out to add one.";
      else if (seen.has(e.id)) fields[`emitters[${i}].id`] = "This id appears twice in the list.";
      seen.add(e.id);
    });
    for (const i of await unknownPatterns(tx, who.organizationId, inputs.map((e) => e.patternId))) fields[`emitters[${i}].patternId`] = "No such pattern in your organisation's library.";
    if (Object.keys(fields).length) throw new EmittersRefused("Some emitters are not valid; nothing was changed.", fields);
    for (const e of inputs) {
      const current = e.id ? byId.get(e.id) : undefined;
      if (current && e.version !== undefined && e.version !== current.version) throw staleEdit(emitterJson(current));
    }
    const changes: RecordChange[] = [];
    const kept = new Set(inputs.flatMap((e) => (e.id ? [e.id] : [])));
    const dropped = existing.filter((r) => !kept.has(r.id));
    if (dropped.length) {
      await tx.delete(emitter).where(inArray(emitter.id, dropped.map((r) => r.id)));
      changes.push(...dropped.map((row) => ({ action: "emitter.deleted", entity: "emitter", entityId: row.id, siteId, before: snapshot(row), after: null })));
    }
    const fresh: EmitterValues[] = [];
    const freshAt: number[] = [];
    for (const [i, e] of inputs.entries()) {
      const current = e.id ? byId.get(e.id) : undefined;
      if (!current) {
        fresh.push(valuesFromInput(e));
        freshAt.push(i);
        continue;
      }
      const [row] = await tx.update(emitter).set({ ...valuesFromInput(e), position: i, version: current.version + 1, updatedAt: new Date() }).where(eq(emitter.id, current.id)).returning();
      const diff = changedFields(snapshot(current), snapshot(row));
      if (diff.keys.length) changes.push({ action: "emitter.updated", entity: "emitter", entityId: row.id, siteId, before: { label: current.label, ...diff.before }, after: { label: row.label, ...diff.after } });
    }
    const inserted = await rowsById(tx, siteId, await insertEmitters(tx, who.organizationId, siteId, freshAt, fresh));
    changes.push(...inserted.map(created(siteId)));
    await auditChanges(tx, who, changes);
    await touchSite(tx, siteId);
    return tx.select().from(emitter).where(eq(emitter.siteId, siteId)).orderBy(asc(emitter.position));
  });
}

export type ImportOptions = { mode: "replace" | "append"; validOnly?: boolean; dryRun?: boolean };

/**
 * A CSV file imported into the site's list, in one transaction: `replace` deletes the current
 * emitters first, `append` adds after them. Any problem refuses the whole file unless `validOnly`.
 * `dryRun` checks it and answers what would be stored, writing nothing.
 */
export async function importEmitters(who: Who, siteId: string, bytes: Uint8Array, options: ImportOptions) {
  const t = stopwatch();
  const library = await libraryRefs(who.organizationId);
  const checked = emittersFromCsvBytes(bytes, library);
  t("check");
  const { valid, problems } = checked;
  const refuse = (message: string) => new EmittersRefused(message, {}, problems, valid.length);
  if (problems.length && !options.validOnly) {
    const n = problems.length;
    throw refuse(`${n} problem${n === 1 ? "" : "s"} in the file; nothing was stored. Fix ${n === 1 ? "it" : "them"}, or store the ${valid.length} valid row${valid.length === 1 ? "" : "s"} only.`);
  }
  if (valid.length === 0) throw refuse("There is no valid emitter in the file to store.");
  const values = valid.map((v) => valuesFromInput(v.emitter));
  if (options.dryRun) return { emitters: values, count: values.length, skipped: problems, deleted: 0, encoding: checked.encoding, stored: false as const };
  return db.transaction(async (tx) => {
    await lockSite(tx, who, siteId);
    const deleted = options.mode === "replace" ? await deleteAllAudited(tx, who, siteId) : 0;
    t("delete with audit rows");
    const [{ next }] = await tx.select({ next: sql<number>`coalesce(max(${emitter.position}) + 1, 0)::int` }).from(emitter).where(eq(emitter.siteId, siteId));
    await insertEmitters(tx, who.organizationId, siteId, values.map((_, i) => next + i), values, who);
    t("insert with audit rows");
    await touchSite(tx, siteId);
    return { count: values.length, skipped: problems, deleted, encoding: checked.encoding, stored: true as const };
  });
}
