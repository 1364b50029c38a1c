// The address that just signed up, kept for the "check your e-mail" page in a signed,
// HTTP-only cookie for one hour: the page names it and can resend to it, and nothing
// typed into the address bar is ever repeated on the page.
import { createCookie } from "react-router";
import { env } from "~/infra/env.server";

const cookie = createCookie("isotrope_pending", {
  httpOnly: true,
  sameSite: "lax",
  path: "/",
  maxAge: 60 * 60,
  secrets: [env.BETTER_AUTH_SECRET],
  secure: env.APP_URL.startsWith("https:"),
});

export async function rememberPendingAddress(email: string) {
  return new Headers({ "set-cookie": await cookie.serialize(email) });
}

export async function pendingAddress(request: Request): Promise<string | null> {
  const value: unknown = await cookie.parse(request.headers.get("cookie"));
  return typeof value === "string" && value.length <= 254 ? value : null;
}
