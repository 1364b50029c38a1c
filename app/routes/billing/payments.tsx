// /billing/payments: every payment (invoices and certificates) in a TanStack table, filtered by
// state, purpose, client and dates in the URL, with the CSV of the same rows (the API, format=csv).
import { createColumnHelper } from "@tanstack/react-table";
import { Form, Link } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { DateText } from "~/components/date-text";
import { Field, SelectField } from "~/components/field";
import { PageHeader } from "~/components/panels";
import { TableShell } from "~/components/table-shell";
import { requireMember } from "~/features/auth/guard.server";
import { BillingTabs } from "~/features/billing/billing-nav";
import { paymentJson } from "~/features/billing/json";
import { formatMoney } from "~/features/billing/money";
import { listPayments } from "~/features/billing/payments.server";
import { paymentFilterSchema } from "~/features/billing/schemas";
import { listClients } from "~/features/clients/clients.server";
import { scopeOf } from "~/features/sites/scope.server";
import type { Route } from "./+types/payments";

const billingRoles = ["owner", "billing"] as const;
export const meta: Route.MetaFunction = () => [{ title: "Payments · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  const params = new URL(request.url).searchParams;
  const filter = paymentFilterSchema.parse(Object.fromEntries(params));
  const [rows, { clients }] = await Promise.all([listPayments(member.organizationId, filter), listClients(scopeOf(member), { page: 1, pageSize: 100, q: "", sort: "name", dir: "asc" })]);
  const csv = new URLSearchParams(Object.entries(filter).filter(([, v]) => v) as [string, string][]);
  csv.set("format", "csv");
  return { filter, payments: rows.map((r) => paymentJson(r.payment, r.clientName, r.invoiceNumber)), clients: clients.map((c) => ({ value: c.id, label: c.name })), csvUrl: `/api/v1/payments?${csv}` };
}

type Row = Route.ComponentProps["loaderData"]["payments"][number];
const column = createColumnHelper<Row>();
const columns = [
  column.accessor("paidAt", { header: "Paid", cell: (c) => <DateText value={c.getValue()!} /> }),
  column.accessor("clientName", { header: "Client" }),
  column.accessor("purpose", { header: "For", cell: (c) => (c.getValue() === "invoice" && c.row.original.invoiceId ? <Link className="link" to={`/billing/invoices/${c.row.original.invoiceId}`}>{c.row.original.invoiceNumber ?? "Invoice"}</Link> : "Certificate") }),
  column.accessor("amount", { header: "Amount", cell: (c) => <span className="figures">{formatMoney(c.getValue(), c.row.original.currency)}</span> }),
  column.accessor("amountRefunded", { header: "Refunded", cell: (c) => (c.getValue() ? <span className="figures">{formatMoney(c.getValue(), c.row.original.currency)}</span> : "—") }),
  column.accessor("state", { header: "State", cell: (c) => c.getValue().replace("_", " ") }),
];

export default function Payments({ loaderData }: Route.ComponentProps) {
  const { filter, payments, clients, csvUrl } = loaderData;
  return (
    <>
      <PageHeader title="Billing" actions={<ButtonLink to={csvUrl} reloadDocument>Download CSV</ButtonLink>}>Payments received through the payment service, with their refunds.</PageHeader>
      <BillingTabs />
      <Form method="get" className="mb-5 grid gap-3 sm:grid-cols-3 lg:grid-cols-6 lg:items-end">
        <SelectField id="state" name="state" label="State" defaultValue={filter.state ?? ""} options={[{ value: "", label: "Any" }, { value: "succeeded", label: "Paid" }, { value: "partly_refunded", label: "Partly refunded" }, { value: "refunded", label: "Refunded" }]} />
        <SelectField id="purpose" name="purpose" label="For" defaultValue={filter.purpose ?? ""} options={[{ value: "", label: "Anything" }, { value: "invoice", label: "Invoices" }, { value: "certificate", label: "Certificates" }]} />
        <SelectField id="clientId" name="clientId" label="Client" defaultValue={filter.clientId ?? ""} options={[{ value: "", label: "Any client" }, ...clients]} />
        <Field id="from" name="from" type="date" label="From" defaultValue={filter.from ?? ""} />
        <Field id="to" name="to" type="date" label="To" defaultValue={filter.to ?? ""} />
        <div className="mb-6"><Button tone="secondary">Filter</Button></div>
      </Form>
      <TableShell caption="Payments" columns={columns} rows={payments} empty="No payments match." stack />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
