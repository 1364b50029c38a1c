// GET /api/v1/documents/:id/pdf → application/pdf (the stored bytes; issued ones never change).
// 409 while the PDF is still being made; another organisation's id (or for a client another
// client's, or an unissued one) is 404.
import { requireApiMember } from "~/features/auth/guard.server";
import { documentPdf, pdfFileName } from "~/features/documents/documents.server";
import { scopeOf } from "~/features/sites/scope.server";
import { api } from "~/lib/api.server";
import { pdfResponse } from "~/routes/documents/pdf";
import type { Route } from "./+types/document-pdf";
import { documentReaders } from "./documents";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: documentReaders });
  return api(async () => {
    const { doc, pdf, sha256 } = await documentPdf(scopeOf(member), params.documentId);
    return pdfResponse(pdf, sha256, pdfFileName(doc));
  });
}
