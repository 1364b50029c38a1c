// GET /billing/invoices/:invoiceId/pdf: the invoice as a PDF, for billing and owner, and for a
// client member of the invoice's client (issued invoices only; others' are 404).
import { data } from "react-router";
import { requireMember } from "~/features/auth/guard.server";
import { invoiceNumberText, requireInvoice } from "~/features/billing/invoices.server";
import { renderInvoicePdf } from "~/features/billing/invoice-pdf.server";
import { DomainError } from "~/lib/domain-error";
import type { Route } from "./+types/invoice-pdf";

export async function loader({ request, context, params }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: ["owner", "billing", "client"] });
  try {
    const inv = await requireInvoice({ organizationId: member.organizationId, clientId: member.clientId, role: member.role }, params.invoiceId);
    const pdf = await renderInvoicePdf(inv);
    return new Response(new Uint8Array(pdf), { headers: { "content-type": "application/pdf", "content-disposition": `inline; filename="invoice-${invoiceNumberText(inv.number)}.pdf"`, "cache-control": "private, no-store" } });
  } catch (error) {
    if (error instanceof DomainError) throw data({ message: error.message }, { status: error.status });
    throw error;
  }
}
