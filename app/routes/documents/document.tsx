// /sites/:siteId/documents/:documentId: one document, its state and PDF, and the steps the
// signed-in member may take (submit, return, issue, reissue, withdraw with a reason). The rules
// are checked again on the server (lifecycle.ts), whatever the page shows.
import { data, Form, Link } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { RfCautions } from "~/components/cautions";
import { DateText } from "~/components/date-text";
import { FormErrors, TextAreaField } from "~/components/field";
import { Card, Notice } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { issueDocument, reissueDocument, returnDocument, submitDocument, withdrawDocument } from "~/features/documents/commands.server";
import { assessmentTitle } from "~/features/assessments/assessments.server";
import { findDocument } from "~/features/documents/documents.server";
import { kindLabels, renderLabels, stateLabels } from "~/features/documents/labels";
import { availableSteps } from "~/features/documents/lifecycle";
import { REASON_MAX, stepSchema } from "~/features/documents/schemas";
import { useRenderRefresh } from "~/features/documents/use-render-refresh";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { parseForm } from "~/lib/form.server";
import { found } from "~/lib/responses.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/document";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${kindLabels[data.doc.kind]} v${data.doc.version} · Isotrope` : "Document · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const d = found(await findDocument(scopeOf(member), params.documentId, params.siteId), "No such document of this site.");
  const { pdf: _none, ...doc } = { ...d, pdf: null };
  const from = await assessmentTitle(d.siteId, d.assessmentId);
  return {
    assessment: from ? { name: from.name, createdAt: from.createdAt.toISOString() } : null,
    doc: { ...doc, createdAt: d.createdAt.toISOString(), issuedAt: d.issuedAt?.toISOString() ?? null, expiresAt: d.expiresAt?.toISOString() ?? null, submittedAt: d.submittedAt?.toISOString() ?? null, withdrawnAt: d.withdrawnAt?.toISOString() ?? null, supersededAt: d.supersededAt?.toISOString() ?? null, renderedAt: d.renderedAt?.toISOString() ?? null, updatedAt: d.updatedAt.toISOString() },
    steps: availableSteps(d, { userId: member.user.id, role: member.role }),
    isAuthor: d.authorUserId === member.user.id,
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const submission = await parseForm(request, stepSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const who = { ...actorOf(member), name: member.user.name };
  const id = params.documentId;
  try {
    found(await findDocument(scopeOf(member), id, params.siteId), "No such document of this site.");
    const { intent, reason } = submission.value;
    if (intent === "reissue") {
      const next = await reissueDocument(who, id);
      return redirectWithFlash(`/sites/${params.siteId}/documents/${next.id}`, { kind: "success", message: `Version ${next.version} drafted. It replaces the issued one when a reviewer issues it.` });
    }
    const run = { submit: () => submitDocument(who, id), return: () => returnDocument(who, id), issue: () => issueDocument(who, id), withdraw: () => withdrawDocument(who, id, reason) }[intent];
    await run();
    const said = { submit: "Sent for review; the reviewers have been told.", return: "Returned to draft; the author has been told.", issue: "Issued. The final PDF is being made and then fixed; the author and the client will be told.", withdraw: "Withdrawn." }[intent];
    return redirectWithFlash(`/sites/${params.siteId}/documents/${id}`, { kind: "success", message: said });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function DocumentPage({ loaderData, actionData }: Route.ComponentProps) {
  const { doc, steps, isAuthor } = loaderData;
  useRenderRefresh(doc.renderStatus === "queued" || doc.renderStatus === "rendering");
  const errors = actionData && "error" in actionData ? (actionData.error as Record<string, string[] | null> | undefined) : undefined;
  const facts: [string, React.ReactNode][] = [
    ["State", stateLabels[doc.state]],
    ["PDF", `${renderLabels[doc.renderStatus]}${doc.renderAttempts > 1 ? ` (attempt ${doc.renderAttempts})` : ""}`],
    ["Author", doc.authorName],
    ["Reviewer", doc.reviewerName ?? "—"],
    ["Drafted", <DateText key="d" value={doc.createdAt} />],
    ["Issued", doc.issuedAt ? <DateText key="i" value={doc.issuedAt} /> : "—"],
    ...(doc.kind === "certificate" ? ([["Valid until", doc.expiresAt ? <DateText key="e" value={doc.expiresAt} /> : "one year from issue"], ["Verification code", <span key="c" className="figures">{doc.code}</span>]] as [string, React.ReactNode][]) : []),
    ...(doc.sha256 && doc.issuedAt ? ([["SHA-256", <span key="h" className="figures break-all text-xs">{doc.sha256}</span>]] as [string, React.ReactNode][]) : []),
  ];
  return (
    <article aria-labelledby="document-title" className="space-y-6">
      <div>
        <p className="text-sm text-graphite-600"><Link to={`/sites/${doc.siteId}/documents`} className="underline">Documents</Link> / {stateLabels[doc.state].toLowerCase()}</p>
        <h2 id="document-title" className="text-xl font-semibold">{kindLabels[doc.kind]}, version {doc.version}</h2>
        <p className="text-sm text-graphite-600">
          From the assessment{" "}
          <Link className="link" to={`/sites/${doc.siteId}/assessments/${doc.assessmentId}`}>
            {loaderData.assessment?.name ?? "it was drawn from"}
          </Link>
          {loaderData.assessment ? <>, frozen <DateText value={loaderData.assessment.createdAt} /></> : null}.
        </p>
      </div>
      {doc.renderStatus === "failed" ? <Notice state="danger" role="alert">The PDF could not be made: {doc.renderError}. It will not be tried again by itself; reissue or ask an administrator.</Notice> : null}
      {doc.state === "withdrawn" ? <Notice state="danger">Withdrawn: {doc.withdrawnReason}</Notice> : null}
      {doc.state === "superseded" ? <Notice state="caution">Superseded by a newer version.</Notice> : null}
      <Card title="Details" actions={doc.renderStatus === "ready" ? <ButtonLink to={`/documents/${doc.id}/pdf`} reloadDocument tone="primary" size="sm">Download PDF</ButtonLink> : null}>
        <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]">
          {facts.map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="label-caps">{k}</dt>
              <dd className="min-w-0 break-words">{v}</dd>
            </div>
          ))}
        </dl>
      </Card>
      <Card title="Review and issue">
        <FormErrors errors={errors?.[""] ?? null} />
        {steps.length === 0 ? (
          <p className="text-sm text-graphite-600">{doc.state === "in_review" && isAuthor ? "You wrote this document: another reviewer must review and issue it (two-person rule)." : "Nothing for you to do on this document now."}</p>
        ) : (
          <div className="space-y-4">
            <div className="flex flex-wrap gap-2">
              {steps.filter((s) => s !== "withdraw").map((s) => (
                <Form method="post" key={s}>
                  <input type="hidden" name="intent" value={s} />
                  <Button type="submit" tone={s === "return" ? "secondary" : "primary"}>{{ submit: "Submit for review", return: "Return to draft", issue: "Issue", reissue: "Reissue as a new version" }[s as "submit"]}</Button>
                </Form>
              ))}
            </div>
            {steps.includes("withdraw") ? (
              <Form method="post" className="space-y-2">
                <input type="hidden" name="intent" value="withdraw" />
                <TextAreaField id="reason" name="reason" label="Reason for withdrawing" maxLength={REASON_MAX} rows={2} errors={errors?.reason ?? undefined} />
                <Button type="submit" tone="danger">Withdraw</Button>
              </Form>
            ) : null}
          </div>
        )}
      </Card>
      <RfCautions />
    </article>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
