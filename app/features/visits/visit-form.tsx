// The visit form: date, people, conditions, notes, and the instruments used, added and removed in place.
import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { Button, ButtonLink, buttonClass } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { TextAreaField } from "~/components/field";
import { inputProps, textareaProps } from "~/lib/conform";
import { visitFormSchema } from "./schemas";

type Instrument = { probe: string; serial: string; calibrationDate: string | null };
type Defaults = { visitedOn?: string; people?: string; conditions?: string; instruments?: Instrument[]; notes?: string; version?: number };

export function VisitForm({ lastResult, defaults, submitLabel, cancelTo, intent }: { lastResult?: SubmissionResult<string[]> | null; defaults?: Defaults; submitLabel: string; cancelTo: string; intent?: string }) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult,
    defaultValue: { ...defaults, instruments: (defaults?.instruments ?? []).map((i) => ({ ...i, calibrationDate: i.calibrationDate ?? "" })) },
    onValidate: ({ formData }) => {
      formData.delete("intent");
      return parseWithZod(formData, { schema: visitFormSchema });
    },
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
  });
  const instruments = fields.instruments.getFieldList();
  return (
    <Form method="post" {...getFormProps(form)} className="max-w-3xl space-y-4">
      <FormErrors errors={form.errors} />
      {intent ? <input type="hidden" name="intent" value={intent} /> : null}
      {defaults?.version ? <input type="hidden" name="version" value={defaults.version} /> : null}
      <div className="grid gap-4 sm:grid-cols-[12rem_1fr]">
        <Field label="Date of the visit" {...inputProps(fields.visitedOn, "date")} />
        <Field label="People" hint="Who went, e.g. R. Okafor (engineer), site manager" maxLength={500} {...inputProps(fields.people, "text")} />
      </div>
      <Field label="Conditions" hint="Weather, access, which transmitters were on air" maxLength={500} {...inputProps(fields.conditions, "text")} />
      <fieldset className="space-y-3">
        <legend className="text-sm font-medium text-ink-700">Instruments</legend>
        <p className="text-xs text-graphite-600">Probes and meters used, with their last calibration. A calibration more than a year before the visit, or after it, is flagged.</p>
        <FormErrors errors={fields.instruments.errors} />
        {instruments.length === 0 ? <p className="text-sm text-graphite-600">No instruments listed.</p> : null}
        {instruments.map((instrument, index) => {
          const i = instrument.getFieldset();
          return (
            <div key={instrument.key} className="grid gap-3 rounded-sheet border border-rule bg-white p-3 sm:grid-cols-[2fr_1fr_11rem_auto] sm:items-end">
              <Field label="Probe or meter" placeholder="Make and model" maxLength={100} {...inputProps(i.probe, "text")} />
              <Field label="Serial" maxLength={60} {...inputProps(i.serial, "text")} />
              <Field label="Calibrated on" {...inputProps(i.calibrationDate, "date")} />
              <button {...form.remove.getButtonProps({ name: fields.instruments.name, index })} className={buttonClass("quiet", "px-2 py-2")}>
                Remove
              </button>
            </div>
          );
        })}
        <button {...form.insert.getButtonProps({ name: fields.instruments.name, defaultValue: { probe: "", serial: "", calibrationDate: "" } })} className={buttonClass("secondary")}>
          Add an instrument
        </button>
      </fieldset>
      <TextAreaField label="Notes" maxLength={4000} {...textareaProps(fields.notes)} />
      <div className="flex gap-2">
        <Button disabled={navigation.state === "submitting"}>{submitLabel}</Button>
        <ButtonLink to={cancelTo}>Cancel</ButtonLink>
      </div>
    </Form>
  );
}
