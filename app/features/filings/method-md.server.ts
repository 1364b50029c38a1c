// A filing's method.md: what the report's method section says (methodLines, the same words), the
// model and factors of every emitter as assessed, and the published sources.
import { dateText } from "~/features/documents/format";
import { METHOD_SOURCES, methodLines, type MethodAssessment } from "~/features/documents/pdf/method.server";
import { standardText } from "~/features/documents/pdf/common.server";

type Emitter = { label: string; model: string; patternId: string | null; pattern: { type?: string } | null; dutyFactor: number; actualMaxFactor: number; tddFactor?: number; active: boolean; apertureM?: number | null; dishDiameterM?: number | null };

export type MethodSource = MethodAssessment & {
  name: string;
  createdAt: Date;
  site: { site: { name: string; city: string } };
  inventory: { emitters: Emitter[]; patterns?: { id: string; name: string }[] };
  mitigation: { notes?: string; basis?: unknown };
};

/** Markdown table cells: pipes and line breaks would break the table. */
const cell = (v: unknown) => String(v ?? "").replace(/\|/g, "\\|").replace(/\r?\n/g, " ");

export function methodMarkdown(a: MethodSource, report: { version: number; code: string; issuedAt: Date | null; reviewerName: string | null }, organizationName: string): string {
  const patterns = new Map((a.inventory.patterns ?? []).map((p) => [p.id, p.name]));
  const o = a.options;
  const lines = [
    `# Method: ${a.name}`,
    "",
    `- Site: ${a.site.site.name}${a.site.site.city ? `, ${a.site.site.city}` : ""}`,
    `- Standard and tier: ${standardText(a)} (\`${a.standard}\`, \`${a.tier}\`)`,
    `- Assessment frozen: ${dateText(a.createdAt)}`,
    `- Report: version ${report.version}, verification code ${report.code}${report.issuedAt ? `, issued ${dateText(report.issuedAt)}` : ""}${report.reviewerName ? ` by ${report.reviewerName}` : ""}, ${organizationName}`,
    `- Engine: ${a.engine}`,
    `- Options: grid ${o.gridStepM} m; heights ${o.heights.fromM}–${o.heights.toM} m (${o.heights.count}); ${o.mode}; reflection factor ${o.reflectionFactor}; default model ${o.defaultModel}`,
    "",
    "## Method, models and assumptions",
    "",
    ...methodLines(a).map((l) => `- ${l}`),
    "",
    "## Models and factors by emitter",
    "",
    "| emitter | active | model | pattern | duty factor | actual-maximum factor | TDD factor |",
    "| --- | --- | --- | --- | --- | --- | --- |",
    ...a.inventory.emitters.map((e) => {
      const pattern = e.patternId ? `library: ${patterns.get(e.patternId) ?? e.patternId}` : e.pattern?.type ?? "isotropic in its beamwidths";
      const model = e.model === "aperture" ? `aperture (dish ${e.dishDiameterM} m)` : e.model === "cylindrical" || e.model === "auto" ? `${e.model} (aperture ${e.apertureM} m)` : e.model;
      return `| ${cell(e.label)} | ${e.active ? "yes" : "no"} | ${cell(model)} | ${cell(pattern)} | ${e.dutyFactor} | ${e.actualMaxFactor} | ${e.tddFactor ?? 1} |`;
    }),
    "",
    ...(a.mitigation.notes ? ["## Engineer's notes", "", cell(a.mitigation.notes), ""] : []),
    "## Published sources",
    "",
    ...METHOD_SOURCES.map((s) => `- ${s}`),
    "",
    "## Re-running",
    "",
    "Each `runs/<n>/request.json` is exactly what the engine was given; `npm run -s evaluate -- runs/<n>/request.json`",
    "prints `runs/<n>/response.json` byte for byte. `manifest.json` lists every file with its SHA-256.",
    "",
  ];
  return lines.join("\n");
}
