// GET /api/v1/payments?state=&purpose=&clientId=&from=&to=[&format=csv] → { payments: [{ id, clientId, clientName, purpose,
// invoiceId, invoiceNumber, amount, amountRefunded, currency, state, paidAt, stripePaymentIntentId }] }, or the payments CSV.
// Billing and owner only (clients and the rest: 403).
import { requireApiMember } from "~/features/auth/guard.server";
import { paymentJson, paymentsCsv } from "~/features/billing/json";
import { listPayments } from "~/features/billing/payments.server";
import { paymentFilterSchema } from "~/features/billing/schemas";
import type { Route } from "./+types/payments";

export const paymentReaders = ["owner", "billing"] as const;

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: paymentReaders });
  const params = new URL(request.url).searchParams;
  const filter = paymentFilterSchema.parse(Object.fromEntries(params));
  const rows = (await listPayments(member.organizationId, filter)).map((r) => paymentJson(r.payment, r.clientName, r.invoiceNumber));
  if (params.get("format") === "csv") {
    return new Response(paymentsCsv(rows), { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": 'attachment; filename="payments.csv"' } });
  }
  return Response.json({ payments: rows });
}
