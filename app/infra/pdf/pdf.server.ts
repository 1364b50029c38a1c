// pdfkit set up for Isotrope's documents: A4, our fonts (fonts.server.ts), text that picks its face
// per run so every glyph renders, and the page furniture drawn on every page at the end: our mark
// and the document's title at the top; version, verification code and "page i of n" at the foot;
// a DRAFT mark across unissued documents.
import PDFDocument from "pdfkit";
import { fontName, fontRuns, primaryFont, registerFonts, type Weight } from "./fonts.server";
import { pdfColours as C } from "./palette";

export type PdfMeta = {
  title: string;
  subtitle: string;
  version: number;
  code: string;
  draft: boolean;
  producedAt: Date;
  /** The foot's left line in place of "Version n · verification code …" (an invoice has neither). */
  footer?: string;
};
export type Doc = PDFKit.PDFDocument;
export const PAGE = { width: 595.28, height: 841.89, margin: 50, top: 70, bottom: 62 };
export const contentWidth = PAGE.width - 2 * PAGE.margin;

export function createPdf(meta: PdfMeta) {
  const doc = new PDFDocument({
    size: "A4",
    bufferPages: true,
    font: primaryFont() as unknown as string,
    margins: { top: PAGE.top, bottom: PAGE.bottom, left: PAGE.margin, right: PAGE.margin },
    info: { Title: `${meta.title}: ${meta.subtitle}`, Author: "Isotrope", Subject: meta.title, Creator: "Isotrope", Producer: "Isotrope (pdfkit)", CreationDate: meta.producedAt, ModDate: meta.producedAt },
  });
  registerFonts(doc);
  doc.font(fontName("regular")).fillColor(C.ink);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  return {
    doc,
    async finish(): Promise<Buffer> {
      furniture(doc, meta);
      doc.end();
      return done;
    },
  };
}

export type TextOptions = PDFKit.Mixins.TextOptions & { weight?: Weight; size?: number; color?: string };

/** Writes text, each run in the face that has its glyphs. With x and y it starts there; otherwise it flows on. */
export function say(doc: Doc, text: string, opts: TextOptions & { x?: number; y?: number } = {}) {
  const { weight = "regular", size = 10, color = C.ink, x, y, ...rest } = opts;
  doc.fontSize(size).fillColor(color);
  const runs = fontRuns(text, weight);
  if (runs.length === 0) runs.push({ font: fontName(weight), text: "" });
  runs.forEach((run, i) => {
    doc.font(run.font);
    const o = { lineGap: 1.5, ...rest, continued: i < runs.length - 1 };
    if (i === 0 && x !== undefined && y !== undefined) doc.text(run.text, x, y, o);
    else doc.text(run.text, o);
  });
  doc.font(fontName("regular"));
}

/** The height the text will take in a width (set in the primary face: close enough for layout). */
export function heightOf(doc: Doc, text: string, width: number, size = 10, weight: Weight = "regular") {
  doc.font(fontName(weight)).fontSize(size);
  return doc.heightOfString(text, { width, lineGap: 1.5 });
}

/** Starts a new page when less than `needed` points are left. */
export function ensureSpace(doc: Doc, needed: number) {
  if (doc.y + needed > PAGE.height - PAGE.bottom) doc.addPage();
}

export function heading(doc: Doc, text: string, level: 1 | 2 = 1) {
  ensureSpace(doc, level === 1 ? 90 : 80);
  doc.moveDown(level === 1 ? 0.8 : 0.5);
  say(doc, text, { x: PAGE.margin, y: doc.y, weight: "bold", size: level === 1 ? 15 : 11.5 });
  if (level === 1) {
    doc.moveTo(PAGE.margin, doc.y + 2).lineTo(PAGE.margin + 36, doc.y + 2).lineWidth(2).strokeColor(C.flag).stroke();
    doc.moveDown(0.6);
  } else doc.moveDown(0.25);
}

export function paragraph(doc: Doc, text: string, opts: TextOptions = {}) {
  ensureSpace(doc, 30);
  say(doc, text, { x: PAGE.margin, y: doc.y, width: contentWidth, ...opts });
  doc.moveDown(0.4);
}

export function bullets(doc: Doc, items: string[], opts: TextOptions = {}) {
  for (const item of items) {
    ensureSpace(doc, 24);
    const y = doc.y;
    doc.circle(PAGE.margin + 4, y + 6, 1.6).fillColor(opts.color ?? C.ink).fill();
    say(doc, item, { x: PAGE.margin + 14, y, width: contentWidth - 14, ...opts });
    doc.moveDown(0.25);
  }
}

/** Isotrope's mark: a directional antenna's polar pattern on a plan's crosshair, on an ink tile. */
export function drawMark(doc: Doc, x: number, y: number, size: number) {
  const s = size / 32;
  doc.save().translate(x, y).scale(s);
  doc.roundedRect(0, 0, 32, 32, 3).fillColor(C.ink).fill();
  doc.moveTo(16, 3).lineTo(16, 29).moveTo(3, 16).lineTo(29, 16).lineWidth(1).strokeColor(C.paper).strokeOpacity(0.45).stroke();
  doc.strokeOpacity(1);
  doc.save().translate(16, 16).rotate(-40);
  doc.path("M0 0C2.6-5 9.6-5.6 13.2 0C9.6 5.6 2.6 5 0 0Z").lineWidth(1.8).fillColor(C.markLobe).fillOpacity(0.28).fillAndStroke(C.markLobe, C.markLobe);
  doc.fillOpacity(1);
  doc.path("M0 0C-.9-1.9-2.8-1.9-3.6 0C-2.8 1.9-.9 1.9 0 0Z").lineWidth(1.4).strokeColor(C.markLobe).stroke();
  doc.restore();
  doc.circle(16, 16, 1.8).fillColor(C.paper).fill();
  doc.restore();
}

function furniture(doc: Doc, meta: PdfMeta) {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    drawMark(doc, PAGE.margin, 26, 18);
    say(doc, "Isotrope", { x: PAGE.margin + 24, y: 29, weight: "bold", size: 10.5, lineBreak: false });
    say(doc, `${meta.title} · ${meta.subtitle}`, { x: PAGE.margin + 90, y: 30.5, size: 8.5, color: C.graphite, width: contentWidth - 90, align: "right", lineBreak: false, ellipsis: true });
    doc.moveTo(PAGE.margin, 50).lineTo(PAGE.width - PAGE.margin, 50).lineWidth(0.5).strokeColor(C.rule).stroke();
    const footY = PAGE.height - 40;
    doc.moveTo(PAGE.margin, footY - 8).lineTo(PAGE.width - PAGE.margin, footY - 8).lineWidth(0.5).strokeColor(C.rule).stroke();
    say(doc, `${meta.footer ?? `Version ${meta.version} · verification code ${meta.code}`}${meta.draft ? " · DRAFT, not issued" : ""}`, { x: PAGE.margin, y: footY, size: 8, color: C.graphite, lineBreak: false });
    say(doc, `Page ${i - range.start + 1} of ${range.count}`, { x: PAGE.margin, y: footY, size: 8, color: C.graphite, width: contentWidth, align: "right", lineBreak: false });
    if (meta.draft) {
      doc.save().rotate(-35, { origin: [PAGE.width / 2, PAGE.height / 2] });
      say(doc, "DRAFT", { x: PAGE.width / 2 - 160, y: PAGE.height / 2 - 50, size: 110, weight: "bold", color: C.rule, width: 320, align: "center", lineBreak: false });
      doc.restore();
    }
    doc.page.margins.bottom = bottom;
  }
}
