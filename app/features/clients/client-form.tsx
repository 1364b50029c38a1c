// The client form: name, billing address, notes, and a list of contacts added and removed in place.
import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { Button, ButtonLink, buttonClass } from "~/components/button";
import { Field, FormErrors, TextAreaField } from "~/components/field";

import { inputProps, textareaProps } from "~/lib/conform";
import { clientFormSchema } from "./schemas";

type Contact = { id?: string; name: string; email: string; phone: string; role: string };
type Defaults = { name?: string; billingAddress?: string; notes?: string; contacts?: Contact[]; version?: number };

export function ClientForm({ lastResult, defaults, submitLabel, cancelTo }: { lastResult?: SubmissionResult<string[]> | null; defaults?: Defaults; submitLabel: string; cancelTo: string }) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult,
    defaultValue: { contacts: [], ...defaults },
    onValidate: ({ formData }) => parseWithZod(formData, { schema: clientFormSchema }),
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
  });
  const contacts = fields.contacts.getFieldList();
  return (
    <Form method="post" {...getFormProps(form)} className="max-w-3xl space-y-4">
      <FormErrors errors={form.errors} />
      {defaults?.version ? <input type="hidden" name="version" value={defaults.version} /> : null}
      <Field label="Name" maxLength={120} {...inputProps(fields.name, "text")} />
      <TextAreaField label="Billing address" maxLength={500} {...textareaProps(fields.billingAddress)} />
      <TextAreaField label="Notes" hint="For your organisation only; clients never see these." maxLength={4000} {...textareaProps(fields.notes)} />
      <fieldset className="space-y-3">
        <legend className="text-sm font-medium text-ink-700">Contacts</legend>
        <FormErrors errors={fields.contacts.errors} />
        {contacts.length === 0 ? <p className="text-sm text-graphite-600">No contacts yet.</p> : null}
        {contacts.map((contact, index) => {
          const c = contact.getFieldset();
          return (
            <div key={contact.key} className="grid gap-3 rounded-sheet border border-rule bg-white p-3 sm:grid-cols-2">
              {c.id.initialValue ? <input type="hidden" name={c.id.name} value={c.id.initialValue} /> : null}
              <Field label="Name" maxLength={100} {...inputProps(c.name, "text")} />
              <Field label="Role" hint="e.g. property manager" maxLength={80} {...inputProps(c.role, "text")} />
              <Field label="E-mail" maxLength={254} {...inputProps(c.email, "email")} />
              <Field label="Phone" maxLength={40} {...inputProps(c.phone, "tel")} />
              <div className="sm:col-span-2">
                <button {...form.remove.getButtonProps({ name: fields.contacts.name, index })} className={buttonClass("quiet", "px-2 py-1")}>
                  Remove this contact
                </button>
              </div>
            </div>
          );
        })}
        <button {...form.insert.getButtonProps({ name: fields.contacts.name, defaultValue: { name: "", email: "", phone: "", role: "" } })} className={buttonClass("secondary")}>
          Add a contact
        </button>
      </fieldset>
      <div className="flex gap-2">
        <Button disabled={navigation.state === "submitting"}>{submitLabel}</Button>
        <ButtonLink to={cancelTo}>Cancel</ButtonLink>
      </div>
    </Form>
  );
}
