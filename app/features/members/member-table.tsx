// The members table: role select with Save, joined date, Remove with a confirmation.
// Below 48rem each member is a card (TableShell's stack), so every control stays on screen.
import { createColumnHelper } from "@tanstack/react-table";
import { useState } from "react";
import { Form } from "react-router";
import { Button } from "~/components/button";
import { DateText } from "~/components/date-text";
import { Dialog } from "~/components/dialog";
import { TableShell } from "~/components/table-shell";
import { roleOptions } from "./role-options";

export type MemberRow = { id: string; role: string; joinedAt: Date | string; userId: string; name: string; email: string; clientName?: string | null };

const column = createColumnHelper<MemberRow>();

function RoleCell({ row }: { row: MemberRow }) {
  return (
    <Form method="post" className="flex items-center gap-2">
      <input type="hidden" name="intent" value="change-role" />
      <input type="hidden" name="memberId" value={row.id} />
      <label className="sr-only" htmlFor={`role-${row.id}`}>
        Role of {row.name}
      </label>
      <select id={`role-${row.id}`} name="role" defaultValue={row.role} className="min-h-8 min-w-0 flex-1 rounded-control border border-rule-strong bg-sheet px-2 py-1 text-sm">
        {roleOptions.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <Button tone="secondary" size="sm">
        Save
      </Button>
    </Form>
  );
}

function RemoveCell({ row, isMe }: { row: MemberRow; isMe: boolean }) {
  const [open, setOpen] = useState(false);
  if (isMe) return <span className="label-caps">You</span>;
  return (
    <>
      <Button type="button" tone="danger" size="sm" onClick={() => setOpen(true)}>
        Remove
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title={`Remove ${row.name}?`}>
        <p className="text-graphite-600">They lose access to the organisation at once. Their past work stays.</p>
        <Form method="post" className="mt-5 flex justify-end gap-2" onSubmit={() => setOpen(false)}>
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

export function MemberTable({ members, myUserId }: { members: MemberRow[]; myUserId: string }) {
  const columns = [
    column.accessor("name", { header: "Name", cell: (c) => <span className="font-medium">{c.getValue()}</span> }),
    column.accessor("email", { header: "E-mail" }),
    column.display({
      id: "role",
      header: "Role",
      cell: (c) => (
        <>
          <RoleCell row={c.row.original} />
          {c.row.original.role === "client" ? (
            <span className="mt-1 block text-sm text-graphite-600">{c.row.original.clientName ? `Sees ${c.row.original.clientName}` : "Bound to no client: sees nothing"}</span>
          ) : null}
        </>
      ),
    }),
    column.accessor("joinedAt", { header: "Joined", cell: (c) => <DateText value={c.getValue()} figures /> }),
    column.display({
      id: "remove",
      header: () => <span className="sr-only">Remove</span>,
      cell: (c) => <RemoveCell row={c.row.original} isMe={c.row.original.userId === myUserId} />,
    }),
  ];
  return <TableShell caption="Members of the organisation" columns={columns} rows={members} empty="No members yet." stack />;
}
