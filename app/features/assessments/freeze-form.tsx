// The "freeze an assessment" form: a name and the evaluation options (the Exposure options' rules).
import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors, SelectField } from "~/components/field";
import { standardLabels, tierLabels } from "~/features/exposure/options";
import { STANDARD_IDS } from "~/engine/limits";
import { inputProps, selectProps } from "~/lib/conform";
import { freezeFormSchema } from "./schemas";

export function FreezeForm({ lastResult, defaultName }: { lastResult?: SubmissionResult<string[]> | null; defaultName: string }) {
  const navigation = useNavigation();
  const busy = navigation.state !== "idle" && navigation.formMethod === "POST";
  const [form, fields] = useForm({
    lastResult,
    defaultValue: { name: defaultName, standard: "fcc", tier: "general", gridStepM: "0.25", heights: { fromM: "0", toM: "2", count: "11" }, mode: "average", reflectionFactor: "1" },
    onValidate: ({ formData }) => parseWithZod(formData, { schema: freezeFormSchema }),
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
  });
  const heights = fields.heights.getFieldset();
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-3">
      <FormErrors errors={form.errors} />
      <Field label="Name" maxLength={120} hint="e.g. Annual review, before the sector move" {...inputProps(fields.name, "text")} />
      <div className="grid gap-x-4 sm:grid-cols-2">
        <SelectField label="Standard" options={STANDARD_IDS.map((s) => ({ value: s, label: standardLabels[s] }))} {...selectProps(fields.standard)} />
        <SelectField label="Tier for the maps" options={[{ value: "general", label: tierLabels.fcc.general }, { value: "occupational", label: tierLabels.fcc.occupational }]} {...selectProps(fields.tier)} />
        <Field label="Grid step (m)" inputMode="decimal" {...inputProps(fields.gridStepM, "text")} />
        <SelectField label="Reflection factor" options={[{ value: "1", label: "1 (none)" }, { value: "2.56", label: "2.56 (OET-65)" }, { value: "4", label: "4 (full in-phase)" }]} {...selectProps(fields.reflectionFactor)} />
      </div>
      <fieldset className="grid gap-x-4 sm:grid-cols-4">
        <legend className="mb-1 text-sm font-medium text-ink-900">Heights above each surface</legend>
        <Field label="From (m)" inputMode="decimal" {...inputProps(heights.fromM, "text")} />
        <Field label="To (m)" inputMode="decimal" {...inputProps(heights.toM, "text")} />
        <Field label="Heights" inputMode="numeric" {...inputProps(heights.count, "text")} />
        <SelectField label="Combined as" options={[{ value: "average", label: "spatial average" }, { value: "max", label: "maximum" }]} {...selectProps(fields.mode)} />
      </fieldset>
      <p className="text-sm text-graphite-600">Freezing runs the whole site through the engine now and stores the inventory, every request and its response, the summary and a proposed mitigation plan. Later edits of the site never change it.</p>
      <Button type="submit" disabled={busy}>{busy ? "Computing…" : "Freeze the assessment"}</Button>
    </Form>
  );
}
