// /billing: the organisation's invoices (billing and owner).
import { createColumnHelper } from "@tanstack/react-table";
import { Link } from "react-router";
import { ButtonLink } from "~/components/button";
import { DateText } from "~/components/date-text";
import { PageHeader } from "~/components/panels";
import { TableShell } from "~/components/table-shell";
import { requireMember } from "~/features/auth/guard.server";
import { BillingTabs, InvoiceStateTag } from "~/features/billing/billing-nav";
import { listInvoices } from "~/features/billing/invoices.server";
import { invoiceJson } from "~/features/billing/json";
import { formatMoney } from "~/features/billing/money";
import type { Route } from "./+types/invoices";

export const billingRoles = ["owner", "billing"] as const;
export const meta: Route.MetaFunction = () => [{ title: "Invoices · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  const rows = await listInvoices({ organizationId: member.organizationId, clientId: null, role: member.role });
  return { invoices: rows.map((r) => invoiceJson(r.invoice, r.clientName)) };
}

type Row = Route.ComponentProps["loaderData"]["invoices"][number];
const column = createColumnHelper<Row>();
const columns = [
  column.accessor("number", { header: "Invoice", cell: (c) => <Link className="link font-medium" to={`/billing/invoices/${c.row.original.id}`}>{c.getValue() ?? "Draft"}</Link> }),
  column.accessor("clientName", { header: "Client" }),
  column.accessor("state", { header: "State", cell: (c) => <InvoiceStateTag state={c.getValue()} /> }),
  column.accessor("total", { header: "Total", cell: (c) => <span className="figures">{formatMoney(c.getValue(), c.row.original.currency)}</span> }),
  column.accessor("amountRefunded", { header: "Refunded", cell: (c) => (c.getValue() ? <span className="figures">{formatMoney(c.getValue(), c.row.original.currency)}</span> : "—") }),
  column.accessor("issuedAt", { header: "Issued", cell: (c) => (c.getValue() ? <DateText value={c.getValue()!} /> : "—") }),
];

export default function Invoices({ loaderData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="Billing" actions={<ButtonLink to="/billing/invoices/new" tone="primary">New invoice</ButtonLink>}>
        Invoices, payments and the price list. No tax is computed on invoices.
      </PageHeader>
      <BillingTabs />
      <TableShell caption="Invoices" columns={columns} rows={loaderData.invoices} empty="No invoices yet." stack />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
