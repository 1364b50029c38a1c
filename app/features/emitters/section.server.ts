// What the Emitters section shows: the rows with EIRP/ERP, the library to choose from, and the
// plan's layout (surfaces, obstructions, access points) for the emitter layer.
import { asc, eq, sql } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import type { EmitterValues } from "./convert";
import { libraryRefs, listEmitters } from "./emitters.server";
import { emitterEirp } from "./json";

const siteIdParam = sql.placeholder("siteId");
/** Prepared once: the section is the portal's busiest site page. */
const surfacesOfSite = db.select().from(schema.surface).where(eq(schema.surface.siteId, siteIdParam)).orderBy(asc(schema.surface.position)).prepare("section_surfaces");
const obstructionsOfSite = db.select().from(schema.obstruction).where(eq(schema.obstruction.siteId, siteIdParam)).orderBy(asc(schema.obstruction.position)).prepare("section_obstructions");
const accessPointsOfSite = db.select().from(schema.accessPoint).where(eq(schema.accessPoint.siteId, siteIdParam)).orderBy(asc(schema.accessPoint.position)).prepare("section_access_points");

export async function emittersSection(organizationId: string, siteId: string) {
  const [rows, library, surfaces, obstructions, accessPoints] = await Promise.all([
    listEmitters(siteId),
    libraryRefs(organizationId),
    surfacesOfSite.execute({ siteId }),
    obstructionsOfSite.execute({ siteId }),
    accessPointsOfSite.execute({ siteId }),
  ]);
  const emitters = rows.map((r) => {
    const { organizationId: _o, siteId: _s, createdAt: _c, updatedAt: _u, position: _p, ...values } = r;
    return { ...(values as EmitterValues & { id: string; version: number }), ...emitterEirp(r) };
  });
  return { emitters, library: library.map((p) => ({ id: p.id, name: p.name })), surfaces, obstructions, accessPoints };
}

/** The emitters as the plan's layer needs them (the Layout section adds them to its plan). */
const e = schema.emitter;
const planEmittersOfSite = db.select({ id: e.id, label: e.label, operator: e.operator, x: e.x, y: e.y, z: e.z, azimuthDeg: e.azimuthDeg, active: e.active }).from(e).where(eq(e.siteId, siteIdParam)).orderBy(asc(e.position)).prepare("plan_emitters");

export function planEmitters(siteId: string) {
  return planEmittersOfSite.execute({ siteId });
}
