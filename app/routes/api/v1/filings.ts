// GET /api/v1/filings?siteId=&authority=&from=&to= → { filings: [{ id, siteId, assessmentId, authority, filedAt }] }, newest first.
// A regulator member: its inbox; owner, engineer, reviewer: the organisation's; billing and client: 403.
import { requireApiMember } from "~/features/auth/guard.server";
import { filingReaders, listFilings } from "~/features/filings/filings.server";
import { filingJson } from "~/features/filings/json";
import { readerOf } from "~/features/filings/reader.server";
import { filterSchema } from "~/features/filings/schemas";
import { apiError, zodFieldErrors } from "~/lib/api.server";
import type { Route } from "./+types/filings";

export async function loader({ request }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: filingReaders });
  const parsed = filterSchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) return apiError(400, "Some query parameters are not valid.", zodFieldErrors(parsed.error));
  const rows = await listFilings(readerOf(member), parsed.data);
  return Response.json({ filings: rows.map(filingJson) });
}
