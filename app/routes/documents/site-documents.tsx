// /sites/:siteId/documents: the site's documents with their states and render status, and the
// form that drafts one from an assessment.
import { createColumnHelper } from "@tanstack/react-table";
import { data, Form, Link } from "react-router";
import { Button } from "~/components/button";
import { DateText } from "~/components/date-text";
import { FormErrors, SelectField } from "~/components/field";
import { Card } from "~/components/panels";
import { TableShell } from "~/components/table-shell";
import { listAssessments } from "~/features/assessments/assessments.server";
import { requireMember } from "~/features/auth/guard.server";
import { draftDocument } from "~/features/documents/commands.server";
import { listDocuments } from "~/features/documents/documents.server";
import { kindLabels, renderLabels, stateLabels } from "~/features/documents/labels";
import { draftSchema } from "~/features/documents/schemas";
import { useRenderRefresh } from "~/features/documents/use-render-refresh";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { documentKinds } from "~/infra/db/schema/documents";
import { domainErrorReply } from "~/lib/domain-error";
import { parseForm } from "~/lib/form.server";
import { found } from "~/lib/responses.server";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site-documents";

export const meta: Route.MetaFunction = () => [{ title: "Documents · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSite(scopeOf(member), params.siteId), "No such site in your organisation.");
  const [docs, assessments] = await Promise.all([listDocuments(scopeOf(member), { siteId: site.id }), listAssessments(site.id)]);
  return {
    siteId: site.id,
    canDraft: canEditInventory(member.role),
    documents: docs.map((d) => ({ id: d.id, assessmentId: d.assessmentId, assessmentName: assessments.find((a) => a.id === d.assessmentId)?.name ?? "—", kind: d.kind, version: d.version, state: d.state, renderStatus: d.renderStatus, authorName: d.authorName, reviewerName: d.reviewerName, createdAt: d.createdAt.toISOString(), issuedAt: d.issuedAt?.toISOString() ?? null })),
    assessments: assessments.map((a) => ({ id: a.id, label: `${a.name} (${a.createdAt.toISOString().slice(0, 10)})` })),
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const submission = await parseForm(request, draftSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  try {
    const d = await draftDocument({ ...actorOf(member), name: member.user.name }, params.siteId, submission.value);
    return redirectWithFlash(`/sites/${params.siteId}/documents/${d.id}`, { kind: "success", message: `${kindLabels[d.kind]} drafted. Its PDF is being made.` });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

type Row = Route.ComponentProps["loaderData"]["documents"][number];
const column = createColumnHelper<Row>();

export default function SiteDocuments({ loaderData, actionData }: Route.ComponentProps) {
  const { siteId, canDraft, documents, assessments } = loaderData;
  useRenderRefresh(documents.some((d) => d.renderStatus === "queued" || d.renderStatus === "rendering"));
  const columns = [
    column.accessor("kind", { header: "Document", cell: (c) => <Link to={`/sites/${siteId}/documents/${c.row.original.id}`} className="link font-medium">{kindLabels[c.getValue()]}, version {c.row.original.version}</Link> }),
    column.accessor("assessmentName", { header: "From the assessment", cell: (c) => <Link to={`/sites/${siteId}/assessments/${c.row.original.assessmentId}`} className="break-words hover:underline">{c.getValue()}</Link> }),
    column.accessor("state", { header: "State", cell: (c) => stateLabels[c.getValue()] }),
    column.accessor("renderStatus", { header: "PDF", cell: (c) => renderLabels[c.getValue()] }),
    column.accessor("authorName", { header: "Author", cell: (c) => <span className="break-words">{c.getValue()}</span> }),
    column.accessor("reviewerName", { header: "Reviewer", cell: (c) => <span className="break-words">{c.getValue() ?? "—"}</span> }),
    column.accessor("createdAt", { header: "Drafted", cell: (c) => <DateText value={c.getValue()} /> }),
    column.accessor("issuedAt", { header: "Issued", cell: (c) => (c.getValue() ? <DateText value={c.getValue()!} /> : "—") }),
  ];
  const errors = actionData && "error" in actionData ? (actionData.error as Record<string, string[] | null> | undefined) : undefined;
  return (
    <section aria-labelledby="documents-title" className="space-y-6">
      <div>
        <h2 id="documents-title" className="text-lg font-semibold">Documents</h2>
        <p className="text-sm text-graphite-600">Reports, landlord letters and certificates drawn from a frozen assessment. A reviewer who did not write a document issues it; an issued PDF never changes.</p>
      </div>
      <TableShell caption="Documents" stack columns={columns} rows={documents} empty="No documents yet." />
      {canDraft ? (
        <Card title="Draft a document">
          {assessments.length === 0 ? (
            <p className="text-sm text-graphite-600">Freeze an assessment first: documents are drawn from one. <Link className="link" to={`/sites/${siteId}/assessments`}>Assessments</Link></p>
          ) : (
            <Form method="post" className="space-y-3">
              <FormErrors errors={errors?.[""] ?? null} />
              <div className="grid gap-x-4 sm:grid-cols-2">
                <SelectField id="assessmentId" name="assessmentId" label="From the assessment" options={assessments.map((a) => ({ value: a.id, label: a.label }))} errors={errors?.assessmentId ?? undefined} />
                <SelectField id="kind" name="kind" label="Kind" options={documentKinds.map((k) => ({ value: k, label: kindLabels[k] }))} errors={errors?.kind ?? undefined} />
              </div>
              <Button type="submit">Draft it</Button>
            </Form>
          )}
        </Card>
      ) : null}
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
