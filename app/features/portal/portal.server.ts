// What the client portal reads: the bound client's sites, their issued documents, and each site's
// status from the frozen assessment behind its latest issued document. Everything goes through the
// member's scope (sites.server, documents.server, assessments.server), so another client's or
// another organisation's site is simply not found, and a client member never sees an unissued
// document. Only the fields a landlord may see leave this file: no access notes, readings,
// emitters, internal notes or history.
import type { SurfaceResult, Run } from "~/features/exposure/evaluate-site";
import type { Barrier, MitigationPlan, Sign } from "~/features/exposure/mitigation";
import { standardLabels, tierLabels } from "~/features/exposure/options";
import { findAssessment, type AssessmentRow } from "~/features/assessments/assessments.server";
import { listDocuments, type DocumentListRow } from "~/features/documents/documents.server";
import { findSite, listSites } from "~/features/sites/sites.server";
import type { Scope } from "~/features/sites/scope.server";
import type { StandardId, Tier } from "~/engine/limits";
import { siteStatus, type SiteStatus, type StatusBasis, type StatusSource } from "./status";

type XY = [number, number];
export type PortalDocument = { id: string; kind: DocumentListRow["kind"]; version: number; issuedAt: string | null; issuedBy: string | null; code: string | null; sha256: string | null };
export type KeepOutMap = {
  surfaceId: string;
  name: string;
  polygon: XY[];
  grid: { x0: number; y0: number; step: number; nx: number; ny: number };
  classes: number[];
  obstructions: { id: string; polygon: XY[] }[];
  accessPoints: { id: string; name: string; x: number; y: number }[];
  signs: Sign[];
  barriers: Barrier[];
};

const issuedFirst = (a: DocumentListRow, b: DocumentListRow) => (b.issuedAt?.getTime() ?? 0) - (a.issuedAt?.getTime() ?? 0);

function documentOf(d: DocumentListRow): PortalDocument {
  return { id: d.id, kind: d.kind, version: d.version, issuedAt: d.issuedAt?.toISOString() ?? null, issuedBy: d.reviewerName, code: d.kind === "certificate" ? d.code : null, sha256: d.sha256 };
}

function basisOf(a: AssessmentRow, d: DocumentListRow): StatusBasis {
  const standard = `${standardLabels[a.standard as StandardId] ?? a.standard}, ${tierLabels[a.standard as StandardId]?.[a.tier as Tier] ?? a.tier}`;
  return { assessmentName: a.name, assessedOn: a.createdAt.toISOString(), standard, documentKind: d.kind, issuedAt: d.issuedAt?.toISOString() ?? null };
}

/** The status from the latest issued document's assessment, or null when nothing is issued yet. */
async function latestAssessment(scope: Scope, docs: DocumentListRow[]) {
  const latest = [...docs].sort(issuedFirst)[0];
  if (!latest) return null;
  const a = await findAssessment(scope, latest.assessmentId, latest.siteId);
  return a ? { assessment: a, document: latest } : null;
}

/** The portal's home: each of the client's sites with its status and latest issued document of each kind. */
export async function portalSites(scope: Scope) {
  const [{ sites }, docs] = await Promise.all([
    listSites(scope, { page: 1, pageSize: 100, q: "", sort: "name", dir: "asc" }),
    listDocuments(scope, { state: "issued" }),
  ]);
  return Promise.all(
    sites.map(async (s) => {
      const own = docs.filter((d) => d.siteId === s.id).sort(issuedFirst);
      const latest = await latestAssessment(scope, own);
      const byKind = new Map<string, DocumentListRow>();
      for (const d of own) if (!byKind.has(d.kind)) byKind.set(d.kind, d);
      return {
        id: s.id,
        name: s.name,
        kind: s.kind,
        city: s.city,
        status: latest ? siteStatus(latest.assessment as unknown as StatusSource) : null,
        basis: latest ? basisOf(latest.assessment, latest.document) : null,
        documents: [...byKind.values()].map(documentOf),
      };
    }),
  );
}

/** One site of the client: its public facts, status, keep-out maps and every issued document; null when not in scope. */
export async function portalSite(scope: Scope, siteId: string) {
  const site = await findSite(scope, siteId);
  if (!site) return null;
  const docs = (await listDocuments(scope, { siteId: site.id, state: "issued" })).sort(issuedFirst);
  const latest = await latestAssessment(scope, docs);
  const status: SiteStatus | null = latest ? siteStatus(latest.assessment as unknown as StatusSource) : null;
  return {
    site: { id: site.id, name: site.name, kind: site.kind, address: site.address, city: site.city, clientName: site.clientName },
    status,
    basis: latest ? basisOf(latest.assessment, latest.document) : null,
    maps: latest && status ? keepOutMaps(latest.assessment, status) : [],
    // The newest of each kind is the one to rely on; earlier ones stay listed.
    documents: docs.map((d, i) => ({ ...documentOf(d), latest: docs.findIndex((x) => x.kind === d.kind) === i })),
  };
}

/** The plan of each walkable surface with somewhere to keep out of, drawn from the frozen runs. */
function keepOutMaps(a: AssessmentRow, status: SiteStatus): KeepOutMap[] {
  const runs = a.runs as Run[];
  const results = (a.results as { surfaces: SurfaceResult[] }).surfaces;
  const inventory = a.inventory as { surfaces: { id: string; polygon?: XY[] | null; elevationM?: number | null }[]; obstructions: { id: string; polygon: XY[]; baseM: number; heightM: number }[]; accessPoints: { id: string; name: string; x: number; y: number; z: number }[] };
  const plan = a.mitigation as MitigationPlan;
  const maps: KeepOutMap[] = [];
  for (const k of status.keepOut) {
    const result = results.find((r) => r.surfaceId === k.surfaceId);
    const surface = inventory.surfaces.find((s) => s.id === k.surfaceId);
    const g = runs.find((r) => r.surfaceId === k.surfaceId)?.response.grid;
    if (!result || result.kind !== "area" || !surface?.polygon || !g) continue;
    const z = surface.elevationM ?? 0;
    maps.push({
      surfaceId: k.surfaceId,
      name: k.name,
      polygon: surface.polygon,
      grid: { x0: g.x0, y0: g.y0, step: g.step, nx: g.nx, ny: g.ny },
      classes: result.classes,
      obstructions: inventory.obstructions.filter((o) => o.baseM <= z + 1e-9 && o.baseM + o.heightM > z + 1e-9).map((o) => ({ id: o.id, polygon: o.polygon })),
      // As the assessment page draws them: the access points and unattached signs at this level.
      accessPoints: inventory.accessPoints.filter((p) => Math.abs(p.z - z) < 0.5).map((p) => ({ id: p.id, name: p.name, x: p.x, y: p.y })),
      // The engineer's notes on signs and barriers stay inside the consultancy.
      signs: plan.signs.filter((s) => s.surfaceId === k.surfaceId || (s.surfaceId === null && Math.abs(s.z - z) < 0.5)).map((s) => ({ ...s, note: "" })),
      barriers: plan.barriers.filter((b) => b.surfaceId === k.surfaceId).map((b) => ({ ...b, note: "" })),
    });
  }
  return maps;
}
