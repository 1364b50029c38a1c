// Invitations still waiting: who, as what, until when; send again (same role) or withdraw.
import { Form } from "react-router";
import { Button } from "~/components/button";
import { DateText } from "~/components/date-text";
import { EmptyState } from "~/components/panels";
import { isRole, roleLabels } from "~/lib/roles";

export type InvitationRow = { id: string; email: string; role: string; expiresAt: Date | string; clientId?: string | null; clientName?: string | null };

/** A stored role as people read it; an unknown value is shown as stored. */
export const invitationRoleLabel = (role: string) => (isRole(role) ? roleLabels[role] : role);

export function InvitationList({ invitations }: { invitations: InvitationRow[] }) {
  if (invitations.length === 0) return <EmptyState title="None waiting." />;
  return (
    <ul className="divide-y divide-rule">
      {invitations.map((i) => (
        <li key={i.id} className="flex flex-wrap items-center justify-between gap-x-3 gap-y-1 py-3 first:pt-0 last:pb-0">
          <span className="min-w-0">
            <span className="block font-medium [overflow-wrap:anywhere]">{i.email}</span>
            <span className="block text-sm text-graphite-600">
              {invitationRoleLabel(i.role)}
              {i.clientName ? <> for {i.clientName}</> : null} · until <DateText value={i.expiresAt} />
            </span>
          </span>
          <span className="flex gap-3">
            <Form method="post">
              <input type="hidden" name="intent" value="invite" />
              <input type="hidden" name="email" value={i.email} />
              <input type="hidden" name="role" value={i.role} />
              {i.clientId ? <input type="hidden" name="clientId" value={i.clientId} /> : null}
              <Button tone="quiet" size="sm" className="px-0" aria-label={`Send the invitation to ${i.email} again`}>
                Send again
              </Button>
            </Form>
            <Form method="post">
              <input type="hidden" name="intent" value="cancel-invite" />
              <input type="hidden" name="invitationId" value={i.id} />
              <Button tone="quiet" size="sm" className="px-0" aria-label={`Withdraw the invitation to ${i.email}`}>
                Withdraw
              </Button>
            </Form>
          </span>
        </li>
      ))}
    </ul>
  );
}
