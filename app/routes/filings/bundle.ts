// GET /filings/:filingId/bundle: a filing's ZIP bundle (manifest, engine runs, inventory CSV, method, report PDF).
// A regulator member gets only filings addressed to it; staff their organisation's; anything else is 404.
import { requireMember } from "~/features/auth/guard.server";
import { filingBundle, zipResponse } from "~/features/filings/bundle.server";
import { filingReaders, requireFiling } from "~/features/filings/filings.server";
import { readerOf } from "~/features/filings/reader.server";
import { DomainError } from "~/lib/domain-error";
import type { Route } from "./+types/bundle";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: filingReaders });
  try {
    const filing = await requireFiling(readerOf(member), params.filingId);
    return zipResponse(await filingBundle(filing));
  } catch (error) {
    if (error instanceof DomainError) return new Response(error.message, { status: error.status, headers: { "content-type": "text/plain; charset=utf-8" } });
    throw error;
  }
}
