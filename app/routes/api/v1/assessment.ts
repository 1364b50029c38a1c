// GET /api/v1/assessments/:id → { assessment: { id, siteId, name, standard, tier, createdAt, author, options, inventory, runs, summary, mitigation } }
// PATCH /api/v1/assessments/:id { mitigationVersion, notes?, signs?: [{ id, category, x, y, where?, note?, remove? }], removeBarriers?: [ids] } → { assessment }
import { findAssessment, updateMitigation } from "~/features/assessments/assessments.server";
import { assessmentJson } from "~/features/assessments/json";
import { mitigationPatchSchema } from "~/features/assessments/schemas";
import { requireApiMember } from "~/features/auth/guard.server";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { api, apiError, methodNotAllowed, readJson } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/assessment";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: staffRoles });
  const row = await findAssessment(scopeOf(member), params.assessmentId);
  if (!row) return apiError(404, "No such assessment.");
  return Response.json({ assessment: assessmentJson(row) });
}

/** Only the mitigation plan of a frozen assessment changes, under its own version (409 when stale). */
export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "PATCH") return methodNotAllowed("GET, PATCH");
  const member = await requireApiMember(request, { roles: inventoryEditors });
  return api(async () => {
    const edit = await readJson(request, mitigationPatchSchema);
    const row = await updateMitigation(actorOf(member), params.assessmentId, edit);
    return Response.json({ assessment: assessmentJson(row) });
  });
}
