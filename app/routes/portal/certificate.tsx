// /portal/sites/:siteId/assessments/:assessmentId/certificate: a client member buys the
// certificate of an assessment whose report is issued. "Buy" opens a Checkout Session (the
// certificate fee) and sends the browser to the payment page; cancel or a declined card comes back
// here with ?cancelled=1, and nothing is issued.
import { data, Form, redirect, useLocation, useNavigation } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { TextLink } from "~/components/text-link";
import { DateText } from "~/components/date-text";
import { FormErrors } from "~/components/field";
import { Card, Notice, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { replyErrors } from "~/features/billing/billing-nav";
import { certificateOffer, checkoutForCertificate, latestCertificateCheckout } from "~/features/billing/checkout.server";
import { formatMoney } from "~/features/billing/money";
import { DomainError } from "~/lib/domain-error";
import type { Route } from "./+types/certificate";

export const meta: Route.MetaFunction = () => [{ title: "Buy a certificate · Isotrope" }];

const notFound = (error: unknown) => {
  if (error instanceof DomainError) return data({ message: error.message }, { status: error.status });
  return error;
};

export async function loader({ request, context, params }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: ["client"] });
  const offer = await certificateOffer(member, params.siteId, params.assessmentId).catch((e) => { throw notFound(e); });
  const last = await latestCertificateCheckout(member, params.assessmentId);
  return {
    site: offer.site,
    assessment: offer.assessment,
    reportIssued: Boolean(offer.report),
    issuer: offer.report?.reviewerName ?? null,
    certificateId: offer.certificate?.id ?? null,
    fee: offer.fee ? { name: offer.fee.name, amount: offer.fee.amount, currency: offer.fee.currency } : null,
    lastFailure: last && last.state !== "paid" ? last.failureMessage : null,
  };
}

export async function action({ request, context, params }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: ["client"] });
  try {
    const url = await checkoutForCertificate({ organizationId: member.organizationId, clientId: member.clientId, role: member.role, userId: member.user.id, email: member.user.email }, params.siteId, params.assessmentId);
    return redirect(url);
  } catch (error) {
    if (error instanceof DomainError) return data({ error: { "": [error.message] } }, { status: error.status });
    throw error;
  }
}

export default function BuyCertificate({ loaderData, actionData }: Route.ComponentProps) {
  const { site, assessment, reportIssued, issuer, certificateId, fee, lastFailure } = loaderData;
  const cancelled = new URLSearchParams(useLocation().search).get("cancelled") === "1";
  const busy = useNavigation().state !== "idle";
  return (
    <>
      <PageHeader label={site.name} title="Certificate">For the assessment “{assessment.name}” of <DateText value={assessment.createdAt} />.</PageHeader>
      <div className="max-w-2xl space-y-6">
        {cancelled && !certificateId ? (
          <Notice state="caution" role="status">{lastFailure ? `The payment did not go through: ${lastFailure}` : "The payment was cancelled."} Nothing was charged and no certificate was issued.</Notice>
        ) : null}
        <FormErrors errors={replyErrors(actionData).form} />
        <Card title={certificateId ? "Your certificate" : "Buy the certificate"}>
          {certificateId ? (
            <div className="space-y-3">
              <Notice state="ok">The certificate for this assessment is issued.</Notice>
              <ButtonLink to={`/documents/${certificateId}/pdf`} reloadDocument tone="primary">Download the certificate (PDF)</ButtonLink>
            </div>
          ) : !reportIssued ? (
            <p className="text-sm text-graphite-600">The report for this assessment has not been issued yet, so its certificate cannot be bought.</p>
          ) : !fee ? (
            <p className="text-sm text-graphite-600">Certificates are not on sale yet. Ask your consultancy.</p>
          ) : (
            <Form method="post" className="space-y-4">
              <p className="text-sm">The certificate is issued as soon as the payment is confirmed, signed by {issuer ?? "the reviewing engineer"} who issued the report, and e-mailed to you. It carries a verification code anyone can check.</p>
              <p className="text-lg"><span className="font-medium">{fee.name}:</span> <span className="figures">{formatMoney(fee.amount, fee.currency)}</span> <span className="text-sm text-graphite-600">(no tax computed)</span></p>
              <Button disabled={busy}>Pay by card</Button>
            </Form>
          )}
        </Card>
        <TextLink to="/portal/certificates">All certificates</TextLink>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
