// One-time messages carried across a redirect in a signed cookie.
import { createCookieSessionStorage, redirect } from "react-router";
import { env } from "~/infra/env.server";

export type Flash = { kind: "success" | "error" | "info"; message: string };

const storage = createCookieSessionStorage<Record<string, never>, { flash: Flash }>({
  cookie: {
    name: "isotrope_flash",
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    secrets: [env.BETTER_AUTH_SECRET],
    secure: env.APP_URL.startsWith("https:"),
  },
});

export async function redirectWithFlash(to: string, flash: Flash, init: { headers?: Headers } = {}) {
  const session = await storage.getSession();
  session.flash("flash", flash);
  const headers = new Headers(init.headers);
  headers.append("set-cookie", await storage.commitSession(session));
  return redirect(to, { headers });
}

/** Reads (and clears) the pending flash message. */
export async function takeFlash(request: Request) {
  const session = await storage.getSession(request.headers.get("cookie"));
  const flash = session.get("flash") ?? null;
  return { flash, headers: flash ? { "set-cookie": await storage.commitSession(session) } : undefined };
}
