// The invoice as a PDF (pdfkit, the documents' fonts and page furniture from app/infra/pdf): who
// bills whom, the lines, the total, what has been paid and refunded, and that no tax is computed.
import { eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { pdfColours as C } from "~/infra/pdf/palette";
import { contentWidth, createPdf, PAGE, paragraph, say } from "~/infra/pdf/pdf.server";
import { table } from "~/infra/pdf/table.server";
import { formatDate } from "~/lib/dates";
import { invoiceStateLabels } from "./invoice-state";
import { invoiceNumberText, type requireInvoice } from "./invoices.server";
import { formatMoney } from "./money";

type Invoice = Awaited<ReturnType<typeof requireInvoice>>;

export async function renderInvoicePdf(inv: Invoice): Promise<Buffer> {
  const [org] = await db.select({ name: schema.organization.name }).from(schema.organization).where(eq(schema.organization.id, inv.organizationId));
  const number = invoiceNumberText(inv.number);
  const { doc, finish } = createPdf({ title: `Invoice ${number}`, subtitle: inv.client.name, version: 1, code: number, footer: `Invoice ${number} · ${inv.client.name}`, draft: inv.state === "draft", producedAt: inv.issuedAt ?? inv.createdAt });
  const money = (n: number) => formatMoney(n, inv.currency);
  say(doc, `Invoice ${number}`, { x: PAGE.margin, y: PAGE.top + 6, weight: "bold", size: 22 });
  doc.moveDown(0.3);
  say(doc, `State: ${invoiceStateLabels[inv.state]}`, { x: PAGE.margin, y: doc.y, size: 10, color: C.graphite });
  const top = doc.y + 16;
  const half = contentWidth / 2 - 10;
  say(doc, "FROM", { x: PAGE.margin, y: top, size: 8, weight: "bold", color: C.graphite });
  say(doc, org?.name ?? "", { x: PAGE.margin, y: top + 12, width: half, size: 11, weight: "bold" });
  say(doc, "BILL TO", { x: PAGE.margin + half + 20, y: top, size: 8, weight: "bold", color: C.graphite });
  say(doc, inv.client.name, { x: PAGE.margin + half + 20, y: top + 12, width: half, size: 11, weight: "bold" });
  if (inv.client.billingAddress) say(doc, inv.client.billingAddress, { x: PAGE.margin + half + 20, y: doc.y + 2, width: half, size: 10 });
  doc.x = PAGE.margin;
  doc.y = Math.max(doc.y, top + 40) + 14;
  const dates = [`Issued: ${inv.issuedAt ? formatDate(inv.issuedAt) : "not yet issued"}`, `Currency: ${inv.currency.toUpperCase()}`, ...(inv.paidAt ? [`Paid: ${formatDate(inv.paidAt)}`] : []), ...(inv.voidedAt ? [`Voided: ${formatDate(inv.voidedAt)}`] : [])];
  paragraph(doc, dates.join("   ·   "), { size: 9.5, color: C.graphite });
  doc.moveDown(0.5);
  table(
    doc,
    [{ header: "#", width: 24 }, { header: "Description", width: 300 }, { header: "Qty", width: 40, align: "right" }, { header: "Unit", width: 80, align: "right" }, { header: "Amount", width: 90, align: "right" }],
    inv.lines.map((l) => [String(l.position), l.description, String(l.quantity), money(l.unitAmount), money(l.amount)]),
    { size: 9.5 },
  );
  const rows: [string, string, boolean][] = [
    ["Total", money(inv.total), true],
    ...(inv.amountPaid ? ([["Paid", money(inv.amountPaid), false]] as [string, string, boolean][]) : []),
    ...(inv.amountRefunded ? ([["Refunded", money(inv.amountRefunded), false]] as [string, string, boolean][]) : []),
    ["Due", money(inv.state === "open" ? inv.total - inv.amountPaid : 0), true],
  ];
  for (const [label, value, bold] of rows) {
    const y = doc.y;
    say(doc, label, { x: PAGE.width - PAGE.margin - 220, y, width: 110, size: 10.5, weight: bold ? "bold" : "regular" });
    say(doc, value, { x: PAGE.width - PAGE.margin - 110, y, width: 110, size: 10.5, align: "right", weight: bold ? "bold" : "regular" });
    doc.y = y + 17;
  }
  doc.x = PAGE.margin;
  doc.moveDown(1);
  paragraph(doc, "No tax has been computed on this invoice: amounts are shown as agreed, without VAT or sales tax.", { size: 9.5, color: C.graphite });
  if (inv.state === "open") paragraph(doc, "Pay by card through the link in the e-mail that brought this invoice, or from your portal's Invoices page.", { size: 9.5, color: C.graphite });
  if (inv.notes) paragraph(doc, inv.notes, { size: 9.5 });
  return finish();
}
