// GET /api/v1/invoices?state=&clientId= → { invoices: [{ id, number, clientId, clientName, state, currency, total, amountPaid, amountRefunded, issuedAt, paidAt, voidedAt, createdAt }] }
// Billing and owner see the organisation's; a client member its own client's issued invoices; others 403.
import { z } from "zod";
import { requireApiMember } from "~/features/auth/guard.server";
import { listInvoices } from "~/features/billing/invoices.server";
import { invoiceJson } from "~/features/billing/json";
import { invoiceStates } from "~/infra/db/schema/billing";
import { apiError, zodFieldErrors } from "~/lib/api.server";
import { recordId } from "~/lib/fields";
import type { Route } from "./+types/invoices";

export const invoiceReaders = ["owner", "billing", "client"] as const;
const query = z.strictObject({ state: z.enum(invoiceStates).optional(), clientId: recordId.optional() });

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: invoiceReaders });
  const parsed = query.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) return apiError(400, "Some query parameters are not valid.", zodFieldErrors(parsed.error));
  const rows = await listInvoices({ organizationId: member.organizationId, clientId: member.clientId, role: member.role }, parsed.data);
  return Response.json({ invoices: rows.map((r) => invoiceJson(r.invoice, r.clientName)) });
}
