// GET /api/v1/sites/:id/emitters → { emitters }  ·  PUT { emitters: [...] } replaces the list in one
// transaction (ids kept for rows that keep their id; all or nothing) → { emitters }.
import { z } from "zod";
import { requireApiMember } from "~/features/auth/guard.server";
import { readJsonCapped, refusedAnswer } from "~/features/emitters/api.server";
import { replaceEmitters } from "~/features/emitters/bulk.server";
import { listEmitters } from "~/features/emitters/emitters.server";
import { emitterJson } from "~/features/emitters/json";
import { EMITTERS_JSON_MAX_BYTES } from "~/features/emitters/limits";
import { emitterInputSchema } from "~/features/emitters/schemas";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { api, apiError, methodNotAllowed } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site-emitters";

const putSchema = z.strictObject({
  emitters: z.array(emitterInputSchema, { error: "Send { emitters: [...] }." }).max(1000, "Send at most 1000 emitters for one site."),
});

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const site = await findSite(scopeOf(member), params.siteId);
  if (!site) return apiError(404, "No such site.");
  return Response.json({ emitters: (await listEmitters(site.id)).map(emitterJson) });
}

export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "PUT") return methodNotAllowed("GET, PUT");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return api(async () => {
    const who = actorOf(member);
    if (!(await findSite(who, params.siteId))) return apiError(404, "No such site.");
    const body = await readJsonCapped(request, putSchema, EMITTERS_JSON_MAX_BYTES);
    try {
      const rows = await replaceEmitters(who, params.siteId, body.emitters);
      return Response.json({ emitters: rows.map(emitterJson) });
    } catch (error) {
      return refusedAnswer(error);
    }
  });
}
