// POST (multipart, field "image") and DELETE /api/v1/sites/:id/backdrop: the roof drawing under the plan.
// Its placement (two points a known distance apart, origin, rotation, opacity) is saved with the layout.
import { requireApiMember } from "~/features/auth/guard.server";
import { readBackdropUpload } from "~/features/layout/backdrop-upload.server";
import { putBackdrop, removeBackdrop } from "~/features/layout/backdrop.server";
import { layoutApi } from "~/features/layout/layout-api.server";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { requireSite } from "~/features/sites/sites.server";
import { methodNotAllowed } from "~/lib/api.server";
import { inventoryEditors } from "~/lib/roles";
import type { Route } from "./+types/site-backdrop";

export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "POST" && request.method !== "DELETE") return methodNotAllowed("POST, DELETE");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return layoutApi(async () => {
    if (request.method === "DELETE") return Response.json(await removeBackdrop(actorOf(member), params.siteId));
    // The site first, so another organisation's id is a 404 before any byte is read.
    await requireSite(scopeOf(member), params.siteId);
    const upload = await readBackdropUpload(request);
    return Response.json(await putBackdrop(actorOf(member), params.siteId, upload), { status: 201 });
  });
}
