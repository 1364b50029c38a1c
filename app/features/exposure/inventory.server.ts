// A site's inventory as the exposure computation takes it: its surfaces, its emitters and the
// library patterns they use, read in one go.
import { and, asc, eq, inArray } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import type { EnginePattern } from "~/infra/db/schema/emitters";
import type { InventoryEmitter } from "./engine-inputs";
import type { SiteInventory } from "./evaluate-site";
import type { LayoutSurface } from "./requests";

export async function loadSiteInventory(organizationId: string, siteId: string): Promise<SiteInventory & { obstructions: (typeof schema.obstruction.$inferSelect)[]; accessPoints: (typeof schema.accessPoint.$inferSelect)[]; emitterRows: (typeof schema.emitter.$inferSelect)[] }> {
  const [surfaces, emitters, obstructions, accessPoints] = await Promise.all([
    db.select().from(schema.surface).where(and(eq(schema.surface.siteId, siteId), eq(schema.surface.organizationId, organizationId))).orderBy(asc(schema.surface.position), asc(schema.surface.createdAt)),
    db.select().from(schema.emitter).where(and(eq(schema.emitter.siteId, siteId), eq(schema.emitter.organizationId, organizationId))).orderBy(asc(schema.emitter.position), asc(schema.emitter.createdAt)),
    db.select().from(schema.obstruction).where(and(eq(schema.obstruction.siteId, siteId), eq(schema.obstruction.organizationId, organizationId))).orderBy(asc(schema.obstruction.position)),
    db.select().from(schema.accessPoint).where(and(eq(schema.accessPoint.siteId, siteId), eq(schema.accessPoint.organizationId, organizationId))).orderBy(asc(schema.accessPoint.position)),
  ]);
  const patternIds = [...new Set(emitters.flatMap((e) => (e.patternId ? [e.patternId] : [])))];
  const patternRows = patternIds.length
    ? await db.select({ id: schema.antennaPattern.id, pattern: schema.antennaPattern.pattern }).from(schema.antennaPattern).where(and(inArray(schema.antennaPattern.id, patternIds), eq(schema.antennaPattern.organizationId, organizationId)))
    : [];
  return {
    surfaces: surfaces.map(toLayoutSurface),
    emitters: emitters.map(toInventoryEmitter),
    patterns: new Map<string, EnginePattern>(patternRows.map((p) => [p.id, p.pattern])),
    obstructions,
    accessPoints,
    emitterRows: emitters,
  };
}

export function toLayoutSurface(s: typeof schema.surface.$inferSelect): LayoutSurface {
  return { id: s.id, name: s.name, kind: s.kind, polygon: s.polygon ?? null, line: s.line ?? null, elevationM: s.elevationM, bottomM: s.bottomM, topM: s.topM, access: s.access };
}

export function toInventoryEmitter(e: typeof schema.emitter.$inferSelect): InventoryEmitter {
  return {
    id: e.id,
    label: e.label,
    frequencyMHz: e.frequencyMHz,
    powerPerCarrierW: e.powerPerCarrierW,
    carriers: e.carriers,
    lossDb: e.lossDb,
    gainDbi: e.gainDbi,
    patternId: e.patternId,
    pattern: e.pattern,
    hBeamwidthDeg: e.hBeamwidthDeg,
    vBeamwidthDeg: e.vBeamwidthDeg,
    azimuthDeg: e.azimuthDeg,
    mechanicalTiltDeg: e.mechanicalTiltDeg,
    electricalTiltDeg: e.electricalTiltDeg,
    x: e.x,
    y: e.y,
    z: e.z,
    model: e.model,
    apertureM: e.apertureM,
    dishDiameterM: e.dishDiameterM,
    dutyFactor: e.dutyFactor,
    actualMaxFactor: e.actualMaxFactor,
    tddFactor: e.tddFactor,
    active: e.active,
  };
}
