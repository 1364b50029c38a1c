// A plain table for pdfkit: a header row (repeated after a page break), hairlines between rows,
// figures aligned right. Cells wrap within their column.
import { pdfColours as C } from "./palette";
import { ensureSpace, heightOf, PAGE, say, type Doc } from "./pdf.server";

export type Column = { header: string; width: number; align?: "left" | "right" };

export function table(doc: Doc, columns: Column[], rows: string[][], opts: { size?: number } = {}) {
  const size = opts.size ?? 8.5;
  const total = columns.reduce((a, c) => a + c.width, 0);
  const scale = (PAGE.width - 2 * PAGE.margin) / total;
  const cols = columns.map((c) => ({ ...c, width: c.width * scale }));
  const pad = 3;
  const rowHeight = (cells: string[], weight: "regular" | "bold") => Math.max(...cells.map((t, i) => heightOf(doc, t, cols[i].width - 2 * pad, size, weight))) + 2 * pad;
  const drawRow = (cells: string[], weight: "regular" | "bold") => {
    const h = rowHeight(cells, weight);
    const y = doc.y;
    let x = PAGE.margin;
    if (weight === "bold") doc.rect(PAGE.margin, y, PAGE.width - 2 * PAGE.margin, h).fillColor(C.paperDeep).fill();
    cells.forEach((t, i) => {
      say(doc, t, { x: x + pad, y: y + pad, width: cols[i].width - 2 * pad, size, weight, align: cols[i].align ?? "left" });
      x += cols[i].width;
    });
    doc.moveTo(PAGE.margin, y + h).lineTo(PAGE.width - PAGE.margin, y + h).lineWidth(0.4).strokeColor(C.rule).stroke();
    doc.x = PAGE.margin;
    doc.y = y + h;
  };
  const header = cols.map((c) => c.header);
  ensureSpace(doc, rowHeight(header, "bold") + 20);
  drawRow(header, "bold");
  for (const row of rows) {
    const h = rowHeight(row, "regular");
    if (doc.y + h > PAGE.height - PAGE.bottom) {
      doc.addPage();
      drawRow(header, "bold");
    }
    drawRow(row, "regular");
  }
  doc.moveDown(0.6);
}
