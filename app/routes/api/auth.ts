// better-auth's HTTP endpoints. The organisation plugin's endpoints stay closed:
// pages manage members through server calls guarded by our own role checks.
import { auth } from "~/features/auth/auth.server";
import type { Route } from "./+types/auth";

function handle(request: Request) {
  const path = new URL(request.url).pathname;
  if (path.startsWith("/api/auth/organization/")) {
    return Response.json({ error: "Not found." }, { status: 404 });
  }
  return auth.handler(request);
}

export const loader = ({ request }: Route.LoaderArgs) => handle(request);
export const action = ({ request }: Route.ActionArgs) => handle(request);
