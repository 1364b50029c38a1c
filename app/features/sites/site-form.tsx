// The site details form, for a new site and for editing one.
import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { Field, FormErrors, SelectField, TextAreaField } from "~/components/field";

import { inputProps, selectProps, textareaProps } from "~/lib/conform";
import { siteKindLabels, siteKinds } from "./kinds";
import { siteFormSchema } from "./schemas";

type Defaults = Partial<{ name: string; kind: string; address: string; city: string; clientId: string | null; latitude: number | null; longitude: number | null; datumNote: string; accessNotes: string; version: number }>;

export function SiteForm({ lastResult, defaults, clients, submitLabel, cancelTo }: { lastResult?: SubmissionResult<string[]> | null; defaults?: Defaults; clients: { id: string; name: string }[]; submitLabel: string; cancelTo: string }) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult,
    defaultValue: { kind: "rooftop", ...defaults, clientId: defaults?.clientId ?? "", latitude: defaults?.latitude ?? "", longitude: defaults?.longitude ?? "" },
    onValidate: ({ formData }) => parseWithZod(formData, { schema: siteFormSchema }),
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
  });
  return (
    <Form method="post" {...getFormProps(form)} className="grid max-w-3xl gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <FormErrors errors={form.errors} />
      </div>
      {defaults?.version ? <input type="hidden" name="version" value={defaults.version} /> : null}
      <div className="sm:col-span-2">
        <Field label="Name" maxLength={120} {...inputProps(fields.name, "text")} />
      </div>
      <SelectField label="Kind" {...selectProps(fields.kind)} options={siteKinds.map((k) => ({ value: k, label: siteKindLabels[k] }))} />
      <SelectField label="Client" {...selectProps(fields.clientId)} options={[{ value: "", label: "No client yet" }, ...clients.map((c) => ({ value: c.id, label: c.name }))]} />
      <div className="sm:col-span-2">
        <Field label="Address" maxLength={200} {...inputProps(fields.address, "text")} />
      </div>
      <Field label="City" maxLength={100} {...inputProps(fields.city, "text")} />
      <div className="grid grid-cols-2 gap-3">
        <Field label="Latitude" hint="Decimal degrees, optional" inputMode="decimal" {...inputProps(fields.latitude, "text")} />
        <Field label="Longitude" hint="Decimal degrees, optional" inputMode="decimal" {...inputProps(fields.longitude, "text")} />
      </div>
      <div className="sm:col-span-2">
        <Field label="Height datum (z = 0)" hint="What z = 0 means on this site, e.g. “main roof slab” or “ground at the tower base”." maxLength={200} {...inputProps(fields.datumNote, "text")} />
      </div>
      <div className="sm:col-span-2">
        <TextAreaField label="Access notes" hint="Keys, escorts, roof doors, who to call before going up." maxLength={2000} {...textareaProps(fields.accessNotes)} />
      </div>
      <div className="flex gap-2 sm:col-span-2">
        <Button disabled={navigation.state === "submitting"}>{submitLabel}</Button>
        <ButtonLink to={cancelTo}>Cancel</ButtonLink>
      </div>
    </Form>
  );
}
