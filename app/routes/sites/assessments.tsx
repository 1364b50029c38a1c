import { createColumnHelper } from "@tanstack/react-table";
import { data, Link } from "react-router";
import { Card } from "~/components/panels";
import { DateText } from "~/components/date-text";
import { TableShell } from "~/components/table-shell";
import { listAssessments } from "~/features/assessments/assessments.server";
import { figure } from "~/features/assessments/format";
import { FreezeForm } from "~/features/assessments/freeze-form";
import { freezeAssessment } from "~/features/assessments/freeze.server";
import { freezeFormSchema } from "~/features/assessments/schemas";
import { requireMember } from "~/features/auth/guard.server";
import { standardLabels } from "~/features/exposure/options";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest } from "~/features/sites/sites.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { parseForm } from "~/lib/form.server";
import { found } from "~/lib/responses.server";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { StandardId } from "~/engine/limits";
import type { Route } from "./+types/assessments";

export const meta: Route.MetaFunction = () => [{ title: "Assessments · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  const rows = await listAssessments(site.id);
  return {
    siteId: site.id,
    canEdit: canEditInventory(member.role),
    today: new Date().toISOString().slice(0, 10),
    assessments: rows.map((r, i) => ({ id: r.id, name: r.name, authorName: r.authorName, createdAt: r.createdAt.toISOString(), standard: r.standard as StandardId, tier: r.tier, worstPercent: (r.summary as { worstPercent: number }).worstPercent, previousId: rows[i + 1]?.id ?? null })),
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const submission = await parseForm(request, freezeFormSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  try {
    const row = await freezeAssessment({ ...actorOf(member), name: member.user.name }, params.siteId, submission.value);
    return redirectWithFlash(`/sites/${params.siteId}/assessments/${row.id}`, { kind: "success", message: "Assessment frozen. Review the proposed mitigation plan below." });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

type Row = Route.ComponentProps["loaderData"]["assessments"][number];
const column = createColumnHelper<Row>();

export default function Assessments({ loaderData, actionData }: Route.ComponentProps) {
  const { siteId, canEdit, assessments, today } = loaderData;
  const columns = [
    column.accessor("name", { header: "Name", cell: (c) => <Link to={`/sites/${siteId}/assessments/${c.row.original.id}`} className="link font-medium break-words">{c.getValue()}</Link> }),
    column.accessor("createdAt", { header: "Frozen", cell: (c) => <DateText value={c.getValue()} /> }),
    column.accessor("authorName", { header: "Author", cell: (c) => <span className="break-words">{c.getValue()}</span> }),
    column.accessor("standard", { header: "Standard, tier", cell: (c) => `${standardLabels[c.getValue()] ?? c.getValue()}, ${c.row.original.tier}` }),
    column.accessor("worstPercent", { header: "Worst point", cell: (c) => <span className="figures">{figure(c.getValue())} %</span> }),
    column.accessor("previousId", { header: "Compare", cell: (c) => (c.getValue() ? <Link className="link whitespace-nowrap" to={`/sites/${siteId}/assessments/${c.getValue()}/compare/${c.row.original.id}`}>with the one before</Link> : <span className="text-graphite-500">—</span>) }),
  ];
  return (
    <section aria-labelledby="assessments-title" className="space-y-6">
      <div>
        <h2 id="assessments-title" className="text-lg font-semibold">Assessments</h2>
        <p className="text-sm text-graphite-600">Frozen evaluations of this site, newest first: the inventory as it was, every engine request and response, the results and the mitigation plan.</p>
      </div>
      <TableShell caption="Assessments" stack columns={columns} rows={assessments} empty={canEdit ? "No assessments yet. Freeze the first one below." : "No assessments yet."} />
      {canEdit ? (
        <Card title="Freeze an assessment">
          <FreezeForm lastResult={actionData} defaultName={`Assessment ${today}`} />
        </Card>
      ) : null}
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
