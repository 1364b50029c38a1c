// /portal/invoices/:invoiceId: one of the client's invoices; "Pay" opens a Checkout Session and
// sends the browser to the payment page. Back with ?paid=1 the page polls (fetcher) until the
// webhook has recorded the payment; with ?cancelled=1 it says nothing was charged.
import { data, Form, redirect, useLocation, useNavigation } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { DateText } from "~/components/date-text";
import { FormErrors } from "~/components/field";
import { Card, Notice, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { InvoiceStateTag, replyErrors } from "~/features/billing/billing-nav";
import { checkoutForInvoice } from "~/features/billing/checkout.server";
import { invoiceNumberText, requireInvoice } from "~/features/billing/invoices.server";
import { formatMoney } from "~/features/billing/money";
import { usePoll } from "~/features/billing/use-poll";
import { DomainError } from "~/lib/domain-error";
import type { Route } from "./+types/invoice";

export const meta: Route.MetaFunction = () => [{ title: "Invoice · Isotrope" }];

async function load(args: Route.LoaderArgs | Route.ActionArgs) {
  const member = await requireMember(args, { roles: ["client"] });
  try {
    return { member, invoice: await requireInvoice({ organizationId: member.organizationId, clientId: member.clientId, role: member.role }, args.params.invoiceId) };
  } catch (error) {
    if (error instanceof DomainError) throw data({ message: error.message }, { status: error.status });
    throw error;
  }
}

export async function loader(args: Route.LoaderArgs) {
  const { invoice: inv } = await load(args);
  return { invoice: { id: inv.id, number: invoiceNumberText(inv.number), state: inv.state, total: inv.total, amountPaid: inv.amountPaid, amountRefunded: inv.amountRefunded, currency: inv.currency, issuedAt: inv.issuedAt, paidAt: inv.paidAt, lines: inv.lines.map((l) => ({ id: l.id, description: l.description, amount: l.amount })) } };
}

export async function action(args: Route.ActionArgs) {
  const { member } = await load(args);
  try {
    const url = await checkoutForInvoice({ organizationId: member.organizationId, clientId: member.clientId, role: member.role, userId: member.user.id, email: member.user.email }, args.params.invoiceId);
    return redirect(url);
  } catch (error) {
    if (error instanceof DomainError) return data({ error: { "": [error.message] } }, { status: error.status });
    throw error;
  }
}

export default function PortalInvoice({ loaderData, actionData }: Route.ComponentProps) {
  const search = new URLSearchParams(useLocation().search);
  const returned = search.get("paid") === "1";
  const cancelled = search.get("cancelled") === "1";
  const poll = usePoll<typeof loaderData>(`/portal/invoices/${loaderData.invoice.id}`, (d) => returned && (d ?? loaderData).invoice.state === "open");
  const inv = (poll.data ?? loaderData).invoice;
  const busy = useNavigation().state !== "idle";
  const money = (n: number) => formatMoney(n, inv.currency);
  return (
    <>
      <PageHeader label="Invoice" title={inv.number} actions={<ButtonLink to={`/billing/invoices/${inv.id}/pdf`} reloadDocument>Invoice PDF</ButtonLink>}>
        <InvoiceStateTag state={inv.state} />
      </PageHeader>
      <div className="space-y-6">
        {returned && inv.state === "open" ? (
          <Notice state="info" role="status">{poll.gaveUp ? "The payment service has not confirmed the payment yet. Reload this page in a minute; you were not charged twice." : "Thank you. Waiting for the payment service to confirm the payment…"}</Notice>
        ) : null}
        {returned && inv.state !== "open" ? <Notice state="ok" role="status">Payment received: this invoice is paid. A receipt comes from the payment service.</Notice> : null}
        {cancelled && inv.state === "open" ? <Notice state="caution" role="status">The payment was not completed (cancelled, or the card was declined). Nothing was charged.</Notice> : null}
        <FormErrors errors={replyErrors(actionData).form} />
        <Card title="Lines">
          <ul className="divide-y divide-rule text-sm">
            {inv.lines.map((l) => <li key={l.id} className="flex justify-between gap-4 py-2"><span>{l.description}</span><span className="figures">{money(l.amount)}</span></li>)}
            <li className="flex justify-between gap-4 py-2 font-bold"><span>Total (no tax computed)</span><span className="figures">{money(inv.total)}</span></li>
          </ul>
          <p className="mt-3 text-sm text-graphite-600">Issued {inv.issuedAt ? <DateText value={inv.issuedAt} /> : "—"}{inv.amountRefunded ? <> · refunded <span className="figures">{money(inv.amountRefunded)}</span></> : null}</p>
          {inv.state === "open" ? (
            <Form method="post" className="mt-5">
              <Button disabled={busy}>Pay {money(inv.total)} by card</Button>
            </Form>
          ) : null}
        </Card>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
