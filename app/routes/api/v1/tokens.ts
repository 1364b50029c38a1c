// POST /api/v1/tokens { name } → 201 { token } (shown once). Only from a signed-in session, never with a token.
import { requireApiMember } from "~/features/auth/guard.server";
import { tokenCreateSchema } from "~/features/auth/token-schemas";
import { createToken, listTokens } from "~/features/auth/tokens.server";
import { api, apiError, methodNotAllowed, readJson } from "~/lib/api.server";
import type { Route } from "./+types/tokens";

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context });
  const tokens = await listTokens(member.memberId);
  return Response.json({ tokens: tokens.map((t) => ({ ...t, createdAt: t.createdAt.toISOString(), lastUsedAt: t.lastUsedAt?.toISOString() ?? null })) });
}

export async function action({ request, context }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  if (request.headers.get("authorization")) return apiError(403, "Create API tokens while signed in, not with another token.");
  const member = await requireApiMember({ request, context });
  return api(async () => {
    const { name } = await readJson(request, tokenCreateSchema);
    const created = await createToken({ organizationId: member.organizationId, userId: member.user.id, memberId: member.memberId }, name);
    return Response.json(
      { token: created.token, id: created.id, name: created.name, prefix: created.prefix, createdAt: created.createdAt.toISOString(), note: "Copy the token now: it is not shown again." },
      { status: 201 },
    );
  });
}
