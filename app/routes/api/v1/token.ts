// DELETE /api/v1/tokens/:id: revokes one of your own tokens.
import { requireApiMember } from "~/features/auth/guard.server";
import { revokeToken } from "~/features/auth/tokens.server";
import { api, methodNotAllowed } from "~/lib/api.server";
import type { Route } from "./+types/token";

export async function loader() {
  return methodNotAllowed("DELETE");
}

export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "DELETE") return methodNotAllowed("DELETE");
  const member = await requireApiMember({ request, context });
  return api(async () => {
    await revokeToken({ organizationId: member.organizationId, userId: member.user.id, memberId: member.memberId }, params.tokenId);
    return new Response(null, { status: 204 });
  });
}
