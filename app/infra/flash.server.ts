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

/** `headers` plus the cookie that carries `flash` to the next page shown. */
export async function withFlash(flash: Flash, headers?: Headers) {
  const session = await storage.getSession();
  session.flash("flash", flash);
  const out = new Headers(headers);
  out.append("set-cookie", await storage.commitSession(session));
  return out;
}

export async function redirectWithFlash(to: string, flash: Flash, init: { headers?: Headers } = {}) {
  return redirect(to, { headers: await withFlash(flash, init.headers) });
}

/** Reads (and clears) the pending flash message. */
export async function takeFlash(request: Request) {
  const cookie = request.headers.get("cookie");
  // Almost every page has no message waiting: skip parsing and verifying the cookies then.
  if (!cookie?.includes("isotrope_flash=")) return { flash: null, headers: undefined };
  const session = await storage.getSession(cookie);
  const flash = session.get("flash") ?? null;
  return { flash, headers: flash ? { "set-cookie": await storage.commitSession(session) } : undefined };
}
