import { parseForm } from "~/lib/form.server";
import { data } from "react-router";
import { requireMember } from "~/features/auth/guard.server";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { findSiteForRequest } from "~/features/sites/sites.server";
import { visitFormSchema } from "~/features/visits/schemas";
import { VisitForm } from "~/features/visits/visit-form";
import { createVisit } from "~/features/visits/visits.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { found } from "~/lib/responses.server";
import { inventoryEditors } from "~/lib/roles";
import type { Route } from "./+types/visit-new";

export const meta: Route.MetaFunction = () => [{ title: "New visit · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  return { siteId: site.id, today: new Date().toISOString().slice(0, 10) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const member = await requireMember(request, { roles: inventoryEditors });
  const submission = await parseForm(request, visitFormSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const { version: _v, ...input } = submission.value;
  try {
    const visit = await createVisit(actorOf(member), params.siteId, input);
    return redirectWithFlash(`/sites/${params.siteId}/visits/${visit.id}`, { kind: "success", message: "Visit recorded. Add its photos and readings below." });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function NewVisit({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <section aria-labelledby="new-visit-title">
      <h2 id="new-visit-title" className="mb-4 text-lg font-semibold">
        New visit
      </h2>
      <VisitForm lastResult={actionData} defaults={{ visitedOn: loaderData.today }} submitLabel="Record the visit" cancelTo={`/sites/${loaderData.siteId}/visits`} />
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
