// The landlord letter: one page in plain language for a property manager. What was assessed and
// when, the conclusion, what the landlord must do, a small map of the no-go areas, the cautions.
import { signLabels } from "~/features/exposure/mitigation";
import { pdfColours as C } from "~/infra/pdf/palette";
import { bullets, contentWidth, createPdf, PAGE, paragraph, say } from "~/infra/pdf/pdf.server";
import { dateText, percentText } from "../format";
import { RF_CAUTIONS, standardText } from "./common.server";
import { drawLevelMap } from "./figures.server";
import { documentTitles, type DocumentSource } from "./source";

export async function renderLetter(src: DocumentSource): Promise<Buffer> {
  const a = src.assessment;
  const site = a.site.site;
  const { doc, finish } = createPdf({ title: documentTitles.letter, subtitle: site.name, version: src.version, code: src.code, draft: src.draft, producedAt: src.issuedAt ?? src.createdAt });
  const date = dateText(src.issuedAt ?? src.createdAt);
  say(doc, date, { x: PAGE.margin, y: 70, size: 9.5, width: contentWidth, align: "right" });
  say(doc, a.site.client?.name ?? "The property manager", { x: PAGE.margin, y: 70, size: 9.5, weight: "bold" });
  say(doc, [site.address, site.city].filter(Boolean).join(", "), { size: 9.5 });
  doc.moveDown(0.8);
  say(doc, `Radio-frequency safety at ${site.name}`, { x: PAGE.margin, y: doc.y, size: 14, weight: "bold", width: contentWidth });
  doc.moveDown(0.4);
  const over = a.results.surfaces.filter((s) => s.worstClass > 0);
  const opts = { size: 9.5 };
  paragraph(doc, `${src.organizationName} assessed the radio transmitters on your property on ${dateText(a.createdAt)} against the ${standardText(a)} limit, from the equipment recorded on site (${a.inventory.emitters.length} antennas).`, opts);
  paragraph(doc, over.length
    ? `Conclusion: the building is safe for the public where the public can go, but close to the antennas, on ${over.map((s) => s.name).join(" and ")}, radio exposure can exceed the limit (up to ${percentText(a.summary.worstPercent)} of it). Those areas, shaded on the map, must be kept closed to anyone who is not trained and authorised.`
    : `Conclusion: predicted exposure is within the limit everywhere we assessed (at most ${percentText(a.summary.worstPercent)} of it). Keep the measures below in place so it stays that way.`, { ...opts, weight: "bold" });
  say(doc, "What you need to do", { x: PAGE.margin, y: doc.y + 2, size: 10.5, weight: "bold" });
  doc.moveDown(0.3);
  const doors = a.inventory.accessPoints.map((p) => p.name);
  const signCount = a.mitigation.signs.filter((s) => s.category !== "information").length;
  bullets(doc, [
    `Keep the roof doors and hatches locked${doors.length ? ` (${doors.join(", ")})` : ""}; give keys only to people who have been told about the radio areas.`,
    signCount ? `Keep the ${signCount} signs (${[...new Set(a.mitigation.signs.filter((s) => s.category !== "information").map((s) => signLabels[s.category]))].join(", ")}) posted where the plan puts them; replace any that are lost or faded.` : "No warning signs are needed; keep any information signs posted.",
    "Before anyone works on the roof (builders, cleaners, lift or air-conditioning engineers), call the operators so they can reduce or switch off their transmitters; our report lists which ones for each area.",
    "Do not let anyone stand in front of the antennas or inside the white line on the map below.",
  ], { size: 9 });
  // The map of the level with the largest area over the general-population limit.
  const level = [...a.results.surfaces].filter((s) => s.kind === "area").sort((x, y) => y.areas.overGeneralM2 - x.areas.overGeneralM2)[0];
  const surface = a.inventory.surfaces.find((s) => s.id === level?.surfaceId);
  const run = a.runs.find((r) => r.surfaceId === level?.surfaceId);
  const g = run?.response.grid;
  if (level && surface?.polygon && g) {
    const y = doc.y + 4;
    const w = 250;
    const h = 180;
    drawLevelMap(doc, { grid: { x0: g.x0, y0: g.y0, step: g.step, nx: g.nx, ny: g.ny, percent: g.percent, mask: g.mask }, polygon: surface.polygon, obstructions: [], emitters: [], worst: null, signs: a.mitigation.signs.filter((s) => s.surfaceId === level.surfaceId) }, { x: PAGE.margin, y, w, h }, { levels: [100], key: "triangles: signs" });
    say(doc, `${level.name}, seen from above with north up. Inside the white line exposure is over the limit for the public: a no-go area unless you are authorised and the operators have powered down. Darker colours mean stronger exposure.`, { x: PAGE.margin + w + 16, y: y + 10, size: 8.5, width: contentWidth - w - 16 });
    doc.x = PAGE.margin;
    doc.y = y + h + 4;
  }
  say(doc, "Please keep in mind", { x: PAGE.margin, y: doc.y, size: 9.5, weight: "bold", color: C.caution });
  doc.moveDown(0.2);
  bullets(doc, RF_CAUTIONS, { size: 8 });
  doc.moveDown(0.3);
  say(doc, `Yours faithfully, ${src.authorName}${src.reviewerName ? `, reviewed by ${src.reviewerName}` : ""}, ${src.organizationName}. The full report (version ${src.version}) is available on request.`, { x: PAGE.margin, y: doc.y, size: 8.5, width: contentWidth, color: C.graphite });
  return finish();
}
