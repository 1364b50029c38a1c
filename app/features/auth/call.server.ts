// Runs one better-auth endpoint through its HTTP handler, so that rate limits,
// origin checks and cookies apply exactly as for a browser calling /api/auth.
import { auth } from "~/features/auth/auth.server";
import { CLIENT_ADDRESS_HEADER } from "~/infra/client-address.server";
import { env } from "~/infra/env.server";

const forwarded = ["cookie", "user-agent", CLIENT_ADDRESS_HEADER, "origin", "referer"];

export type AuthResult = { ok: boolean; status: number; code?: string; message?: string; body: unknown; headers: Headers };

export async function callAuth(request: Request, path: string, body?: Record<string, unknown>): Promise<AuthResult> {
  const headers = new Headers({ "content-type": "application/json" });
  for (const name of forwarded) {
    const value = request.headers.get(name);
    if (value) headers.set(name, value);
  }
  const response = await auth.handler(
    new Request(new URL(`/api/auth${path}`, env.APP_URL), {
      method: "POST",
      headers,
      body: JSON.stringify(body ?? {}),
    }),
  );
  const text = await response.text();
  let parsed: unknown = null;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    parsed = text;
  }
  const info = (parsed ?? {}) as { code?: string; message?: string };
  return { ok: response.ok, status: response.status, code: info.code, message: info.message, body: parsed, headers: response.headers };
}

/** The Set-Cookie headers of an auth response, to pass on with a redirect. */
export function cookiesOf(result: AuthResult): Headers {
  const out = new Headers();
  for (const cookie of result.headers.getSetCookie()) out.append("set-cookie", cookie);
  return out;
}

