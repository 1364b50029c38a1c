import { databaseIsUp } from "~/infra/health.server";

export async function loader() {
  const up = await databaseIsUp();
  return Response.json(
    { status: up ? "ok" : "degraded", database: up ? "ok" : "down" },
    { status: up ? 200 : 503, headers: { "cache-control": "no-store" } },
  );
}
