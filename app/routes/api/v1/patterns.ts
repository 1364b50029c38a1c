// GET /api/v1/patterns → { patterns }  ·  POST { name, maker?, model?, gainDbi?, frequencyMHz?, notes?, pattern } → 201 { pattern }
import { requireApiMember } from "~/features/auth/guard.server";
import { readJsonCapped } from "~/features/emitters/api.server";
import { PATTERN_JSON_MAX_BYTES } from "~/features/emitters/limits";
import { patternInputSchema } from "~/features/emitters/pattern-schemas";
import { createPattern, listPatterns, patternJson } from "~/features/emitters/patterns.server";
import { actorOf } from "~/features/sites/scope.server";
import { api, methodNotAllowed } from "~/lib/api.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/patterns";

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const rows = await listPatterns(member.organizationId);
  return Response.json({ patterns: rows.map(({ uses, ...p }) => ({ ...patternJson(p), emitterCount: uses })) });
}

export async function action({ request, context }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return api(async () => {
    const input = await readJsonCapped(request, patternInputSchema, PATTERN_JSON_MAX_BYTES);
    const row = await createPattern(actorOf(member), input);
    return Response.json({ pattern: patternJson(row) }, { status: 201 });
  });
}
