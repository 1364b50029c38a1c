import { data } from "react-router";
import { FooterLink } from "~/components/panels";
import { getSignedIn } from "~/features/auth/guard.server";
import type { Route } from "./+types/verified";

export const meta: Route.MetaFunction = () => [{ title: "E-mail confirmation · Isotrope" }];

const problems: Record<string, string> = {
  TOKEN_EXPIRED: "This confirmation link has expired. Sign in to get a new one.",
  INVALID_TOKEN: "This confirmation link is not valid. It may be incomplete or already replaced by a newer one.",
  USER_NOT_FOUND: "This confirmation link belongs to no account.",
};

// Says "signed in" only when a session really exists: a direct visit or a reused link has none.
export async function loader({ request }: Route.LoaderArgs) {
  const error = new URL(request.url).searchParams.get("error");
  if (error) return data({ problem: problems[error.toUpperCase()] ?? problems.INVALID_TOKEN, signedInAs: null }, { status: 400 });
  const signedIn = await getSignedIn(request);
  return { problem: null, signedInAs: signedIn?.user.emailVerified ? signedIn.user.email : null };
}

export default function Verified({ loaderData }: Route.ComponentProps) {
  const { problem, signedInAs } = loaderData;
  if (problem) {
    return (
      <>
        <h1 className="mb-2 text-xl font-semibold">Link not accepted</h1>
        <p className="text-sm text-graphite-600" role="alert">
          {problem}
        </p>
        <FooterLink to="/sign-in">Go to sign-in</FooterLink>
      </>
    );
  }
  if (signedInAs) {
    return (
      <>
        <h1 className="mb-2 text-xl font-semibold">E-mail confirmed</h1>
        <p className="text-sm text-graphite-600">
          Thank you. {signedInAs} is confirmed and you are signed in.
        </p>
        <FooterLink to="/">Continue to Isotrope</FooterLink>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-2 text-xl font-semibold">Sign in to continue</h1>
      <p className="text-sm text-graphite-600">
        You are not signed in. If you have confirmed your address, sign in with it. If not, signing in sends you a new confirmation
        link.
      </p>
      <FooterLink to="/sign-in">Go to sign-in</FooterLink>
    </>
  );
}
