// The whole site as the JSON API returns it: details, surfaces and emitters.
import { asc, eq } from "drizzle-orm";
import { emitterJson } from "~/features/emitters/json";
import { surfaceJson } from "~/features/layout/json";
import { db, schema } from "~/infra/db.server";
import { siteJson } from "./json";
import type { Scope } from "./scope.server";
import { findSite } from "./sites.server";

export async function siteDetail(scope: Scope, siteId: string) {
  const site = await findSite(scope, siteId);
  if (!site) return null;
  const [surfaces, emitters] = await Promise.all([
    db.select().from(schema.surface).where(eq(schema.surface.siteId, site.id)).orderBy(asc(schema.surface.position), asc(schema.surface.createdAt)),
    db.select().from(schema.emitter).where(eq(schema.emitter.siteId, site.id)).orderBy(asc(schema.emitter.position), asc(schema.emitter.createdAt)),
  ]);
  return { ...siteJson(site), clientName: site.clientName, surfaces: surfaces.map(surfaceJson), emitters: emitters.map(emitterJson) };
}
