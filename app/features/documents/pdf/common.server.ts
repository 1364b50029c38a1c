// Pieces every document shares: the RF cautions (DESIGN.md §5), the exposure classes' words,
// the emitters' names and the sources the method follows.
import { standardLabels, tierLabels } from "~/features/exposure/options";
import type { StandardId, Tier } from "~/engine/limits";
import { pdfColours as C } from "~/infra/pdf/palette";
import { contentWidth, ensureSpace, PAGE, say, type Doc } from "~/infra/pdf/pdf.server";
import type { SourceAssessment } from "./source";

export const RF_CAUTIONS = [
  "Predictions are conservative estimates under stated assumptions, not measurements.",
  "People with medical implants may need lower exposure than the published limits.",
  "Stay out of the main beam of any antenna; follow the site's RF safety plan, signage and lock-out procedures.",
  "Local codes and the judgement of a licensed professional prevail over anything in this document.",
];

export const standardText = (a: Pick<SourceAssessment, "standard" | "tier">) => `${standardLabels[a.standard as StandardId] ?? a.standard}, ${tierLabels[a.standard as StandardId]?.[a.tier as Tier] ?? a.tier}`;

/** The sources the computation follows (shared/REFERENCES.md, app/engine/README.md). */
export const METHOD_SOURCES = [
  "47 CFR §1.1310(e), Table 1: FCC maximum permissible exposure limits.",
  "ICNIRP 2020 (Health Physics 118(5)), Table 5; ICNIRP 1998 (Health Physics 74(4)), Tables 6 and 7.",
  "IEEE C95.1-2019 whole-body exposure reference levels; Health Canada Safety Code 6 (2015), Tables 5 and 6.",
  "FCC OET Bulletin 65, Edition 97-01: far-field S = P·G/(4πR²), the 2.56 ground-reflection factor, the cylindrical near-field model.",
  "IEC 62232: near-field models for panel arrays; the actual-maximum power and TDD duty factors.",
  "47 CFR §1.1307(b)(2) and (b)(4): exposure categories and the INFORMATION, NOTICE, CAUTION and WARNING signs; 29 CFR 1910.145 for their design.",
  "3GPP TR 38.901 §7.3 and ITU-R F.1336: parametric antenna patterns where no measured pattern was supplied.",
];

/** Engine emitter id → the inventory's label. */
export function emitterLabels(a: SourceAssessment): Map<string, string> {
  const byInventory = new Map(a.inventory.emitters.map((e) => [e.id, e.label]));
  return new Map(a.results.emitters.map((e) => [e.id, byInventory.get(e.inventoryId) ?? e.label]));
}

export function cautionsBox(doc: Doc, title = "RF safety") {
  const lines = RF_CAUTIONS;
  const h = 26 + lines.length * 13 + 8;
  ensureSpace(doc, h + 10);
  const y = doc.y;
  doc.rect(PAGE.margin, y, contentWidth, h).fillColor(C.cautionTint).fill();
  for (let k = 0; k < h; k += 6) doc.moveTo(PAGE.margin, y + k).lineTo(PAGE.margin + 6, y + Math.min(h, k + 6)).lineWidth(1.2).strokeColor(C.cautionHatch).stroke();
  doc.polygon([PAGE.margin + 21, y + 8], [PAGE.margin + 27, y + 18], [PAGE.margin + 15, y + 18]).lineWidth(1.2).strokeColor(C.caution).stroke();
  say(doc, "!", { x: PAGE.margin + 19.6, y: y + 9.5, weight: "bold", size: 7, color: C.caution, lineBreak: false });
  say(doc, title, { x: PAGE.margin + 32, y: y + 8, weight: "bold", size: 10, color: C.caution });
  let ly = y + 24;
  for (const line of lines) {
    say(doc, `• ${line}`, { x: PAGE.margin + 16, y: ly, size: 8.5, width: contentWidth - 26 });
    ly += 13;
  }
  doc.x = PAGE.margin;
  doc.y = y + h + 8;
}
