import { redirect } from "react-router";
import { callAuth, cookiesOf } from "~/features/auth/call.server";
import { redirectWithFlash } from "~/infra/flash.server";
import type { Route } from "./+types/sign-out";

export async function action({ request }: Route.ActionArgs) {
  const result = await callAuth(request, "/sign-out");
  return redirectWithFlash("/sign-in", { kind: "info", message: "You are signed out." }, { headers: cookiesOf(result) });
}

export function loader() {
  return redirect("/");
}
