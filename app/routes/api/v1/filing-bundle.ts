// GET /api/v1/filings/:id/bundle → application/zip (layout in README, "Filing bundles"). Another
// organisation's filing, or for a regulator one addressed to someone else, is 404.
import { requireApiMember } from "~/features/auth/guard.server";
import { filingBundle, zipResponse } from "~/features/filings/bundle.server";
import { filingReaders, requireFiling } from "~/features/filings/filings.server";
import { readerOf } from "~/features/filings/reader.server";
import { api } from "~/lib/api.server";
import type { Route } from "./+types/filing-bundle";

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireApiMember(request, { roles: filingReaders });
  return api(async () => zipResponse(await filingBundle(await requireFiling(readerOf(member), params.filingId))));
}
