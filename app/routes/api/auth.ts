// better-auth's HTTP endpoints: only those the pages and e-mailed links use are open
// (app/features/auth/api-rules.ts); every other path, the organisation plugin's included, is 404.
// Members are managed by our own guarded code.
import { auth } from "~/features/auth/auth.server";
import { isOpenAuthEndpoint } from "~/features/auth/api-rules";
import type { Route } from "./+types/auth";

function handle(request: Request) {
  const path = new URL(request.url).pathname.replace(/^\/api\/auth/, "");
  if (!isOpenAuthEndpoint(request.method, path)) return Response.json({ error: "Not found." }, { status: 404 });
  return auth.handler(request);
}

export const loader = ({ request }: Route.LoaderArgs) => handle(request);
export const action = ({ request }: Route.ActionArgs) => handle(request);
