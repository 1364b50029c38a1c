// GET /api/v1/visits/:id/readings  ·  POST /api/v1/visits/:id/readings, JSON { readings: [...] } or a CSV body
// (text/csv, the layout in README.md) → 201 { readings }; any problem → 400 with every problem, nothing stored;
// ?validOnly=true stores the valid readings and returns the others as `skipped`.
import { requireApiMember } from "~/features/auth/guard.server";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { readingJson } from "~/features/visits/json";
import { postReadings } from "~/features/visits/readings-api.server";
import { listReadings } from "~/features/visits/readings.server";
import { findVisit, requireVisit } from "~/features/visits/visits.server";
import { api, apiError, methodNotAllowed } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/visit-readings";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: staffRoles });
  const visit = await findVisit(scopeOf(member), params.visitId);
  if (!visit) return apiError(404, "No such visit.");
  return Response.json({ readings: (await listReadings(visit.id)).map(readingJson) });
}

export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  const member = await requireApiMember(request, { roles: inventoryEditors });
  const who = actorOf(member);
  return api(async () => {
    const visit = await requireVisit(who, params.visitId);
    return postReadings(who, visit.id, request);
  });
}
