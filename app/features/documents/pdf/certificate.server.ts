// The certificate: the site, standard and tier, issue and expiry dates, the issuer, the
// verification code and a QR code (the `qrcode` package) linking to the public verification page,
// drawn as vector squares from the QR matrix.
import QRCode from "qrcode";
import { pdfColours as C } from "~/infra/pdf/palette";
import { contentWidth, createPdf, drawMark, PAGE, say, type Doc } from "~/infra/pdf/pdf.server";
import { dateText, percentText } from "../format";
import { standardText } from "./common.server";
import { documentTitles, type DocumentSource } from "./source";

function drawQr(doc: Doc, text: string, x: number, y: number, size: number) {
  const qr = QRCode.create(text, { errorCorrectionLevel: "M" });
  const n = qr.modules.size;
  const cell = size / (n + 8);
  doc.rect(x, y, size, size).fillColor("#ffffff").fill();
  doc.fillColor(C.ink);
  for (let r = 0; r < n; r++) for (let c = 0; c < n; c++) if (qr.modules.get(r, c)) doc.rect(x + (c + 4) * cell, y + (r + 4) * cell, cell + 0.02, cell + 0.02);
  doc.fill();
}

export async function renderCertificate(src: DocumentSource): Promise<Buffer> {
  const a = src.assessment;
  const site = a.site.site;
  const { doc, finish } = createPdf({ title: documentTitles.certificate, subtitle: site.name, version: src.version, code: src.code, draft: src.draft, producedAt: src.issuedAt ?? src.createdAt });
  const frame = 30;
  doc.rect(frame, frame + 28, PAGE.width - 2 * frame, PAGE.height - 2 * frame - 56).lineWidth(2).strokeColor(C.ink).stroke();
  doc.rect(frame + 5, frame + 33, PAGE.width - 2 * frame - 10, PAGE.height - 2 * frame - 66).lineWidth(0.5).strokeColor(C.flag).stroke();
  drawMark(doc, PAGE.width / 2 - 22, 110, 44);
  say(doc, "RF COMPLIANCE CERTIFICATE", { x: PAGE.margin, y: 170, width: contentWidth, align: "center", size: 20, weight: "bold", characterSpacing: 1.5 });
  say(doc, "This certifies that the radio-frequency exposure at", { x: PAGE.margin, y: 210, width: contentWidth, align: "center", size: 11, color: C.graphite });
  say(doc, site.name, { x: PAGE.margin, y: 232, width: contentWidth, align: "center", size: 22, weight: "bold" });
  say(doc, [site.address, site.city].filter(Boolean).join(", "), { x: PAGE.margin, y: doc.y + 2, width: contentWidth, align: "center", size: 11 });
  const overGeneral = a.results.surfaces.some((s) => s.worstClass > 0);
  say(doc, overGeneral
    ? `was assessed against the ${standardText(a)} limit. Areas above the limit are confined to places closed to the public and are controlled by the site's mitigation plan (signs, locks and power-down procedures), which is in force.`
    : `was assessed against the ${standardText(a)} limit and is within it everywhere assessed (at most ${percentText(a.summary.worstPercent)} of it).`,
    { x: PAGE.margin + 40, y: doc.y + 14, width: contentWidth - 80, align: "center", size: 11 });
  const rows: [string, string][] = [
    ["Standard and tier", standardText(a)],
    ["Assessment", `${a.name} (${dateText(a.createdAt)})`],
    ["Issued", src.issuedAt ? dateText(src.issuedAt) : "Not issued (draft)"],
    ["Valid until", src.expiresAt ? dateText(src.expiresAt) : "One year from issue"],
    ["Issued by", `${src.reviewerName ?? "(reviewer)"} for ${src.organizationName}`],
    ["Engineer", src.authorName],
    ["Verification code", src.code],
  ];
  let y = 420;
  for (const [k, v] of rows) {
    say(doc, k.toUpperCase(), { x: PAGE.margin + 30, y, size: 7.5, weight: "bold", color: C.graphite, characterSpacing: 0.6 });
    say(doc, v, { x: PAGE.margin + 150, y: y - 1.5, size: 10.5, width: 190 });
    y = Math.max(doc.y, y + 14) + 8;
  }
  const qrSize = 130;
  drawQr(doc, src.verifyUrl, PAGE.width - PAGE.margin - 30 - qrSize, 410, qrSize);
  say(doc, "Scan to check this certificate", { x: PAGE.width - PAGE.margin - 30 - qrSize, y: 410 + qrSize + 4, width: qrSize, align: "center", size: 8, color: C.graphite });
  say(doc, src.verifyUrl, { x: PAGE.margin + 30, y: 680, width: contentWidth - 60, align: "center", size: 9, color: C.flag });
  say(doc, "Check the certificate's status at this address: a superseded, withdrawn or expired certificate says so there. Predictions are conservative estimates under stated assumptions, not measurements; local codes and the judgement of a licensed professional prevail.", { x: PAGE.margin + 30, y: 700, width: contentWidth - 60, align: "center", size: 8, color: C.graphite });
  return finish();
}
