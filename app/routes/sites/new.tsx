import { parseForm } from "~/lib/form.server";
import { data } from "react-router";
import { PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { clientOptions } from "~/features/clients/clients.server";
import { siteFormSchema } from "~/features/sites/schemas";
import { SiteForm } from "~/features/sites/site-form";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { createSite } from "~/features/sites/sites.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { inventoryEditors } from "~/lib/roles";
import type { Route } from "./+types/new";

export const meta: Route.MetaFunction = () => [{ title: "New site · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const preset = new URL(request.url).searchParams.get("client")?.slice(0, 64) ?? null;
  return { clients: await clientOptions(scopeOf(member)), preset };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const submission = await parseForm(request, siteFormSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const { version: _v, ...input } = submission.value;
  try {
    const site = await createSite(actorOf(member), input);
    return redirectWithFlash(`/sites/${site.id}`, { kind: "success", message: `${site.name} is recorded. Draw its walkable areas next.` });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function NewSite({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="New site">Its address, its client, and what height zero means there. Layout, emitters and visits come next.</PageHeader>
      <SiteForm lastResult={actionData} clients={loaderData.clients} defaults={{ clientId: loaderData.preset }} submitLabel="Record the site" cancelTo="/sites" />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
