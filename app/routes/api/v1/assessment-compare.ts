// GET /api/v1/assessments/:a/compare/:b → { a, b, options, inventory: { emitters, surfaces, obstructions, accessPoints }, results }
import { compareById } from "~/features/assessments/assessments.server";
import { requireApiMember } from "~/features/auth/guard.server";
import { scopeOf } from "~/features/sites/scope.server";
import { api } from "~/lib/api.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/assessment-compare";

const head = (r: { id: string; name: string; createdAt: Date; authorName: string; authorUserId: string | null; standard: string; tier: string }) => ({ id: r.id, name: r.name, createdAt: r.createdAt.toISOString(), author: { id: r.authorUserId, name: r.authorName }, standard: r.standard, tier: r.tier });

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: staffRoles });
  return api(async () => {
    const { a, b, comparison } = await compareById(scopeOf(member), params.a, params.b);
    return Response.json({ a: head(a), b: head(b), ...comparison });
  });
}
