// The Exposure page's data: the site in scope, the options from the URL (bad values fall back to
// the defaults with a message), the inventory and the readings of the site's visits, and the
// computation of the stored inventory by the pure engine, in-process, kept per input
// (result-cache.server.ts). The route defers the computation when it is not at hand, so the page
// paints before the engine has run; loadExposurePage waits for it.
import { findSite } from "~/features/sites/sites.server";
import type { Scope } from "~/features/sites/scope.server";
import { listReadings } from "~/features/visits/readings.server";
import { listVisits } from "~/features/visits/visits.server";
import type { ExposureInput } from "./exposure-result";
import { loadSiteInventory } from "./inventory.server";
import { optionsFromSearch } from "./options";
import type { SiteReading } from "./readings";
import { exposureOutcome } from "./result-cache.server";

export type ExposurePage = NonNullable<Awaited<ReturnType<typeof loadExposurePage>>>;
export type ExposureShell = NonNullable<Awaited<ReturnType<typeof loadExposureShell>>>;

/** Null when the site is not in the scope (the route answers 404). `exposure` is the outcome, or a promise of it when it must be read or computed. */
export async function loadExposureShell(scope: Scope, siteId: string, search: URLSearchParams) {
  const site = await findSite(scope, siteId);
  if (!site) return null;
  const { options, errors } = optionsFromSearch(search);
  const [inventory, readings] = await Promise.all([loadSiteInventory(scope.organizationId, site.id), siteReadings(site.id)]);
  const input: ExposureInput = { options, surfaces: inventory.surfaces, emitters: inventory.emitters, patterns: [...inventory.patterns], readings };
  return {
    site: { id: site.id, name: site.name },
    options,
    errors,
    input,
    exposure: exposureOutcome(scope.organizationId, site.id, input),
    generatedAt: new Date().toISOString(),
    obstructions: inventory.obstructions.map((o) => ({ id: o.id, name: o.name, polygon: o.polygon, heightM: o.heightM, baseM: o.baseM })),
    accessPoints: inventory.accessPoints.map((a) => ({ id: a.id, name: a.name, kind: a.kind, x: a.x, y: a.y, z: a.z })),
    emitterInfo: Object.fromEntries(inventory.emitterRows.map((e) => [e.id, { operator: e.operator, band: e.band }])),
  };
}

/** The page's data with the computation done. Never throws for the engine's refusals: they come back as `problem`. */
export async function loadExposurePage(scope: Scope, siteId: string, search: URLSearchParams) {
  const shell = await loadExposureShell(scope, siteId, search);
  if (!shell) return null;
  const { exposure, ...rest } = shell;
  const { result, problem, computeMs, source } = await exposure;
  return { ...rest, result, problem, computeMs, source };
}

/** Every reading of the site's visits, oldest visit first. */
async function siteReadings(siteId: string): Promise<SiteReading[]> {
  const visits = (await listVisits(siteId)).map((v) => v.visit).reverse();
  const lists = await Promise.all(visits.map((v) => listReadings(v.id)));
  return visits.flatMap((v, k) =>
    lists[k].map((r) => ({
      id: r.id,
      label: r.label,
      visitId: v.id,
      visitedOn: v.visitedOn,
      surfaceId: r.surfaceId,
      x: r.x,
      y: r.y,
      heightM: r.heightM,
      value: r.value,
      unit: r.unit,
      frequencyMHz: r.frequencyMHz,
      powerDensityWm2: r.powerDensityWm2,
      percentStandard: r.percentStandard,
      percentTier: r.percentTier,
    })),
  );
}
