import { useSearchParams } from "react-router";
import { FooterLink } from "~/components/panels";
import type { Route } from "./+types/check-email";

export const meta: Route.MetaFunction = () => [{ title: "Check your e-mail · Isotrope" }];

export default function CheckEmail() {
  const [params] = useSearchParams();
  const email = params.get("email");
  return (
    <>
      <h1 className="mb-2 text-xl font-semibold">Check your e-mail</h1>
      <p className="text-sm text-graphite-600">
        We sent a confirmation link to {email ? <strong className="text-ink-900">{email}</strong> : "your address"}. Follow it within
        the hour to finish signing up.
      </p>
      <FooterLink to="/sign-in">Back to sign-in</FooterLink>
    </>
  );
}
