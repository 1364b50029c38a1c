// GET /api/v1/visits/:id → { visit: { …, photos: [...], readings: [...] } }
import { requireApiMember } from "~/features/auth/guard.server";
import { scopeOf } from "~/features/sites/scope.server";
import { photoJson, readingJson, visitJson } from "~/features/visits/json";
import { listPhotos } from "~/features/visits/photos.server";
import { listReadings } from "~/features/visits/readings.server";
import { findVisit } from "~/features/visits/visits.server";
import { apiError } from "~/lib/api.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/visit";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: staffRoles });
  const visit = await findVisit(scopeOf(member), params.visitId);
  if (!visit) return apiError(404, "No such visit.");
  const [photos, readings] = await Promise.all([listPhotos(visit.id), listReadings(visit.id)]);
  return Response.json({
    visit: { ...visitJson(visit, { photoCount: photos.length, readingCount: readings.length }), photos: photos.map(photoJson), readings: readings.map(readingJson) },
  });
}
