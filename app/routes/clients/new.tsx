import { parseForm } from "~/lib/form.server";
import { data } from "react-router";
import { PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { ClientForm } from "~/features/clients/client-form";
import { createClient } from "~/features/clients/clients.server";
import { clientFormSchema } from "~/features/clients/schemas";
import { actorOf } from "~/features/sites/scope.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { inventoryEditors } from "~/lib/roles";
import type { Route } from "./+types/new";

export const meta: Route.MetaFunction = () => [{ title: "New client · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  await requireMember({ request, context }, { roles: inventoryEditors });
  return null;
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const submission = await parseForm(request, clientFormSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const { version: _v, ...input } = submission.value;
  try {
    const client = await createClient(actorOf(member), input);
    return redirectWithFlash(`/clients/${client.id}`, { kind: "success", message: `${client.name} is recorded.` });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function NewClient({ actionData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="New client">A landlord or property company, and the people you deal with there.</PageHeader>
      <ClientForm lastResult={actionData} submitLabel="Record the client" cancelTo="/clients" />
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
