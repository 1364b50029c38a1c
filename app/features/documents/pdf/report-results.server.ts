// The report's results: each level's exposure map with the legend, the worst points and areas by
// class, an elevation cut along the boresight of the emitter that dominates the worst point, the
// per-emitter contributions and the compliance distances.
import { evaluate, type EvaluationRequestInput } from "~/engine";
import type { Run } from "~/features/exposure/evaluate-site";
import { pdfColours as C } from "~/infra/pdf/palette";
import { contentWidth, heading, PAGE, paragraph, type Doc } from "~/infra/pdf/pdf.server";
import { table } from "~/infra/pdf/table.server";
import { areaText, metresText, percentText, wattsText } from "../format";
import { standardText } from "./common.server";
import { drawElevationCut, drawLegend, drawLevelMap, type Cut } from "./figures.server";
import type { SourceAssessment } from "./source";

type Emitter = NonNullable<EvaluationRequestInput["emitters"]>[number];

export function reportResults(doc: Doc, a: SourceAssessment, labels: Map<string, string>) {
  const legend = `Total % of the ${standardText(a)} limit, log scale (viridis); under 1 % unfilled. Contours at 50, 100 and 500 %.`;
  doc.addPage();
  heading(doc, "4. Predicted exposure by level");
  paragraph(doc, `Each map shows the total predicted exposure as a percentage of the limit, ${a.options.mode === "average" ? "averaged over" : "the maximum over"} the heights assessed, on a ${a.options.gridStepM} m grid. The white line is 100 % of the limit.`);
  for (const result of a.results.surfaces) {
    const surface = a.inventory.surfaces.find((s) => s.id === result.surfaceId);
    const run = a.runs.find((r) => r.surfaceId === result.surfaceId);
    const g = run?.response.grid;
    if (result.kind !== "area" || !surface?.polygon || !g) continue;
    const elevation = surface.elevationM ?? 0;
    const boxH = 235;
    if (doc.y + boxH + 62 > PAGE.height - PAGE.bottom) doc.addPage();
    heading(doc, `${result.name}, ${metresText(elevation)}: worst ${percentText(result.worstPercent)}`, 2);
    const y = doc.y;
    drawLevelMap(doc, {
      grid: { x0: g.x0, y0: g.y0, step: g.step, nx: g.nx, ny: g.ny, percent: g.percent, mask: g.mask },
      polygon: surface.polygon,
      obstructions: a.inventory.obstructions.filter((o) => o.baseM <= elevation + 1e-9 && o.baseM + o.heightM > elevation + 1e-9).map((o) => o.polygon),
      emitters: (run.request.emitters ?? []).map((e) => ({ label: labels.get(e.id) ?? e.id, x: e.position.x, y: e.position.y, azimuthDeg: e.azimuthDeg ?? 0 })),
      worst: result.worstAt,
      signs: a.mitigation.signs.filter((s) => s.surfaceId === result.surfaceId),
    }, { x: PAGE.margin, y, w: contentWidth, h: boxH });
    drawLegend(doc, PAGE.margin, y + boxH + 6, 260, legend);
    doc.x = PAGE.margin;
    doc.y = y + boxH + 44;
  }

  heading(doc, "Worst points and areas by class", 2);
  table(doc, [{ header: "Surface", width: 2.4 }, { header: "Worst", width: 1, align: "right" }, { header: "At (x, y, z)", width: 1.7, align: "right" }, { header: "Over general", width: 1.3, align: "right" }, { header: "Over occupational", width: 1.4, align: "right" }, { header: "Over 10 × occ.", width: 1.3, align: "right" }],
    a.results.surfaces.map((s) => [s.name, percentText(s.worstPercent), s.worstAt ? `${s.worstAt.x}, ${s.worstAt.y}, ${s.worstAt.z}` : "—", areaText(s.areas.overGeneralM2), areaText(s.areas.overOccupationalM2), areaText(s.areas.overTenTimesOccupationalM2)]));

  const cut = elevationCut(a, labels);
  if (cut) {
    doc.addPage();
    heading(doc, `5. Elevation along ${cut.emitter.label}'s azimuth`);
    paragraph(doc, `A vertical cut from ${cut.emitter.label} along its azimuth, over ${metresText(cut.lengthM)}: the beam, the roof and head height. Values at each point (not averaged over heights).`);
    const y = doc.y;
    const used = drawElevationCut(doc, cut, { x: PAGE.margin, y, w: contentWidth, h: 260 });
    drawLegend(doc, PAGE.margin, y + used + 4, 260, legend);
    doc.x = PAGE.margin;
    doc.y = y + used + 44;
  }

  heading(doc, "6. Contributions and compliance distances");
  paragraph(doc, "Each emitter's share of the total at the worst point of each surface (the largest three).");
  table(doc, [{ header: "Surface", width: 2 }, { header: "Largest contributions at the worst point", width: 5 }],
    a.results.surfaces.map((s) => [s.name, s.contributions.slice(0, 3).map((c) => `${labels.get(c.id) ?? c.id} ${percentText(c.percent)}`).join(", ") || "—"]));
  paragraph(doc, "Compliance distance: along boresight, where this emitter alone reaches 100 % of each tier's limit.");
  table(doc, [{ header: "Emitter", width: 1.3 }, { header: "MHz", width: 1, align: "right" }, { header: "EIRP", width: 1.2, align: "right" }, { header: "General population", width: 1.7, align: "right" }, { header: "Occupational", width: 1.7, align: "right" }],
    a.results.emitters.map((e) => [labels.get(e.id) ?? e.id, `${e.frequencyMHz}`, wattsText(e.eirpW), metresText(e.complianceDistanceM.general), metresText(e.complianceDistanceM.occupational)]));
  doc.fillColor(C.ink);
}

/** The cut through the emitter that contributes most at the site's worst point. */
function elevationCut(a: SourceAssessment, labels: Map<string, string>): Cut | null {
  const worstSurface = a.results.surfaces.find((s) => s.surfaceId === a.summary.worstAt?.surfaceId) ?? a.results.surfaces[0];
  const run: Run | undefined = a.runs.find((r) => r.surfaceId === worstSurface?.surfaceId) ?? a.runs[0];
  const emitters = (run?.request.emitters ?? []) as Emitter[];
  if (!run || emitters.length === 0) return null;
  const topId = worstSurface?.contributions[0]?.id;
  const e = emitters.find((x) => x.id === topId) ?? emitters[0];
  const distance = a.results.emitters.find((x) => x.id === e.id)?.complianceDistanceM;
  const surfaceZ = worstSurface?.elevationM ?? 0;
  const z0 = surfaceZ - 1;
  const z1 = Math.max(e.position.z + 4, surfaceZ + 6);
  const lengthM = Math.min(2.5 * (z1 - z0), Math.max(10, Math.ceil(((distance?.general ?? 5) * 2.5) / 2) * 2));
  const step = Math.max(lengthM / 120, (z1 - z0) / 60);
  const nh = Math.floor(lengthM / step) + 1;
  const nv = Math.floor((z1 - z0) / step) + 1;
  const az = ((e.azimuthDeg ?? 0) * Math.PI) / 180;
  const points = [];
  for (let j = 0; j < nv; j++) for (let i = 0; i < nh; i++) points.push({ x: e.position.x + i * step * Math.sin(az), y: e.position.y + i * step * Math.cos(az), z: z0 + j * step });
  const response = evaluate({ standard: run.request.standard, tier: run.request.tier, emitters, points });
  return { lengthM, z0, z1, step, nh, nv, percent: (response.points ?? []).map((p) => p.totalPercent), emitter: { label: labels.get(e.id) ?? e.id, z: e.position.z }, surfaceZ, headM: 2 };
}
