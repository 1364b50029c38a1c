// One entry for the render job: the document's kind picks its PDF.
import { renderCertificate } from "./certificate.server";
import { renderLetter } from "./letter.server";
import { renderReport } from "./report.server";
import type { DocumentSource } from "./source";

export function renderPdf(src: DocumentSource): Promise<Buffer> {
  if (src.kind === "report") return renderReport(src);
  if (src.kind === "letter") return renderLetter(src);
  return renderCertificate(src);
}
