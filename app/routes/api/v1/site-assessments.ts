// GET /api/v1/sites/:id/assessments (newest first, without runs)  ·  POST /api/v1/sites/:id/assessments → 201 { assessment }
import { listAssessments } from "~/features/assessments/assessments.server";
import { freezeAssessment } from "~/features/assessments/freeze.server";
import { assessmentJson, assessmentListJson } from "~/features/assessments/json";
import { freezeApiSchema } from "~/features/assessments/schemas";
import { requireApiMember } from "~/features/auth/guard.server";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { api, apiError, methodNotAllowed, readJson } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site-assessments";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: staffRoles });
  const site = await findSite(scopeOf(member), params.siteId);
  if (!site) return apiError(404, "No such site.");
  const rows = await listAssessments(site.id);
  return Response.json({ assessments: rows.map(assessmentListJson) });
}

export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  const member = await requireApiMember(request, { roles: inventoryEditors });
  return api(async () => {
    const input = await readJson(request, freezeApiSchema);
    const created = await freezeAssessment({ ...actorOf(member), name: member.user.name }, params.siteId, input);
    return Response.json({ assessment: assessmentJson(created) }, { status: 201 });
  });
}
