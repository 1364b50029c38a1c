// Calls a /api/v1 route module's loader or action the way the router would, with a session
// cookie or a bearer token, and reads the JSON answer.
import { env } from "~/infra/env.server";

type RouteModule = { loader?: (args: never) => unknown; action?: (args: never) => unknown };
export type Auth = { cookie?: string; token?: string };
export type ApiResult = { status: number; body: any; headers: Headers };

export async function callApi(
  mod: RouteModule,
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE",
  path: string,
  options: { auth?: Auth; json?: unknown; body?: BodyInit; contentType?: string; params?: Record<string, string> } = {},
): Promise<ApiResult> {
  const headers = new Headers({ origin: env.APP_URL });
  if (options.auth?.cookie) headers.set("cookie", options.auth.cookie);
  if (options.auth?.token) headers.set("authorization", `Bearer ${options.auth.token}`);
  let body: BodyInit | undefined = options.body;
  if (options.json !== undefined) {
    headers.set("content-type", "application/json");
    body = JSON.stringify(options.json);
  } else if (options.contentType) headers.set("content-type", options.contentType);
  // A streamed body (a generated upload) needs half-duplex mode in Node's fetch.
  const duplex = body instanceof ReadableStream ? { duplex: "half" } : {};
  const request = new Request(new URL(path, env.APP_URL), { method, headers, body, ...duplex } as RequestInit);
  const handler = method === "GET" ? mod.loader : mod.action;
  if (!handler) throw new Error(`the route module has no ${method === "GET" ? "loader" : "action"}`);
  let result: unknown;
  try {
    result = await handler({ request, params: options.params ?? {}, context: {} } as never);
  } catch (thrown) {
    result = thrown;
  }
  if (!(result instanceof Response)) throw new Error(`expected a Response, got ${String(result)}`);
  const text = await result.text();
  return { status: result.status, body: text ? JSON.parse(text) : null, headers: result.headers };
}
