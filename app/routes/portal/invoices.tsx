// /portal/invoices: a client member's own client's issued invoices.
import { createColumnHelper } from "@tanstack/react-table";
import { Link } from "react-router";
import { DateText } from "~/components/date-text";
import { PageHeader } from "~/components/panels";
import { TableShell } from "~/components/table-shell";
import { requireMember } from "~/features/auth/guard.server";
import { InvoiceStateTag } from "~/features/billing/billing-nav";
import { listInvoices } from "~/features/billing/invoices.server";
import { invoiceJson } from "~/features/billing/json";
import { formatMoney } from "~/features/billing/money";
import type { Route } from "./+types/invoices";

export const meta: Route.MetaFunction = () => [{ title: "Invoices · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: ["client"] });
  const rows = await listInvoices({ organizationId: member.organizationId, clientId: member.clientId, role: member.role });
  return { invoices: rows.map((r) => invoiceJson(r.invoice, r.clientName)) };
}

type Row = Route.ComponentProps["loaderData"]["invoices"][number];
const column = createColumnHelper<Row>();
const columns = [
  column.accessor("number", { header: "Invoice", cell: (c) => <Link className="link font-medium" to={`/portal/invoices/${c.row.original.id}`}>{c.getValue()}</Link> }),
  column.accessor("issuedAt", { header: "Issued", cell: (c) => (c.getValue() ? <DateText value={c.getValue()!} /> : "—") }),
  column.accessor("total", { header: "Total", cell: (c) => <span className="figures">{formatMoney(c.getValue(), c.row.original.currency)}</span> }),
  column.accessor("state", { header: "State", cell: (c) => <InvoiceStateTag state={c.getValue()} /> }),
];

export default function PortalInvoices({ loaderData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="Invoices">Your consultancy's invoices to you. Open one to pay it by card or download it.</PageHeader>
      <TableShell caption="Invoices" columns={columns} rows={loaderData.invoices} empty="No invoices yet." stack />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
