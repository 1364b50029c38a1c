// The organisation's antenna pattern library: list (with how many emitters use each), add, delete.
// A pattern an emitter uses cannot be deleted: 409 naming the sites that use it.
import { and, asc, count, eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { snapshot } from "~/lib/snapshot";
import type { PatternInput } from "./pattern-schemas";
import { patternCuts } from "./polar";

const { antennaPattern, emitter, site } = schema;
export type PatternRow = typeof antennaPattern.$inferSelect;

export function patternJson(row: PatternRow) {
  const { organizationId: _o, ...rest } = row;
  return rest;
}

export async function listPatterns(organizationId: string) {
  const rows = await db
    .select({ pattern: antennaPattern, uses: count(emitter.id) })
    .from(antennaPattern)
    .leftJoin(emitter, eq(emitter.patternId, antennaPattern.id))
    .where(eq(antennaPattern.organizationId, organizationId))
    .groupBy(antennaPattern.id)
    .orderBy(asc(antennaPattern.name));
  return rows.map((r) => ({ ...r.pattern, uses: r.uses }));
}

export async function createPattern(who: Actor, input: PatternInput) {
  const spec = input.pattern;
  const cuts = patternCuts(spec);
  const beam = (v: number) => (Number.isFinite(v) && v > 0 ? Math.round(v * 100) / 100 : null);
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(antennaPattern)
      .values({ ...input, organizationId: who.organizationId, kind: spec.type, pattern: spec, hBeamwidthDeg: beam(cuts.hBeamwidthDeg), vBeamwidthDeg: beam(cuts.vBeamwidthDeg) })
      .returning();
    await auditChange(tx, who, { action: "pattern.created", entity: "pattern", entityId: row.id, before: null, after: { ...snapshot(row), pattern: { type: spec.type } } });
    return row;
  });
}

export async function deletePattern(who: Actor, patternId: string) {
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(antennaPattern).where(and(eq(antennaPattern.organizationId, who.organizationId), eq(antennaPattern.id, patternId))).for("update");
    if (!row) throw new DomainError("No such pattern in your library.", 404);
    const users = await tx
      .selectDistinct({ id: site.id, name: site.name })
      .from(emitter)
      .innerJoin(site, eq(site.id, emitter.siteId))
      .where(eq(emitter.patternId, patternId))
      .orderBy(asc(site.name));
    if (users.length) {
      const names = users.slice(0, 5).map((s) => s.name).join(", ") + (users.length > 5 ? ` and ${users.length - 5} more` : "");
      throw new DomainError(`“${row.name}” is in use on ${users.length === 1 ? "the site" : `${users.length} sites`} ${names}. Give those emitters another pattern first.`, 409, undefined, { sites: users });
    }
    await tx.delete(antennaPattern).where(eq(antennaPattern.id, patternId));
    await auditChange(tx, who, { action: "pattern.deleted", entity: "pattern", entityId: patternId, before: { ...snapshot(row), pattern: { type: row.kind } }, after: null });
    return row;
  });
}
