// /billing/invoices/:invoiceId: one invoice (lines, state, payments with their refunds); issue and
// send or discard a draft, send again, void while unpaid, refund all or part of a payment.
import { data, Form, useNavigation } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { DateText } from "~/components/date-text";
import { Field, FormErrors } from "~/components/field";
import { Card, Notice, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { BillingTabs, InvoiceStateTag, replyErrors } from "~/features/billing/billing-nav";
import { canVoid } from "~/features/billing/invoice-state";
import { discardDraft, issueInvoice, requireInvoice, resendInvoice, voidInvoice } from "~/features/billing/invoices.server";
import { invoiceNumberText } from "~/features/billing/json";
import { decimalOf, formatMoney } from "~/features/billing/money";
import { paymentsOfInvoice, refundsOf } from "~/features/billing/payments.server";
import { refundPayment } from "~/features/billing/refunds.server";
import { invoiceActionSchema, refundSchema } from "~/features/billing/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import { DomainError, domainErrorReply } from "~/lib/domain-error";
import { parseForm, readFormData } from "~/lib/form.server";
import type { Route } from "./+types/invoice";

const billingRoles = ["owner", "billing"] as const;
export const meta: Route.MetaFunction = ({ data }) => [{ title: `Invoice ${data ? invoiceNumberText(data.invoice.number) : ""} · Isotrope` }];

export async function loader({ request, context, params }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  let invoice;
  try {
    invoice = await requireInvoice({ organizationId: member.organizationId, clientId: null, role: member.role }, params.invoiceId);
  } catch (error) {
    if (error instanceof DomainError) throw data({ message: error.message }, { status: error.status });
    throw error;
  }
  const payments = await Promise.all((await paymentsOfInvoice(member.organizationId, invoice.id)).map(async (p) => ({ ...p, refunds: await refundsOf(p.id) })));
  return { invoice: { ...invoice, client: { id: invoice.client.id, name: invoice.client.name } }, payments };
}

export async function action({ request, context, params }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  const actor = { organizationId: member.organizationId, userId: member.user.id };
  const form = await readFormData(request);
  const here = `/billing/invoices/${params.invoiceId}`;
  if (form.get("intent") === "refund") {
    const submission = await parseForm(form, refundSchema);
    if (submission.status !== "success") return data({ paymentId: String(form.get("paymentId") ?? ""), reply: submission.reply() }, { status: 400 });
    try {
      const done = await refundPayment(actor, submission.value);
      return redirectWithFlash(here, { kind: "success", message: `Refunded ${decimalOf(submission.value.amount)}; the payment is ${done.state.replace("_", " ")}.` });
    } catch (error) {
      const answer = domainErrorReply(error, submission);
      return data({ paymentId: submission.value.paymentId, reply: answer.data }, answer.init ?? undefined);
    }
  }
  const submission = await parseForm(form, invoiceActionSchema);
  if (submission.status !== "success") return data({ paymentId: "", reply: submission.reply() }, { status: 400 });
  try {
    const intent = submission.value.intent;
    if (intent === "issue") {
      const inv = await issueInvoice(actor, params.invoiceId);
      return redirectWithFlash(here, { kind: "success", message: `Invoice ${invoiceNumberText(inv.number)} is issued and sent to the client.` });
    }
    if (intent === "resend") {
      const sent = await resendInvoice(actor, params.invoiceId);
      return redirectWithFlash(here, { kind: sent ? "success" : "info", message: sent ? `Sent again to ${sent} address${sent === 1 ? "" : "es"}.` : "The client has no members or contacts with an e-mail address." });
    }
    if (intent === "discard") {
      await discardDraft(actor, params.invoiceId);
      return redirectWithFlash("/billing/invoices", { kind: "success", message: "The draft is discarded. Make a new one to bill other lines." });
    }
    await voidInvoice(actor, params.invoiceId);
    return redirectWithFlash(here, { kind: "success", message: "The invoice is void." });
  } catch (error) {
    const answer = domainErrorReply(error, submission);
    return data({ paymentId: "", reply: answer.data }, answer.init ?? undefined);
  }
}

export default function Invoice({ loaderData, actionData }: Route.ComponentProps) {
  const { invoice: inv, payments } = loaderData;
  const busy = useNavigation().state !== "idle";
  const money = (n: number) => formatMoney(n, inv.currency);
  const topErrors = actionData && !actionData.paymentId ? replyErrors(actionData.reply).form : [];
  return (
    <>
      <PageHeader
        label={inv.client.name}
        title={`Invoice ${invoiceNumberText(inv.number)}`}
        actions={<ButtonLink to={`/billing/invoices/${inv.id}/pdf`} reloadDocument>Invoice PDF</ButtonLink>}
      >
        <InvoiceStateTag state={inv.state} /> <span className="figures ml-2">{money(inv.total)}</span>
      </PageHeader>
      <BillingTabs />
      <div className="space-y-6">
        <FormErrors errors={topErrors} />
        <Card title="Lines">
          <div className="overflow-x-auto">
          <table className="min-w-full text-sm">
            <caption className="sr-only">Invoice lines</caption>
            <thead className="border-b border-ink-900"><tr><th className="label-caps px-2 py-2 text-left">Description</th><th className="label-caps px-2 py-2 text-right">Qty</th><th className="label-caps px-2 py-2 text-right">Amount</th></tr></thead>
            <tbody className="divide-y divide-rule">
              {inv.lines.map((l) => <tr key={l.id}><td className="px-2 py-2">{l.description}</td><td className="px-2 py-2 text-right tabular-nums">{l.quantity}</td><td className="px-2 py-2 text-right figures">{money(l.amount)}</td></tr>)}
              <tr className="font-bold"><td className="px-2 py-2">Total (no tax computed)</td><td /><td className="px-2 py-2 text-right figures">{money(inv.total)}</td></tr>
            </tbody>
          </table>
          </div>
          <dl className="mt-4 grid grid-cols-2 gap-2 text-sm sm:grid-cols-4">
            <div><dt className="label-caps">Issued</dt><dd>{inv.issuedAt ? <DateText value={inv.issuedAt} /> : "Not yet"}</dd></div>
            <div><dt className="label-caps">Paid</dt><dd className="figures">{money(inv.amountPaid)}</dd></div>
            <div><dt className="label-caps">Refunded</dt><dd className="figures">{money(inv.amountRefunded)}</dd></div>
            <div><dt className="label-caps">Voided</dt><dd>{inv.voidedAt ? <DateText value={inv.voidedAt} /> : "—"}</dd></div>
          </dl>
          <Form method="post" className="mt-5 flex flex-wrap gap-2">
            {inv.state === "draft" ? <Button name="intent" value="issue" disabled={busy}>Issue and send</Button> : null}
            {inv.state !== "draft" && inv.state !== "void" ? <Button name="intent" value="resend" tone="secondary" disabled={busy}>Send again</Button> : null}
            {inv.state === "draft" ? <Button name="intent" value="discard" tone="danger" disabled={busy}>Discard the draft</Button> : canVoid(inv.state) ? <Button name="intent" value="void" tone="danger" disabled={busy}>Void the invoice</Button> : null}
          </Form>
          {inv.state === "draft" ? <p className="mt-2 text-sm text-graphite-600">A draft has no number and has not been sent. To bill other lines, discard it and make a new one.</p> : null}
        </Card>
        <Card title="Payments">
          {payments.length === 0 ? (
            <p className="text-sm text-graphite-600">{inv.state === "open" ? "Not paid yet. The client pays through the link in the invoice e-mail or on its portal." : "No payments."}</p>
          ) : (
            <ul className="space-y-5">
              {payments.map((p) => {
                const left = p.amount - p.amountRefunded;
                const errs = actionData?.paymentId === p.id ? replyErrors(actionData.reply) : { form: [], fields: {} as Record<string, string[]> };
                return (
                  <li key={p.id} className="border-b border-rule pb-4">
                    <p className="text-sm"><DateText value={p.paidAt} /> · <span className="figures">{money(p.amount)}</span> · {p.state.replace("_", " ")} · refunded <span className="figures">{money(p.amountRefunded)}</span></p>
                    {p.refunds.length ? <ul className="mt-1 text-xs text-graphite-600">{p.refunds.map((r) => <li key={r.id}>Refund <span className="figures">{money(r.amount)}</span> on <DateText value={r.createdAt} />{r.reason ? ` (${r.reason})` : ""}</li>)}</ul> : null}
                    {left > 0 ? (
                      <Form method="post" className="mt-3 grid gap-2 sm:grid-cols-[10rem_1fr_auto] sm:items-start">
                        <input type="hidden" name="intent" value="refund" />
                        <input type="hidden" name="paymentId" value={p.id} />
                        <Field id={`amount-${p.id}`} name="amount" label={`Refund (at most ${money(left)})`} inputMode="decimal" defaultValue={decimalOf(left)} errors={errs.fields.amount ?? errs.form} required />
                        <Field id={`reason-${p.id}`} name="reason" label="Reason (optional)" maxLength={300} errors={errs.fields.reason} />
                        <Button tone="danger" className="sm:mt-6" disabled={busy}>Refund</Button>
                      </Form>
                    ) : <Notice state="caution">Refunded in full.</Notice>}
                  </li>
                );
              })}
            </ul>
          )}
        </Card>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
