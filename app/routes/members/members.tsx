import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { createColumnHelper } from "@tanstack/react-table";
import { useState } from "react";
import { data, Form, useActionData } from "react-router";
import { Button } from "~/components/button";
import { Dialog } from "~/components/dialog";
import { Field, FormErrors, SelectField } from "~/components/field";
import { Card, EmptyState, PageHeader } from "~/components/panels";
import { TableShell } from "~/components/table-shell";
import { inputProps } from "~/lib/conform";
import { parseForm } from "~/lib/form.server";
import { inviteSchema, memberActionSchema } from "~/features/members/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import { cancelInvitation, inviteMember, listPendingInvitations } from "~/features/members/invitations.server";
import { changeRole, listMembers, removeMember } from "~/features/members/members.server";
import { domainErrorReply } from "~/lib/domain-error";
import { requireMember } from "~/features/auth/guard.server";
import { isRole, roleLabels, roles } from "~/lib/roles";
import type { Route } from "./+types/members";

export const meta: Route.MetaFunction = () => [{ title: "Members · Isotrope" }];

const roleOptions = roles.map((r) => ({ value: r, label: roleLabels[r] }));

export async function loader(args: Route.LoaderArgs) {
  const me = await requireMember(args, { roles: ["owner"] });
  const [members, invitations] = await Promise.all([listMembers(me.organizationId), listPendingInvitations(me.organizationId)]);
  return { members, invitations, myUserId: me.user.id };
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
        await inviteMember({ ...actor, inviterName: me.user.name, organizationName: me.organizationName }, value.email, value.role);
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

type MemberRow = Route.ComponentProps["loaderData"]["members"][number];
const column = createColumnHelper<MemberRow>();

function RoleCell({ row }: { row: MemberRow }) {
  return (
    <Form method="post" className="flex items-center gap-2">
      <input type="hidden" name="intent" value="change-role" />
      <input type="hidden" name="memberId" value={row.id} />
      <label className="sr-only" htmlFor={`role-${row.id}`}>
        Role of {row.name}
      </label>
      <select id={`role-${row.id}`} name="role" defaultValue={row.role} className="rounded-md border border-ink-200 bg-white px-2 py-1 text-sm">
        {roleOptions.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <Button tone="secondary" className="px-2.5 py-1">
        Save
      </Button>
    </Form>
  );
}

function RemoveCell({ row, isMe }: { row: MemberRow; isMe: boolean }) {
  const [open, setOpen] = useState(false);
  if (isMe) return <span className="text-xs text-ink-600">you</span>;
  return (
    <>
      <Button type="button" tone="danger" className="px-2.5 py-1" onClick={() => setOpen(true)}>
        Remove
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title={`Remove ${row.name}?`}>
        <p className="text-sm text-ink-600">They lose access to the organisation at once. Their past work stays.</p>
        <Form method="post" className="mt-4 flex justify-end gap-2" onSubmit={() => setOpen(false)}>
          <input type="hidden" name="intent" value="remove" />
          <input type="hidden" name="memberId" value={row.id} />
          <Button type="button" tone="secondary" onClick={() => setOpen(false)}>
            Keep
          </Button>
          <Button tone="danger">Remove</Button>
        </Form>
      </Dialog>
    </>
  );
}

export default function Members({ loaderData }: Route.ComponentProps) {
  const { members, invitations, myUserId } = loaderData;
  const lastResult = useActionData<typeof action>();
  const [form, fields] = useForm({
    id: "invite",
    lastResult: lastResult && "intent" in (lastResult.initialValue ?? {}) && lastResult.initialValue?.intent === "invite" ? lastResult : undefined,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: inviteSchema }),
    shouldValidate: "onBlur",
    defaultValue: { role: "engineer" },
  });
  const otherError = lastResult && lastResult.initialValue?.intent !== "invite" ? lastResult.error?.[""] : null;
  const columns = [
    column.accessor("name", { header: "Name" }),
    column.accessor("email", { header: "E-mail" }),
    column.display({ id: "role", header: "Role", cell: (c) => <RoleCell row={c.row.original} /> }),
    column.accessor("joinedAt", { header: "Joined", cell: (c) => new Date(c.getValue()).toLocaleDateString("en-GB") }),
    column.display({ id: "remove", header: () => <span className="sr-only">Remove</span>, cell: (c) => <RemoveCell row={c.row.original} isMe={c.row.original.userId === myUserId} /> }),
  ];
  return (
    <>
      <PageHeader title="Members">Who may sign in to your organisation, and as what.</PageHeader>
      <div className="space-y-6">
        <FormErrors errors={otherError} />
        <TableShell caption="Members of the organisation" columns={columns} rows={members} empty="No members yet." />
        <div className="grid gap-6 md:grid-cols-2">
          <Card title="Invite someone">
            <Form method="post" {...getFormProps(form)} key={invitations.map((i) => i.id).join()} className="space-y-4">
              <input type="hidden" name="intent" value="invite" />
              <FormErrors errors={form.errors} />
              <Field label="E-mail" autoComplete="off" {...inputProps(fields.email, "email")} />
              <SelectField label="Role" id={fields.role.id} name={fields.role.name} defaultValue={fields.role.initialValue as string} errors={fields.role.errors} options={roleOptions} />
              <Button>Send invitation</Button>
            </Form>
          </Card>
          <Card title="Invitations waiting">
            {invitations.length === 0 ? (
              <EmptyState title="None waiting." />
            ) : (
              <ul className="divide-y divide-ink-100 text-sm">
                {invitations.map((i) => (
                  <li key={i.id} className="flex items-center justify-between gap-3 py-2">
                    <span>
                      <span className="block text-ink-900">{i.email}</span>
                      <span className="block text-xs text-ink-600">
                        {isRole(i.role) ? roleLabels[i.role] : i.role} · until {new Date(i.expiresAt).toLocaleDateString("en-GB")}
                      </span>
                    </span>
                    <Form method="post">
                      <input type="hidden" name="intent" value="cancel-invite" />
                      <input type="hidden" name="invitationId" value={i.id} />
                      <Button tone="quiet" className="px-2 py-1" aria-label={`Withdraw the invitation to ${i.email}`}>
                        Withdraw
                      </Button>
                    </Form>
                  </li>
                ))}
              </ul>
            )}
          </Card>
        </div>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
