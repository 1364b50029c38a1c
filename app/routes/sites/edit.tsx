import { parseForm } from "~/lib/form.server";
import { data } from "react-router";
import { requireMember } from "~/features/auth/guard.server";
import { clientOptions } from "~/features/clients/clients.server";
import { siteFormSchema } from "~/features/sites/schemas";
import { SiteForm } from "~/features/sites/site-form";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest, updateSite } from "~/features/sites/sites.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { found } from "~/lib/responses.server";
import { inventoryEditors } from "~/lib/roles";
import type { Route } from "./+types/edit";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const scope = scopeOf(member);
  const site = found(await findSiteForRequest({ request, context }, scope, params.siteId), "No such site in your organisation.");
  return { site, clients: await clientOptions(scope) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const submission = await parseForm(request, siteFormSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const { version, ...fields } = submission.value;
  if (!version) return data(submission.reply({ formErrors: ["The form is missing the version it was opened at. Reload the page."] }), { status: 400 });
  try {
    await updateSite(actorOf(member), params.siteId, { ...fields, version });
    return redirectWithFlash(`/sites/${params.siteId}`, { kind: "success", message: "Site details saved." });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function EditSite({ loaderData, actionData }: Route.ComponentProps) {
  const { site, clients } = loaderData;
  return (
    <section aria-labelledby="edit-title">
      <h2 id="edit-title" className="mb-4 text-lg font-semibold">
        Site details
      </h2>
      <SiteForm lastResult={actionData} defaults={site} clients={clients} submitLabel="Save details" cancelTo={`/sites/${site.id}`} />
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
