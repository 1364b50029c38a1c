// What the Emitters section shows: the rows with EIRP/ERP, the library to choose from, and the
// plan's layout (surfaces, obstructions, access points, read by the layout feature) for the emitter layer.
import { asc, eq, sql } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { readLayout } from "~/features/layout/layout.server";
import type { EmitterValues } from "./convert";
import { libraryRefs, listEmitters } from "./emitters.server";
import { emitterEirp } from "./json";

const siteIdParam = sql.placeholder("siteId");

export async function emittersSection(organizationId: string, siteId: string) {
  // The plan's layout through the layout feature's one-statement read (its version is not used here).
  const [rows, library, { surfaces, obstructions, accessPoints }] = await Promise.all([listEmitters(siteId), libraryRefs(organizationId), readLayout(siteId, 0)]);
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
