import { data, useActionData } from "react-router";
import { FormErrors } from "~/components/field";
import { Card, PageHeader } from "~/components/panels";
import { InvitationList } from "~/features/members/invitation-list";
import { InviteForm } from "~/features/members/invite-form";
import { MemberTable } from "~/features/members/member-table";
import { memberActionSchema } from "~/features/members/schemas";
import { parseForm } from "~/lib/form.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { cancelInvitation, inviteMember, listPendingInvitations } from "~/features/members/invitations.server";
import { changeRole, listMembers, removeMember } from "~/features/members/members.server";
import { domainErrorReply } from "~/lib/domain-error";
import { requireMember } from "~/features/auth/guard.server";
import { clientOptions } from "~/features/clients/clients.server";
import { scopeOf } from "~/features/sites/scope.server";
import { roleLabels } from "~/lib/roles";
import type { Route } from "./+types/members";

export const meta: Route.MetaFunction = () => [{ title: "Members · Isotrope" }];

export async function loader(args: Route.LoaderArgs) {
  const me = await requireMember(args, { roles: ["owner"] });
  const [members, invitations, clients] = await Promise.all([listMembers(me.organizationId), listPendingInvitations(me.organizationId), clientOptions(scopeOf(me))]);
  return { members, invitations, clients, myUserId: me.user.id };
}

export async function action({ request, context }: Route.ActionArgs) {
  const me = await requireMember({ request, context }, { roles: ["owner"] });
  const submission = await parseForm(request, memberActionSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const actor = { organizationId: me.organizationId, userId: me.user.id };
  const value = submission.value;
  try {
    switch (value.intent) {
      case "invite":
        await inviteMember({ ...actor, inviterName: me.user.name, organizationName: me.organizationName }, value.email, value.role, { clientId: value.clientId });
        return redirectWithFlash("/members", { kind: "success", message: `Invitation sent to ${value.email}.` });
      case "change-role":
        await changeRole(actor, value.memberId, value.role);
        return redirectWithFlash("/members", { kind: "success", message: `Role changed to ${roleLabels[value.role]}.` });
      case "remove":
        await removeMember(actor, value.memberId);
        return redirectWithFlash("/members", { kind: "success", message: "Member removed." });
      case "cancel-invite":
        await cancelInvitation(actor, value.invitationId);
        return redirectWithFlash("/members", { kind: "success", message: "Invitation withdrawn." });
    }
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

export default function Members({ loaderData }: Route.ComponentProps) {
  const { members, invitations, clients, myUserId } = loaderData;
  const lastResult = useActionData<typeof action>();
  const intent = lastResult?.initialValue?.intent;
  const otherError = lastResult && intent !== "invite" ? lastResult.error?.[""] : null;
  return (
    <>
      <PageHeader title="Members">Who may sign in to your organisation, and as what.</PageHeader>
      <div className="space-y-6">
        <FormErrors errors={otherError} />
        <MemberTable members={members} myUserId={myUserId} />
        <div className="grid gap-6 md:grid-cols-2">
          <Card title="Invite someone">
            <InviteForm key={invitations.map((i) => i.id).join()} lastResult={intent === "invite" ? lastResult : undefined} invitations={invitations} clients={clients} />
          </Card>
          <Card title="Invitations waiting">
            <InvitationList invitations={invitations} />
          </Card>
        </div>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
