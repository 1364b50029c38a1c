// /portal/certificates: the client's assessments with an issued report, each with its certificate
// (download) or the way to buy one.
import { createColumnHelper } from "@tanstack/react-table";
import { ButtonLink } from "~/components/button";
import { DateText } from "~/components/date-text";
import { PageHeader } from "~/components/panels";
import { TableShell } from "~/components/table-shell";
import { requireMember } from "~/features/auth/guard.server";
import { certificateList } from "~/features/billing/checkout.server";
import type { Route } from "./+types/certificates";

export const meta: Route.MetaFunction = () => [{ title: "Certificates · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: ["client"] });
  return { rows: await certificateList(member) };
}

type Row = Route.ComponentProps["loaderData"]["rows"][number];
const column = createColumnHelper<Row>();
const columns = [
  column.accessor("siteName", { header: "Site" }),
  column.accessor("assessmentName", { header: "Assessment" }),
  column.accessor("reportIssuedAt", { header: "Report issued", cell: (c) => (c.getValue() ? <DateText value={c.getValue()!} /> : "—") }),
  column.display({
    id: "certificate",
    header: "PDF",
    cell: (c) => {
      const r = c.row.original;
      return r.certificateId ? (
        <ButtonLink size="sm" to={`/documents/${r.certificateId}/pdf`} reloadDocument>Download certificate</ButtonLink>
      ) : (
        <ButtonLink size="sm" tone="primary" to={`/portal/sites/${r.siteId}/assessments/${r.assessmentId}/certificate`}>Buy certificate</ButtonLink>
      );
    },
  }),
];

export default function Certificates({ loaderData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="Certificates">A certificate shows contractors, insurers and tenants that a site was assessed; it carries a verification code.</PageHeader>
      <TableShell caption="Assessments with an issued report" columns={columns} rows={loaderData.rows} empty="No assessment of your sites has an issued report yet." stack />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
