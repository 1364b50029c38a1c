// One reading's form, for adding a row under the table and for editing a row in place. Sent
// through a fetcher to the visit page's action; errors land next to their fields, and the
// power density is previewed as you type (the same pure conversion the server uses).
import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useEffect } from "react";
import { useFetcher } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors, SelectField } from "~/components/field";
import { inputProps, selectProps } from "~/lib/conform";
import { formatDensity } from "./format";
import { parseReadingUnit, READING_UNITS, readingUnitLabels, toPowerDensity } from "./reading-units";
import { readingFormSchema } from "./schemas";
import { parseStandard, parseTier, STANDARD_IDS, standardShortLabels, TIERS, tierShortLabels } from "./standards";

export type ReadingDefaults = {
  id?: string;
  version?: number;
  label?: string;
  surfaceId?: string | null;
  x?: number;
  y?: number;
  heightM?: number;
  value?: number;
  unit?: string;
  standard?: string | null;
  tier?: string | null;
  frequencyMHz?: number | null;
  notes?: string;
};

type Props = {
  intent: "add-reading" | "edit-reading";
  formId: string;
  defaults?: ReadingDefaults;
  surfaces: { id: string; name: string }[];
  submitLabel: string;
  /** Called once the server has stored the reading, with the values sent. */
  onDone?: (sent: Record<string, unknown>) => void;
  onCancel?: () => void;
};

function preview(values: { value?: unknown; unit?: unknown; frequencyMHz?: unknown; standard?: unknown; tier?: unknown }) {
  const value = Number(values.value);
  const unit = parseReadingUnit(String(values.unit ?? ""));
  if (values.value === undefined || values.value === "" || !Number.isFinite(value) || !unit) return null;
  const f = values.frequencyMHz === undefined || values.frequencyMHz === "" ? null : Number(values.frequencyMHz);
  const c = toPowerDensity({ value, unit, frequencyMHz: f, standard: parseStandard(String(values.standard ?? "")), tier: parseTier(String(values.tier ?? "")) });
  if (!c.ok) return null;
  return c.powerDensityWm2 === null ? "no power density without a frequency" : `= ${formatDensity(c.powerDensityWm2)}`;
}

const clean = (d: ReadingDefaults = {}) => Object.fromEntries(Object.entries({ unit: "V/m", ...d }).map(([k, v]) => [k, v === null || v === undefined ? "" : String(v)]));

export function ReadingForm({ intent, formId, defaults, surfaces, submitLabel, onDone, onCancel }: Props) {
  const fetcher = useFetcher();
  // Every answer to this form's fetcher is Conform's reply (a reset after an add has no status).
  const result = fetcher.state === "idle" && fetcher.data ? (fetcher.data as never) : undefined;
  const [form, fields] = useForm({
    id: formId,
    lastResult: result,
    defaultValue: clean(defaults),
    onValidate: ({ formData }) => {
      formData.delete("intent");
      return parseWithZod(formData, { schema: readingFormSchema });
    },
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
  });
  const succeeded = (result as { status?: string } | undefined)?.status === "success";
  useEffect(() => {
    if (succeeded) onDone?.((form.value ?? {}) as Record<string, unknown>);
    // Once per answer: `result` changes identity with each reply.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [succeeded, result]);
  const percent = fields.unit.value === "percent";
  const shown = preview({ value: fields.value.value, unit: fields.unit.value, frequencyMHz: fields.frequencyMHz.value, standard: fields.standard.value, tier: fields.tier.value });
  return (
    <fetcher.Form method="post" {...getFormProps(form)} className="space-y-3">
      <input type="hidden" name="intent" value={intent} />
      {defaults?.id ? <input type="hidden" name="id" value={defaults.id} /> : null}
      {defaults?.version ? <input type="hidden" name="version" value={defaults.version} /> : null}
      <FormErrors errors={form.errors} />
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-6">
        <Field label="Label" maxLength={60} placeholder="R1" {...inputProps(fields.label, "text")} />
        <div className="col-span-2 sm:col-span-1 lg:col-span-2">
          <SelectField label="Surface" options={[{ value: "", label: "— none —" }, ...surfaces.map((s) => ({ value: s.id, label: s.name }))]} {...selectProps(fields.surfaceId)} />
        </div>
        <Field label="x (m)" step="any" {...inputProps(fields.x, "number")} />
        <Field label="y (m)" step="any" {...inputProps(fields.y, "number")} />
        <Field label="Height (m)" hint="above the surface" step="any" {...inputProps(fields.heightM, "number")} />
        <Field label="Value" step="any" {...inputProps(fields.value, "number")} />
        <SelectField label="Unit" options={READING_UNITS.map((u) => ({ value: u, label: readingUnitLabels[u] }))} {...selectProps(fields.unit)} />
        {percent ? (
          <>
            <SelectField label="Standard" options={[{ value: "", label: "Choose…" }, ...STANDARD_IDS.map((s) => ({ value: s, label: standardShortLabels[s] }))]} {...selectProps(fields.standard)} />
            <SelectField label="Tier" options={[{ value: "", label: "Choose…" }, ...TIERS.map((t) => ({ value: t, label: tierShortLabels[t] }))]} {...selectProps(fields.tier)} />
          </>
        ) : null}
        <Field label="Frequency (MHz)" hint="empty: broadband" step="any" {...inputProps(fields.frequencyMHz, "number")} />
        <div className="col-span-2">
          <Field label="Notes" maxLength={500} {...inputProps(fields.notes, "text")} />
        </div>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button disabled={fetcher.state !== "idle"}>{submitLabel}</Button>
        {onCancel ? (
          <Button type="button" tone="quiet" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
        <output htmlFor={fields.value.id} className="text-sm text-graphite-600" aria-live="polite">
          {shown}
        </output>
      </div>
    </fetcher.Form>
  );
}
