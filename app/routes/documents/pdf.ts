// GET /documents/:documentId/pdf: the stored PDF of a document in the member's scope (a client
// member: issued documents of its own client only). An issued PDF is the same bytes every time.
import { requireMember } from "~/features/auth/guard.server";
import { documentPdf, pdfFileName } from "~/features/documents/documents.server";
import { scopeOf } from "~/features/sites/scope.server";
import { DomainError } from "~/lib/domain-error";
import type { Route } from "./+types/pdf";

const readers = ["owner", "engineer", "reviewer", "billing", "client"] as const;

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: readers });
  try {
    const { doc, pdf, sha256 } = await documentPdf(scopeOf(member), params.documentId);
    return pdfResponse(pdf, sha256, pdfFileName(doc));
  } catch (error) {
    if (error instanceof DomainError) return new Response(error.message, { status: error.status, headers: { "content-type": "text/plain; charset=utf-8" } });
    throw error;
  }
}

export function pdfResponse(pdf: Buffer, sha256: string, name: string) {
  return new Response(new Uint8Array(pdf), {
    headers: { "content-type": "application/pdf", "content-length": String(pdf.length), "content-disposition": `attachment; filename="${name}"`, etag: `"${sha256}"`, "cache-control": "private, no-cache" },
  });
}
