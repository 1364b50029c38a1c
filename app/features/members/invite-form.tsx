// The invite form. The role follows the address: typing someone who already has an invitation
// waiting picks that invitation's role and says so, so sending again never quietly changes it.
import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useState } from "react";
import { Form } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors, SelectField } from "~/components/field";
import { inputProps } from "~/lib/conform";
import { invitationRoleLabel, type InvitationRow } from "./invitation-list";
import { roleOptions } from "./role-options";
import { inviteSchema } from "./schemas";

export function InviteForm({ lastResult, invitations, clients }: { lastResult?: SubmissionResult<string[]>; invitations: InvitationRow[]; clients: { id: string; name: string }[] }) {
  const [form, fields] = useForm({
    id: "invite",
    lastResult,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: inviteSchema }),
    shouldValidate: "onBlur",
    defaultValue: { role: "engineer" },
  });
  const [role, setRole] = useState("engineer");
  const [waiting, setWaiting] = useState<InvitationRow | null>(null);
  const follow = (address: string) => {
    const match = invitations.find((i) => i.email === address.trim().toLowerCase()) ?? null;
    setWaiting(match);
    if (match) setRole(match.role);
  };
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-2">
      <input type="hidden" name="intent" value="invite" />
      <FormErrors errors={form.errors} />
      <Field label="E-mail" autoComplete="off" {...inputProps(fields.email, "email")} onChange={(e) => follow(e.currentTarget.value)} />
      <SelectField
        label="Role"
        id={fields.role.id}
        name={fields.role.name}
        value={role}
        onChange={(e) => setRole(e.currentTarget.value)}
        errors={fields.role.errors}
        options={roleOptions}
        hint={waiting ? `${waiting.email} already has an invitation waiting, as ${invitationRoleLabel(waiting.role)}. Sending replaces it.` : undefined}
      />
      {role === "client" ? (
        <SelectField
          label="Client"
          id={fields.clientId.id}
          name={fields.clientId.name}
          defaultValue=""
          errors={fields.clientId.errors}
          options={[{ value: "", label: clients.length ? "Choose the client…" : "No clients recorded yet" }, ...clients.map((c) => ({ value: c.id, label: c.name }))]}
          hint="A client member sees only this client's sites and issued documents."
        />
      ) : null}
      <Button>Send invitation</Button>
    </Form>
  );
}
