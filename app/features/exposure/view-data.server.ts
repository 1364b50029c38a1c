// What the elevation, 3D and planner pages load: the site (scoped to the member's organisation),
// the options from the URL, the active emitters as the engine takes them (converted once, by
// engine-inputs), the surfaces, obstructions and access points. The pages compute in the browser.
import { findSite } from "~/features/sites/sites.server";
import type { Scope } from "~/features/sites/scope.server";
import { found } from "~/lib/responses.server";
import { engineEmitters } from "./engine-inputs";
import { loadSiteInventory } from "./inventory.server";
import { optionsFromSearch } from "./options";

export async function loadViewData(scope: Scope, siteId: string, url: URL) {
  const site = found(await findSite(scope, siteId), "No such site in your organisation.");
  const inventory = await loadSiteInventory(scope.organizationId, site.id);
  const { options, errors } = optionsFromSearch(url.searchParams);
  const { emitters, inventoryIdOf } = engineEmitters(inventory.emitters, inventory.patterns, options);
  const rowOf = new Map(inventory.emitterRows.map((r) => [r.id, r]));
  return {
    site: { id: site.id, name: site.name },
    options,
    optionErrors: Object.values(errors),
    emitters,
    /** Operator and band per engine id, for tables and legends. */
    emitterInfo: emitters.map((e) => {
      const row = rowOf.get(inventoryIdOf.get(e.id)!);
      return { id: e.id, operator: row?.operator ?? "", band: row?.band ?? "" };
    }),
    surfaces: inventory.surfaces,
    obstructions: inventory.obstructions.map((o) => ({ id: o.id, name: o.name, polygon: o.polygon, baseM: o.baseM, heightM: o.heightM })),
    accessPoints: inventory.accessPoints.map((a) => ({ id: a.id, name: a.name, kind: a.kind, x: a.x, y: a.y, z: a.z })),
  };
}

export type ViewData = Awaited<ReturnType<typeof loadViewData>>;
