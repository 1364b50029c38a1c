import { parseForm, readFormData } from "~/lib/form.server";
import { useState } from "react";
import { data, Form, Link, useSearchParams } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { Dialog } from "~/components/dialog";
import { FormErrors } from "~/components/field";
import { Card, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { ClientForm } from "~/features/clients/client-form";
import { deleteClient, findClient, updateClient } from "~/features/clients/clients.server";
import { clientFormSchema } from "~/features/clients/schemas";
import { siteKindLabels, type SiteKind } from "~/features/sites/kinds";
import { actorOf, scopeOf } from "~/features/sites/scope.server";
import { listSites } from "~/features/sites/sites.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { DomainError, domainErrorReply } from "~/lib/domain-error";
import { forbidden, found } from "~/lib/responses.server";
import { inviteClientContact, memberAddresses } from "~/features/clients/invite-contact.server";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/client";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${data.client.name} · Isotrope` : "Client · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const scope = scopeOf(member);
  const client = found(await findClient(scope, params.clientId), "No such client in your organisation.");
  const { sites, total } = await listSites(scope, { page: 1, pageSize: 100, q: "", clientId: client.id, sort: "name", dir: "asc" });
  const canInvite = member.role === "owner";
  // Contacts who already sign in (as members) are not offered an invitation the server would refuse.
  const members = canInvite ? await memberAddresses(member.organizationId, client.contacts.map((c) => (c.email ?? "").toLowerCase())) : new Set<string>();
  const signsIn = client.contacts.filter((c) => c.email && members.has(c.email.toLowerCase())).map((c) => c.id);
  return { client, sites, siteTotal: total, canEdit: canEditInventory(member.role), canInvite, signsIn };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  const formData = await readFormData(request);
  if (formData.get("intent") === "invite-contact") {
    if (member.role !== "owner") throw forbidden("Only the organisation's owner invites people.");
    try {
      const contact = await inviteClientContact({ organizationId: member.organizationId, userId: member.user.id, inviterName: member.user.name, organizationName: member.organizationName }, params.clientId, String(formData.get("contactId") ?? ""));
      return redirectWithFlash(`/clients/${params.clientId}`, { kind: "success", message: `Invitation sent to ${contact.email}. They will see this client's sites and issued documents only.` });
    } catch (error) {
      if (error instanceof DomainError) return data({ refusal: error.message }, { status: error.status });
      throw error;
    }
  }
  if (formData.get("intent") === "delete") {
    try {
      await deleteClient(actorOf(member), params.clientId);
    } catch (error) {
      if (error instanceof DomainError) return data({ refusal: error.message }, { status: error.status });
      throw error;
    }
    return redirectWithFlash("/clients", { kind: "success", message: "Client deleted." });
  }
  const submission = await parseForm(formData, clientFormSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const { version, ...fields } = submission.value;
  if (!version) return data(submission.reply({ formErrors: ["The form is missing the version it was opened at. Reload the page."] }), { status: 400 });
  try {
    await updateClient(actorOf(member), params.clientId, { ...fields, version });
    return redirectWithFlash(`/clients/${params.clientId}`, { kind: "success", message: "Client saved." });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function ClientPage({ loaderData, actionData }: Route.ComponentProps) {
  const { client, sites, siteTotal, canEdit, canInvite } = loaderData;
  const [params] = useSearchParams();
  const [confirm, setConfirm] = useState(false);
  const editing = canEdit && (params.has("edit") || (actionData && !("refusal" in actionData)));
  const refusal = actionData && "refusal" in actionData ? actionData.refusal : null;
  if (editing) {
    return (
      <>
        <PageHeader title={`Edit ${client.name}`} />
        <ClientForm
          lastResult={actionData && !("refusal" in actionData) ? actionData : undefined}
          defaults={{ ...client, contacts: client.contacts.map((c) => ({ id: c.id, name: c.name, email: c.email, phone: c.phone, role: c.role })) }}
          submitLabel="Save client"
          cancelTo={`/clients/${client.id}`}
        />
      </>
    );
  }
  return (
    <>
      <p className="text-sm text-graphite-600">
        <Link to="/clients" className="underline">
          Clients
        </Link>
      </p>
      <PageHeader
        title={client.name}
        actions={
          canEdit ? (
            <>
              <ButtonLink to="?edit">Edit</ButtonLink>
              <Button type="button" tone="danger" onClick={() => setConfirm(true)}>
                Delete
              </Button>
            </>
          ) : null
        }
      />
      <FormErrors errors={refusal ? [refusal] : null} />
      <div className="grid gap-5 md:grid-cols-2">
        <Card title="Billing address">
          <p className="text-sm whitespace-pre-line break-words text-ink-700">{client.billingAddress || "None recorded."}</p>
          {client.notes ? (
            <>
              <h3 className="mt-4 text-sm font-medium text-graphite-600">Notes</h3>
              <p className="mt-1 text-sm whitespace-pre-line break-words text-ink-700">{client.notes}</p>
            </>
          ) : null}
        </Card>
        <Card title="Contacts">
          {client.contacts.length === 0 ? (
            <p className="text-sm text-graphite-600">No contacts yet.</p>
          ) : (
            <ul className="divide-y divide-rule text-sm">
              {client.contacts.map((c) => (
                <li key={c.id} className="py-2">
                  <span className="block font-medium break-words text-ink-900">
                    {c.name}
                    {c.role ? <span className="font-normal text-graphite-600"> · {c.role}</span> : null}
                  </span>
                  <span className="block break-words text-graphite-600">{[c.email, c.phone].filter(Boolean).join(" · ") || "No e-mail or phone"}</span>
                  {canInvite && loaderData.signsIn.includes(c.id) ? (
                    <span className="mt-1 block text-sm text-graphite-600">Already a member of your organisation: no invitation needed.</span>
                  ) : canInvite && c.email ? (
                    <Form method="post" className="mt-1">
                      <input type="hidden" name="intent" value="invite-contact" />
                      <input type="hidden" name="contactId" value={c.id} />
                      <Button tone="quiet" size="sm" className="px-0" aria-label={`Invite ${c.name} to see this client's sites`}>
                        Invite to the client portal
                      </Button>
                    </Form>
                  ) : null}
                </li>
              ))}
            </ul>
          )}
        </Card>
        <div className="md:col-span-2">
          <Card title={`Sites (${siteTotal})`} actions={canEdit ? <ButtonLink to={`/sites/new?client=${client.id}`}>New site for this client</ButtonLink> : null}>
            {sites.length === 0 ? (
              <p className="text-sm text-graphite-600">No sites for this client yet.</p>
            ) : (
              <ul className="divide-y divide-rule text-sm">
                {sites.map((s) => (
                  <li key={s.id} className="flex flex-wrap justify-between gap-2 py-2">
                    <Link to={`/sites/${s.id}`} className="font-medium break-words text-ink-900 underline">
                      {s.name}
                    </Link>
                    <span className="text-graphite-600">
                      {siteKindLabels[s.kind as SiteKind] ?? s.kind}
                      {s.city ? ` · ${s.city}` : ""} · {s.emitterCount} emitter{s.emitterCount === 1 ? "" : "s"}
                    </span>
                  </li>
                ))}
              </ul>
            )}
          </Card>
        </div>
      </div>
      <Dialog open={confirm} onClose={() => setConfirm(false)} title={`Delete ${client.name}?`}>
        <p className="text-sm text-graphite-600">The client and its contacts are removed. A client with sites cannot be deleted: move or delete the sites first.</p>
        <Form method="post" className="mt-4 flex justify-end gap-2" onSubmit={() => setConfirm(false)}>
          <input type="hidden" name="intent" value="delete" />
          <Button type="button" tone="secondary" onClick={() => setConfirm(false)}>
            Keep
          </Button>
          <Button tone="danger">Delete</Button>
        </Form>
      </Dialog>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
