// /verify/:code: public (no sign-in; the code is the credential, 100 random bits). Says whether
// a certificate is valid, superseded (with the newer code), withdrawn or expired; unknown codes 404.
// Rate-limited per client address (verify-limit.server.ts): 429 with Retry-After and a page that says how long to wait.
import { data, isRouteErrorResponse, Link, useRouteError } from "react-router";
import { DateText } from "~/components/date-text";
import { Wordmark } from "~/components/mark";
import { Notice } from "~/components/panels";
import { waitPhrase } from "~/features/auth/throttle-policy";
import { takeVerifyLookup } from "~/features/documents/verify-limit.server";
import { verifyCertificate } from "~/features/documents/verify.server";
import { standardLabels, tierLabels } from "~/features/exposure/options";
import type { StandardId, Tier } from "~/engine/limits";
import type { Route } from "./+types/verify";

export const meta: Route.MetaFunction = () => [{ title: "Verify a certificate · Isotrope" }, { name: "robots", content: "noindex" }];

/** The 429's Retry-After reaches the browser with the error page. */
export const headers: Route.HeadersFunction = ({ errorHeaders, loaderHeaders }) => errorHeaders ?? loaderHeaders;

export async function loader({ request, params }: Route.LoaderArgs) {
  // Public by design: no member guard. The client address's budget first, then only the certificate's public facts are read.
  const wait = await takeVerifyLookup(request);
  if (wait > 0) throw data({ message: `Too many look-ups from your network. Wait ${waitPhrase(wait)}, then try again.` }, { status: 429, headers: { "Retry-After": String(wait) } });
  const found = await verifyCertificate(params.code);
  if (!found) throw data({ message: "No certificate has this code. Check it against the certificate, letter by letter." }, { status: 404 });
  return { certificate: found };
}

const verdicts = {
  valid: { state: "ok", text: "Valid: this certificate is in force." },
  superseded: { state: "caution", text: "Superseded: a newer certificate replaces this one." },
  withdrawn: { state: "danger", text: "Withdrawn: do not rely on this certificate." },
  expired: { state: "caution", text: "Expired: this certificate is past its date." },
} as const;

function Sheet({ children }: { children: React.ReactNode }) {
  return (
    <div className="graph-paper flex min-h-screen flex-col items-center px-4 py-10">
      <Link to="/" className="mb-6"><Wordmark size="lg" /></Link>
      <main className="w-full max-w-lg space-y-4 rounded-sheet border border-ink-900 bg-sheet p-6">{children}</main>
    </div>
  );
}

export default function Verify({ loaderData }: Route.ComponentProps) {
  const c = loaderData.certificate;
  const v = verdicts[c.verdict as keyof typeof verdicts];
  return (
    <Sheet>
      <h1 className="text-2xl font-bold">RF compliance certificate</h1>
      <Notice state={v.state} role="status">
        {v.text}
        {c.newerCode ? <> Newer certificate: <Link className="link figures" to={`/verify/${c.newerCode}`}>{c.newerCode}</Link>.</> : null}
      </Notice>
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]">
        <dt className="label-caps">Site</dt><dd className="break-words">{c.siteName}{c.city ? `, ${c.city}` : ""}</dd>
        <dt className="label-caps">Standard and tier</dt><dd>{standardLabels[c.standard as StandardId] ?? c.standard}, {tierLabels[c.standard as StandardId]?.[c.tier as Tier] ?? c.tier}</dd>
        <dt className="label-caps">Issued</dt><dd>{c.issuedAt ? <DateText value={c.issuedAt} /> : "—"}</dd>
        <dt className="label-caps">Valid until</dt><dd>{c.expiresAt ? <DateText value={c.expiresAt} /> : "—"}</dd>
        <dt className="label-caps">Issued by</dt><dd className="break-words">{c.issuer}</dd>
        <dt className="label-caps">Code</dt><dd className="figures break-all">{c.code}</dd>
      </dl>
      <p className="text-xs text-graphite-600">Predictions are conservative estimates under stated assumptions, not measurements; local codes and the judgement of a licensed professional prevail.</p>
    </Sheet>
  );
}

/** Unknown codes and the rate limit, on the same public sheet (no app shell, no sign-in link needed). */
export function ErrorBoundary() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : 500;
  const message = isRouteErrorResponse(error) ? (error.data as { message?: string } | undefined)?.message : undefined;
  const title = status === 404 ? "No certificate with this code" : status === 429 ? "Too many look-ups" : "Something went wrong";
  return (
    <Sheet>
      <p className="label-caps">Status <span className="figures">{status}</span></p>
      <h1 className="text-2xl font-bold">{title}</h1>
      <Notice state={status === 404 || status === 429 ? "caution" : "danger"} role="alert">{message ?? "The page could not be shown. Try again in a moment."}</Notice>
      <p className="text-sm text-graphite-600">A certificate's code is printed under its QR code, in five groups of four letters and digits.</p>
    </Sheet>
  );
}
