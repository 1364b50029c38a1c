// GET /api/v1/documents?siteId=&kind=&state= → { documents: [{ id, kind, state, siteId, assessmentId, version, code, sha256, issuedAt }] }
// Staff see their organisation's; a client member only issued documents of its own client.
import { requireApiMember } from "~/features/auth/guard.server";
import { listDocuments } from "~/features/documents/documents.server";
import { documentJson } from "~/features/documents/json";
import { listQuerySchema } from "~/features/documents/schemas";
import { scopeOf } from "~/features/sites/scope.server";
import { apiError, zodFieldErrors } from "~/lib/api.server";
import type { Route } from "./+types/documents";

export const documentReaders = ["owner", "engineer", "reviewer", "billing", "client"] as const;

export async function loader({ request }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: documentReaders });
  const query = Object.fromEntries(new URL(request.url).searchParams);
  const parsed = listQuerySchema.safeParse(query);
  if (!parsed.success) return apiError(400, "Some query parameters are not valid.", zodFieldErrors(parsed.error));
  const rows = await listDocuments(scopeOf(member), parsed.data);
  return Response.json({ documents: rows.map(documentJson) });
}
