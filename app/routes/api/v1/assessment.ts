// GET /api/v1/assessments/:id → { assessment: { id, siteId, name, standard, tier, createdAt, author, options, inventory, runs, summary, mitigation } }
import { findAssessment } from "~/features/assessments/assessments.server";
import { assessmentJson } from "~/features/assessments/json";
import { requireApiMember } from "~/features/auth/guard.server";
import { scopeOf } from "~/features/sites/scope.server";
import { apiError } from "~/lib/api.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/assessment";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: staffRoles });
  const row = await findAssessment(scopeOf(member), params.assessmentId);
  if (!row) return apiError(404, "No such assessment.");
  return Response.json({ assessment: assessmentJson(row) });
}
