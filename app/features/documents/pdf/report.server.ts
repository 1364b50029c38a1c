// The report: cover, site, inventory, method, results (maps of each level, an elevation cut, worst
// points, contributions, compliance distances), readings against predictions, the mitigation plan
// and the cautions. Everything comes from the frozen assessment (source.ts).
import { signLabels, SIGN_CATEGORIES } from "~/features/exposure/mitigation";
import { pdfColours as C } from "~/infra/pdf/palette";
import { bullets, contentWidth, createPdf, ensureSpace, heading, PAGE, paragraph, say } from "~/infra/pdf/pdf.server";
import { table } from "~/infra/pdf/table.server";
import { areaText, dateText, metresText, percentText, wattsText } from "../format";
import { cautionsBox, emitterLabels, METHOD_SOURCES, standardText } from "./common.server";
import { methodLines } from "./method.server";
import { reportResults } from "./report-results.server";
import { readingRows } from "./readings";
import { documentTitles, type DocumentSource } from "./source";

export async function renderReport(src: DocumentSource): Promise<Buffer> {
  const a = src.assessment;
  const site = a.site.site;
  const { doc, finish } = createPdf({ title: documentTitles.report, subtitle: site.name, version: src.version, code: src.code, draft: src.draft, producedAt: src.issuedAt ?? src.createdAt });
  const labels = emitterLabels(a);

  // Cover.
  say(doc, documentTitles.report, { x: PAGE.margin, y: 120, size: 12, color: C.flag, weight: "bold" });
  say(doc, site.name, { x: PAGE.margin, y: 140, size: 26, weight: "bold", width: contentWidth });
  say(doc, [site.address, site.city].filter(Boolean).join(", ") || "No address recorded", { size: 12, color: C.graphite, width: contentWidth });
  doc.moveDown(1.5);
  const cover: [string, string][] = [
    ["Client", a.site.client?.name ?? "No client recorded"],
    ["Standard and tier", standardText(a)],
    ["Assessment", `${a.name}, frozen ${dateText(a.createdAt)}`],
    [src.issuedAt ? "Issued" : "Drafted", dateText(src.issuedAt ?? src.createdAt)],
    ["Engineer", `${src.authorName} (assessment by ${a.authorName})`],
    ["Reviewer", src.reviewerName ?? "Not yet reviewed"],
    ["Prepared by", src.organizationName],
    ["Version and code", `Version ${src.version} · ${src.code}`],
  ];
  for (const [k, v] of cover) {
    const y = doc.y;
    say(doc, k.toUpperCase(), { x: PAGE.margin, y, size: 7.5, color: C.graphite, weight: "bold", characterSpacing: 0.6 });
    say(doc, v, { x: PAGE.margin + 130, y: y - 1, size: 11, width: contentWidth - 130 });
    doc.moveDown(0.55);
  }
  doc.moveDown(1);
  const worst = a.summary.worstPercent;
  const over = a.results.surfaces.filter((s) => s.worstPercent > 100).map((s) => s.name);
  heading(doc, "Conclusion", 2);
  paragraph(doc, over.length === 0
    ? `Predicted exposure is within the ${standardText(a)} limit everywhere assessed. The highest predicted value is ${percentText(worst)} of the limit.`
    : `Predicted exposure exceeds the ${standardText(a)} limit on ${over.join(", ")}; the highest predicted value is ${percentText(worst)} of the limit. The areas concerned must be controlled as the mitigation plan in this report sets out before anyone works there.`);
  cautionsBox(doc);

  // 1. Site.
  doc.addPage();
  heading(doc, "1. The site");
  paragraph(doc, `${site.name} is a ${site.kind.replace(/-/g, " ")} site${site.address ? ` at ${site.address}` : ""}${site.city ? `, ${site.city}` : ""}. Positions are in metres in the site's plan (x east, y north)${site.datumNote ? `, with z = 0 at ${site.datumNote}` : ""}.`);
  if (site.accessNotes) paragraph(doc, `Access: ${site.accessNotes}`);
  table(doc, [{ header: "Level or surface", width: 3 }, { header: "Kind", width: 1.2 }, { header: "Elevation", width: 1.2, align: "right" }, { header: "Who may go there", width: 2 }],
    a.inventory.surfaces.map((s) => [s.name, s.kind === "area" ? "walkable area" : "facade", s.kind === "area" ? metresText(s.elevationM ?? 0) : "—", s.access]));
  if (a.inventory.accessPoints.length) {
    table(doc, [{ header: "Access point", width: 3 }, { header: "Kind", width: 1.5 }, { header: "Position (x, y, z)", width: 2.5 }, { header: "Locked", width: 1 }],
      a.inventory.accessPoints.map((p) => [p.name, p.kind, `${p.x}, ${p.y}, ${p.z} m`, p.locked ? "yes" : "no"]));
  }

  // 2. Inventory.
  heading(doc, "2. Transmitting antennas");
  paragraph(doc, `${a.inventory.emitters.length} emitters were recorded; the EIRP is the engine's, from power per carrier × carriers, less the line loss, times the gain.`);
  const eirp = new Map(a.results.emitters.map((e) => [e.inventoryId, e.eirpW]));
  table(doc, [
    { header: "Label", width: 1.35 }, { header: "Operator, band", width: 1.9 }, { header: "MHz", width: 0.9, align: "right" }, { header: "Power", width: 1.3, align: "right" },
    { header: "Loss, gain", width: 1.4, align: "right" }, { header: "Azimuth, tilt", width: 1.3, align: "right" }, { header: "Centre (x, y, z)", width: 1.6, align: "right" }, { header: "EIRP", width: 1.1, align: "right" },
  ], a.inventory.emitters.map((e) => [
    e.label + (e.active ? "" : " (off)"), `${e.operator}${e.band ? `, ${e.band}` : ""}`, `${e.frequencyMHz}`, `${e.powerPerCarrierW} W × ${e.carriers}`,
    `${e.lossDb} dB, ${e.gainDbi.toFixed(1)} dBi`, `${e.azimuthDeg}°, ${e.mechanicalTiltDeg + e.electricalTiltDeg}°`, `${e.position.x}, ${e.position.y}, ${e.position.z}`, eirp.has(e.id) ? wattsText(eirp.get(e.id)!) : "—",
  ]));

  // 3. Method.
  heading(doc, "3. Method, models and assumptions");
  bullets(doc, methodLines(a));
  heading(doc, "Published sources", 2);
  bullets(doc, METHOD_SOURCES, { size: 8.5 });

  // 4–6. Results.
  reportResults(doc, a, labels);

  // 7. Readings.
  heading(doc, "7. Readings against predictions");
  const readings = readingRows(a, src.readings);
  if (readings.length === 0) paragraph(doc, "No field readings were recorded at this site before the assessment.");
  else {
    const above = readings.filter((r) => r.above);
    paragraph(doc, above.length ? `${above.length} reading${above.length === 1 ? " is" : "s are"} above the prediction at its own point and height (marked ABOVE): there the prediction is not conservative, and the engineer must account for the difference before relying on the prediction at that place.` : "Every reading is at or below the prediction at its own point and height.", { color: above.length ? C.danger : C.ink, weight: above.length ? "bold" : "regular" });
    table(doc, [{ header: "Reading", width: 1.6 }, { header: "Where (x, y, h)", width: 1.8 }, { header: "As read", width: 1.6, align: "right" }, { header: "Reading, % of limit", width: 1.5, align: "right" }, { header: "Predicted", width: 1.3, align: "right" }, { header: "", width: 1 }],
      readings.map((r) => [`${r.label} (${r.visitedOn})`, `${r.x}, ${r.y}, ${r.heightM} m`, `${r.value} ${r.unit}`, r.percent === null ? "—" : percentText(r.percent), percentText(r.predicted), r.above ? "ABOVE" : ""]));
    paragraph(doc, "Each reading is compared with the prediction at its own point and height (its surface's level plus the height it was taken at), not with the mapped values, which are taken over the heights assessed. A reading in % of a standard is compared as such when it names this standard and tier; a reading with a frequency is taken against the limit there; a broadband reading is compared as power density with the predicted total, and shown in % of the limit at the predicted mix of frequencies. \"—\": the reading cannot be put in these terms.", { size: 8, color: C.graphite });
  }

  // 8. Mitigation.
  heading(doc, "8. Mitigation plan");
  const plan = a.mitigation;
  for (const category of [...SIGN_CATEGORIES].reverse()) {
    const signs = plan.signs.filter((s) => s.category === category);
    if (!signs.length) continue;
    heading(doc, `${signLabels[category]} signs (${signs.length})`, 2);
    bullets(doc, signs.map((s) => `${s.where} (x ${s.x}, y ${s.y})${s.note ? `: ${s.note}` : ""}`), { size: 9 });
  }
  if (!plan.signs.length) paragraph(doc, "No signs are needed.");
  heading(doc, "Barriers", 2);
  if (plan.barriers.length) bullets(doc, plan.barriers.map((b) => `${a.inventory.surfaces.find((s) => s.id === b.surfaceId)?.name ?? "Surface"}: along the ${b.boundary === "general" ? "general-population" : "occupational"} 100 % line, ${metresText(b.lengthM)}${b.note ? ` (${b.note})` : ""}`), { size: 9 });
  else paragraph(doc, "No barriers are needed.");
  heading(doc, "Power-down before work", 2);
  if (plan.zones.length) {
    for (const z of plan.zones) {
      const list = (entries: { id: string; maxPercent: number }[]) => entries.length ? entries.map((e) => `${labels.get(e.id) ?? e.id} (${percentText(e.maxPercent)})`).join(", ") : "none";
      bullets(doc, [`${z.surfaceName}, zone of ${areaText(z.areaM2)} (up to class ${z.worstClass}): for the public, switch off ${list(z.powerDown.general)}; for trained workers, ${list(z.powerDown.occupational)}.`], { size: 9 });
    }
  } else paragraph(doc, "No zone needs a power-down.");
  if (plan.notes) paragraph(doc, `Engineer's notes: ${plan.notes}`);

  heading(doc, "9. Cautions and sign-off");
  cautionsBox(doc);
  ensureSpace(doc, 70);
  const y = doc.y + 10;
  say(doc, `Prepared by ${src.authorName}`, { x: PAGE.margin, y, size: 9.5 });
  say(doc, src.reviewerName ? `Reviewed and issued by ${src.reviewerName}${src.issuedAt ? ` on ${dateText(src.issuedAt)}` : ""}` : "Not yet reviewed: this draft must not be relied on.", { x: PAGE.margin + contentWidth / 2, y, size: 9.5, width: contentWidth / 2 });
  return finish();
}
