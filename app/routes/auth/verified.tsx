import { data } from "react-router";
import { FooterLink } from "~/components/panels";
import type { Route } from "./+types/verified";

export const meta: Route.MetaFunction = () => [{ title: "E-mail confirmation · Isotrope" }];

const problems: Record<string, string> = {
  TOKEN_EXPIRED: "This confirmation link has expired. Sign in to get a new one.",
  INVALID_TOKEN: "This confirmation link is not valid. It may be incomplete or already replaced by a newer one.",
  USER_NOT_FOUND: "This confirmation link belongs to no account.",
};

export function loader({ request }: Route.LoaderArgs) {
  const error = new URL(request.url).searchParams.get("error");
  if (error) return data({ problem: problems[error.toUpperCase()] ?? problems.INVALID_TOKEN }, { status: 400 });
  return { problem: null };
}

export default function Verified({ loaderData }: Route.ComponentProps) {
  const { problem } = loaderData;
  return (
    <>
      <h1 className="mb-2 text-xl font-semibold">{problem ? "Link not accepted" : "E-mail confirmed"}</h1>
      <p className="text-sm text-graphite-600" role={problem ? "alert" : undefined}>
        {problem ?? "Thank you. Your address is confirmed and you are signed in."}
      </p>
      <FooterLink to={problem ? "/sign-in" : "/"}>{problem ? "Go to sign-in" : "Continue to Isotrope"}</FooterLink>
    </>
  );
}
