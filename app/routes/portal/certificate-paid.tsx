// /portal/sites/:siteId/assessments/:assessmentId/certificate/paid?session_id=: where the payment
// page returns after paying. It polls this loader with a fetcher (no reload loop) until the webhook
// has recorded the payment and the certificate's PDF is stored, then offers the download.
import { data, useLocation } from "react-router";
import { ButtonLink } from "~/components/button";
import { TextLink } from "~/components/text-link";
import { Card, Notice, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { checkoutStatus } from "~/features/billing/checkout.server";
import { findDocument } from "~/features/documents/documents.server";
import { scopeOf } from "~/features/sites/scope.server";
import { usePoll } from "~/features/billing/use-poll";
import type { Route } from "./+types/certificate-paid";

export const meta: Route.MetaFunction = () => [{ title: "Payment · Isotrope" }];

export async function loader({ request, context, params }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: ["client"] });
  const sessionId = new URL(request.url).searchParams.get("session_id") ?? "";
  const c = sessionId ? await checkoutStatus(member, sessionId) : null;
  if (!c || c.assessmentId !== params.assessmentId) throw data({ message: "There is no such payment." }, { status: 404 });
  const doc = c.documentId ? await findDocument(scopeOf(member), c.documentId) : null;
  return { state: c.state, failure: c.failureMessage, documentId: doc?.id ?? null, ready: doc?.renderStatus === "ready", back: `/portal/sites/${params.siteId}/assessments/${params.assessmentId}/certificate` };
}

type Data = Route.ComponentProps["loaderData"];

export default function CertificatePaid({ loaderData }: Route.ComponentProps) {
  const { pathname, search } = useLocation();
  const poll = usePoll<Data>(pathname + search, (d) => { const s = d ?? loaderData; return s.state === "open" || (s.state === "paid" && Boolean(s.documentId) && !s.ready); });
  const s = poll.data ?? loaderData;
  return (
    <>
      <PageHeader title="Certificate payment" />
      <div className="max-w-2xl space-y-6">
        <Card>
          {s.state === "open" ? (
            <Notice state="info" role="status">{poll.gaveUp ? "The payment service has not confirmed the payment yet. Come back to this page in a few minutes; nothing is issued until it does." : "Thank you. Waiting for the payment service to confirm the payment…"}</Notice>
          ) : s.state === "paid" && s.documentId && s.ready ? (
            <div className="space-y-4">
              <Notice state="ok" role="status">Payment confirmed. Your certificate is issued and on its way to you by e-mail.</Notice>
              <ButtonLink to={`/documents/${s.documentId}/pdf`} reloadDocument tone="primary">Download the certificate (PDF)</ButtonLink>
            </div>
          ) : s.state === "paid" && s.documentId ? (
            <Notice state="info" role="status">Payment confirmed. The certificate is issued; its PDF is being made…</Notice>
          ) : s.state === "paid" ? (
            <Notice state="caution" role="status">Payment confirmed, but a certificate for this assessment already existed, so no second one was issued. Your consultancy will refund you.</Notice>
          ) : (
            <Notice state="caution" role="status">The payment did not go through{s.failure ? `: ${s.failure}` : ""}. Nothing was issued.</Notice>
          )}
        </Card>
        <TextLink to={s.back}>Back to the certificate</TextLink>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
