// /billing/invoices/new?clientId=: a draft invoice for a client, its lines from the client's
// assessments and the price list.
import { data, Form, useNavigation } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { FormErrors, SelectField, TextAreaField } from "~/components/field";
import { Card, EmptyState, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { BillingTabs, replyErrors } from "~/features/billing/billing-nav";
import { createInvoice, invoiceableAssessments } from "~/features/billing/invoices.server";
import { formatMoney } from "~/features/billing/money";
import { listPrices } from "~/features/billing/prices.server";
import { invoiceCreateSchema } from "~/features/billing/schemas";
import { listClients } from "~/features/clients/clients.server";
import { scopeOf } from "~/features/sites/scope.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { formatDate } from "~/lib/dates";
import { domainErrorReply } from "~/lib/domain-error";
import { parseForm } from "~/lib/form.server";
import type { Route } from "./+types/invoice-new";

const billingRoles = ["owner", "billing"] as const;
export const meta: Route.MetaFunction = () => [{ title: "New invoice · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  const { clients } = await listClients(scopeOf(member), { page: 1, pageSize: 100, q: "", sort: "name", dir: "asc" });
  const wanted = new URL(request.url).searchParams.get("clientId");
  const client = clients.find((c) => c.id === wanted) ?? null;
  const assessments = client ? await invoiceableAssessments(member.organizationId, client.id) : [];
  const prices = (await listPrices(member.organizationId)).filter((p) => p.active);
  return { clients: clients.map((c) => ({ id: c.id, name: c.name })), client, assessments, prices: prices.map((p) => ({ kind: p.kind, name: p.name, amount: p.amount, currency: p.currency })) };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  const submission = await parseForm(request, invoiceCreateSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  try {
    const inv = await createInvoice({ organizationId: member.organizationId, userId: member.user.id }, submission.value);
    return redirectWithFlash(`/billing/invoices/${inv.id}`, { kind: "success", message: "The draft invoice is made. Check it, then issue and send it." });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function NewInvoice({ loaderData, actionData }: Route.ComponentProps) {
  const { clients, client, assessments, prices } = loaderData;
  const busy = useNavigation().state !== "idle";
  const errors = replyErrors(actionData);
  const price = (kind: string) => prices.find((p) => p.kind === kind);
  const fee = (kind: string) => (price(kind) ? formatMoney(price(kind)!.amount, price(kind)!.currency) : "not on the price list");
  return (
    <>
      <PageHeader title="New invoice">Lines come from the client's assessments and the price list. No tax is computed.</PageHeader>
      <BillingTabs />
      <Card title="Client">
        <Form method="get" className="flex flex-wrap items-end gap-3">
          <div className="min-w-64 flex-1">
            <SelectField id="clientId" name="clientId" label="Client" defaultValue={client?.id ?? ""} options={[{ value: "", label: "Choose a client" }, ...clients.map((c) => ({ value: c.id, label: c.name }))]} />
          </div>
          <Button tone="secondary" className="mb-6">Show assessments</Button>
        </Form>
      </Card>
      {client ? (
        <div className="mt-6">
          <Card title={`Lines for ${client.name}`}>
            <Form method="post" className="space-y-4">
              <input type="hidden" name="clientId" value={client.id} />
              <FormErrors errors={[...errors.form, ...(errors.fields.assessmentIds ?? []), ...(errors.fields.clientId ?? [])]} />
              {assessments.length === 0 ? (
                <EmptyState title="This client's sites have no assessments yet." />
              ) : (
                <div className="overflow-x-auto">
                <table className="min-w-full text-sm">
                  <caption className="sr-only">Assessments</caption>
                  <thead className="border-b border-ink-900"><tr><th className="label-caps px-2 py-2 text-left">Assessment</th><th className="label-caps px-2 py-2 text-left">Site</th><th className="label-caps px-2 py-2 text-left">Made</th><th className="label-caps px-2 py-2 text-left">Assessment fee ({fee("assessment_fee")})</th><th className="label-caps px-2 py-2 text-left">Certificate fee ({fee("certificate_fee")})</th></tr></thead>
                  <tbody className="divide-y divide-rule">
                    {assessments.map((a) => (
                      <tr key={a.id}>
                        <td className="px-2 py-2">{a.name}</td>
                        <td className="px-2 py-2">{a.siteName}</td>
                        <td className="px-2 py-2 tabular-nums">{formatDate(a.createdAt)}</td>
                        <td className="px-2 py-2"><label className="flex items-center gap-2"><input type="checkbox" name="assessmentIds" value={a.id} /> <span className="sr-only">Assessment fee for {a.name}</span>Bill</label></td>
                        <td className="px-2 py-2"><label className="flex items-center gap-2"><input type="checkbox" name="certificates" value={a.id} /> <span className="sr-only">Certificate fee for {a.name}</span>Bill</label></td>
                      </tr>
                    ))}
                  </tbody>
                </table>
                </div>
              )}
              <label className="flex items-center gap-2 text-sm"><input type="checkbox" name="rush" /> Add the rush surcharge ({fee("rush_surcharge")})</label>
              <TextAreaField id="notes" name="notes" label="Notes on the invoice" maxLength={2000} rows={3} errors={errors.fields.notes} />
              <div className="flex gap-2">
                <Button disabled={busy}>Make the draft</Button>
                <ButtonLink to="/billing">Cancel</ButtonLink>
              </div>
            </Form>
          </Card>
        </div>
      ) : null}
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
