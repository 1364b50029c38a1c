// The whole site as the JSON API returns it: details, its layout (surfaces, obstructions, access
// points, the roof drawing's placement) and emitters.
import { asc, eq } from "drizzle-orm";
import { emitterJson } from "~/features/emitters/json";
import { readLayout } from "~/features/layout/layout.server";
import { db, schema } from "~/infra/db.server";
import { siteJson } from "./json";
import type { Scope } from "./scope.server";
import { findSite } from "./sites.server";

export async function siteDetail(scope: Scope, siteId: string) {
  const site = await findSite(scope, siteId);
  if (!site) return null;
  const [layout, emitters] = await Promise.all([
    readLayout(site.id, site.version),
    db.select().from(schema.emitter).where(eq(schema.emitter.siteId, site.id)).orderBy(asc(schema.emitter.position), asc(schema.emitter.createdAt)),
  ]);
  const { version: _v, ...parts } = layout;
  return { ...siteJson(site), clientName: site.clientName, ...parts, emitters: emitters.map(emitterJson) };
}
