// GET /api/v1/sites/:id/history → { events: [{ at, actor, action, entity, entityId, before, after }] }, newest first
import { requireApiMember } from "~/features/auth/guard.server";
import { siteHistory } from "~/features/history/history.server";
import { scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { apiError } from "~/lib/api.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site-history";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const site = await findSite(scopeOf(member), params.siteId);
  if (!site) return apiError(404, "No such site.");
  const events = await siteHistory(member.organizationId, site.id, 1000);
  return Response.json({
    events: events.map((e) => ({
      at: e.at.toISOString(),
      actor: e.actor ? { id: e.actorUserId, name: e.actor, email: e.actorEmail } : null,
      action: e.action,
      entity: e.entity,
      entityId: e.entityId,
      before: e.before,
      after: e.after,
    })),
  });
}
