// GET /api/v1/sites/:id/emitters/csv → the site's emitters as CSV (README.md, "Emitter CSV").
// POST (text/csv, ≤ 5 MB) imports a file → 201 { stored, count, deleted, skipped }: ?mode=replace|append (default append), ?validOnly=true
// stores the valid rows only, ?dryRun=true checks and answers without writing (the page's preview).
import { requireApiMember } from "~/features/auth/guard.server";
import { refusedAnswer } from "~/features/emitters/api.server";
import { importEmitters } from "~/features/emitters/bulk.server";
import { exportEmittersCsv } from "~/features/emitters/export.server";
import { EMITTER_CSV_MAX_BYTES } from "~/features/emitters/csv";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSite } from "~/features/sites/sites.server";
import { api, apiError, methodNotAllowed } from "~/lib/api.server";
import { readBodyBytes } from "~/lib/body.server";
import { inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/site-emitters-csv";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireApiMember({ request, context }, { roles: staffRoles });
  const site = await findSite(scopeOf(member), params.siteId);
  if (!site) return apiError(404, "No such site.");
  const csv = await exportEmittersCsv(member.organizationId, site.id);
  const name = `${site.name.replace(/[^A-Za-z0-9._-]+/g, "-").slice(0, 60) || "site"}-emitters.csv`;
  return new Response(`\uFEFF${csv}`, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${name}"`, "cache-control": "no-store" } });
}

export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("GET, POST");
  const member = await requireApiMember({ request, context }, { roles: inventoryEditors });
  return api(async () => {
    const who = actorOf(member);
    if (!(await findSite(who, params.siteId))) return apiError(404, "No such site.");
    if (!/^text\/(csv|plain)\b/i.test(request.headers.get("content-type") ?? "")) return apiError(415, "Send the file as text/csv.");
    const query = new URL(request.url).searchParams;
    const mode = query.get("mode") ?? "append";
    if (mode !== "replace" && mode !== "append") return apiError(400, "Choose mode=replace or mode=append.", { mode: "Choose replace or append." });
    const bytes = await readBodyBytes(request, EMITTER_CSV_MAX_BYTES, "The file is larger than 5 MB. Split it, and import the parts with mode=append.");
    try {
      const result = await importEmitters(who, params.siteId, bytes, { mode, validOnly: query.get("validOnly") === "true", dryRun: query.get("dryRun") === "true" });
      if (!result.stored) return Response.json({ stored: false, count: result.count, emitters: result.emitters, skipped: result.skipped, encoding: result.encoding });
      return Response.json({ stored: true, count: result.count, deleted: result.deleted, skipped: result.skipped, encoding: result.encoding }, { status: 201 });
    } catch (error) {
      return refusedAnswer(error);
    }
  });
}
