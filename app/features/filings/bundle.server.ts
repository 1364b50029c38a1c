// A filing's bundle: one ZIP (jszip) that a regulator can check and re-run on its own.
//   manifest.json             the filing, site, assessment and report, and every other file with its SHA-256 and size
//   runs/<n>/request.json     the engine's request for run n (1, 2, …), the stored text exactly
//   runs/<n>/response.json    the engine's response, the stored text and a newline, as `npm run -s evaluate` prints it
//   inventory.csv             the assessed emitters in the emitter CSV import layout
//   method.md                 standard, tier, models, factors, assumptions and sources (the report's own words)
//   report.pdf                the issued report's stored bytes
// Entries carry the filing's time, so the same filing always zips to the same bytes.
import { createHash } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import JSZip from "jszip";
import { emittersToCsv } from "~/features/emitters/csv";
import type { EmitterValues } from "~/features/emitters/convert";
import { db, schema } from "~/infra/db.server";
import { DomainError } from "~/lib/domain-error";
import { methodMarkdown, type MethodSource } from "./method-md.server";

type FilingRow = typeof schema.filing.$inferSelect;
type InventoryEmitter = Omit<EmitterValues, "x" | "y" | "z"> & { id: string; position: { x: number; y: number; z: number } };

const sha256 = (bytes: Buffer) => createHash("sha256").update(bytes).digest("hex");

/** The runs as stored: a `json` column keeps the engine's own text, which `->` hands back unchanged. */
async function storedRuns(assessmentId: string) {
  const rows = await db.execute<{ n: string; surface_id: string | null; request: string; response: string }>(sql`
    select t.n, t.run ->> 'surfaceId' as surface_id, (t.run -> 'request')::text as request, (t.run -> 'response')::text as response
    from assessment, json_array_elements(assessment.runs) with ordinality as t(run, n)
    where assessment.id = ${assessmentId} order by t.n`);
  return rows.map((r) => ({ n: Number(r.n), surfaceId: r.surface_id, request: r.request, response: r.response }));
}

export function inventoryCsv(inventory: { emitters: InventoryEmitter[]; patterns?: { id: string; name: string }[] }) {
  const names = new Map((inventory.patterns ?? []).map((p) => [p.id, p.name]));
  return emittersToCsv(inventory.emitters.map(({ position, ...e }) => ({ ...e, x: position.x, y: position.y, z: position.z, patternName: e.patternId ? (names.get(e.patternId) ?? e.patternId) : null })));
}

export async function filingBundle(f: FilingRow): Promise<{ bytes: Buffer; name: string }> {
  const [a] = await db.select().from(schema.assessment).where(eq(schema.assessment.id, f.assessmentId));
  const [report] = await db.select().from(schema.document).where(eq(schema.document.id, f.documentId));
  const [org] = await db.select({ name: schema.organization.name }).from(schema.organization).where(eq(schema.organization.id, f.organizationId));
  if (!report?.pdf) throw new DomainError("The filed report's PDF is still being made. Try again in a moment.", 409);
  const runs = await storedRuns(a.id);
  const source = a as unknown as MethodSource & { inventory: { emitters: InventoryEmitter[]; surfaces: { id: string; name: string }[] } };
  const surfaceNames = new Map(source.inventory.surfaces.map((s) => [s.id, s.name]));

  const files: [string, Buffer][] = [];
  for (const run of runs) {
    files.push([`runs/${run.n}/request.json`, Buffer.from(run.request, "utf8")]);
    files.push([`runs/${run.n}/response.json`, Buffer.from(`${run.response}\n`, "utf8")]);
  }
  files.push(["inventory.csv", Buffer.from(`\uFEFF${inventoryCsv(source.inventory)}`, "utf8")]);
  files.push(["method.md", Buffer.from(methodMarkdown(source, report, org?.name ?? ""), "utf8")]);
  files.push(["report.pdf", report.pdf]);

  const site = source.site.site;
  const manifest = {
    format: "isotrope-filing/1",
    filing: { id: f.id, authority: f.authority, filedAt: f.filedAt.toISOString(), filedBy: f.filedByName, note: f.note },
    organization: org?.name ?? "",
    site: { name: site.name, city: site.city },
    assessment: { id: a.id, name: a.name, standard: a.standard, tier: a.tier, frozenAt: a.createdAt.toISOString(), engine: a.engine },
    report: { version: report.version, code: report.code, issuedAt: report.issuedAt?.toISOString() ?? null, sha256: report.sha256 },
    runs: runs.map((r) => ({ n: r.n, surfaceId: r.surfaceId, surface: r.surfaceId ? (surfaceNames.get(r.surfaceId) ?? null) : null, request: `runs/${r.n}/request.json`, response: `runs/${r.n}/response.json` })),
    rerun: "npm run -s evaluate -- runs/<n>/request.json  # prints runs/<n>/response.json byte for byte",
    files: files.map(([path, bytes]) => ({ path, sha256: sha256(bytes), bytes: bytes.length })),
  };

  const zip = new JSZip();
  const date = f.filedAt;
  zip.file("manifest.json", `${JSON.stringify(manifest, null, 2)}\n`, { date });
  for (const [path, bytes] of files) zip.file(path, bytes, { date, createFolders: false });
  const bytes = await zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE", compressionOptions: { level: 6 }, platform: "UNIX" });
  const slug = site.name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 40) || "site";
  return { bytes, name: `isotrope-filing-${slug}-${f.filedAt.toISOString().slice(0, 10)}-${f.id.slice(0, 8)}.zip` };
}

export function zipResponse(bundle: { bytes: Buffer; name: string }) {
  return new Response(new Uint8Array(bundle.bytes), {
    headers: { "content-type": "application/zip", "content-length": String(bundle.bytes.length), "content-disposition": `attachment; filename="${bundle.name}"`, "cache-control": "private, no-cache" },
  });
}
