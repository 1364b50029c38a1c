// What the Emitters section shows: the rows with EIRP/ERP, the library to choose from, and the
// plan's layout (surfaces, obstructions, access points) for the emitter layer.
import { asc, eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import type { EmitterValues } from "./convert";
import { libraryRefs, listEmitters } from "./emitters.server";
import { emitterEirp } from "./json";

export async function emittersSection(organizationId: string, siteId: string) {
  const [rows, library, surfaces, obstructions, accessPoints] = await Promise.all([
    listEmitters(siteId),
    libraryRefs(organizationId),
    db.select().from(schema.surface).where(eq(schema.surface.siteId, siteId)).orderBy(asc(schema.surface.position)),
    db.select().from(schema.obstruction).where(eq(schema.obstruction.siteId, siteId)).orderBy(asc(schema.obstruction.position)),
    db.select().from(schema.accessPoint).where(eq(schema.accessPoint.siteId, siteId)).orderBy(asc(schema.accessPoint.position)),
  ]);
  const emitters = rows.map((r) => {
    const { organizationId: _o, siteId: _s, createdAt: _c, updatedAt: _u, position: _p, ...values } = r;
    return { ...(values as EmitterValues & { id: string; version: number }), ...emitterEirp(r) };
  });
  return { emitters, library: library.map((p) => ({ id: p.id, name: p.name })), surfaces, obstructions, accessPoints };
}

/** The emitters as the plan's layer needs them (the Layout section adds them to its plan). */
export function planEmitters(siteId: string) {
  const e = schema.emitter;
  return db.select({ id: e.id, label: e.label, operator: e.operator, x: e.x, y: e.y, z: e.z, azimuthDeg: e.azimuthDeg, active: e.active }).from(e).where(eq(e.siteId, siteId)).orderBy(asc(e.position));
}
