// One emitter's form, inline in the table (edit) or under it (add): every field the engine needs,
// errors next to each field (Conform + Zod, the server's rules), EIRP and ERP and the total tilt
// previewed as you type with the engine's unit functions. A 409 shows the row as someone else
// saved it beside the values typed here, and lets the person re-apply theirs on that version.
import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useEffect, useState } from "react";
import { useFetcher } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors, SelectField } from "~/components/field";
import { inputProps, selectProps } from "~/lib/conform";
import { isParametricKind, powerToW, gainToDbi } from "./convert";
import { ConflictPanel } from "./conflict-panel";
import { formatWatts } from "./format";
import { emitterEirp } from "./json";
import { GAIN_UNITS, MODELS, modelLabels, PARAMETRIC_KINDS, parametricLabels, POWER_UNITS, emitterFormSchema } from "./schemas";

export type LibraryOption = { id: string; name: string };
export type Answer = { intent: string; result?: unknown; conflict?: Record<string, unknown> | null; savedVersion?: number; message?: string };

type Props = {
  intent: "add-emitter" | "save-emitter";
  formId: string;
  defaults: Record<string, string>;
  library: LibraryOption[];
  submitLabel: string;
  onDone?: () => void;
  onCancel?: () => void;
};

function preview(v: Record<string, unknown>) {
  const n = (k: string) => (v[k] === undefined || v[k] === "" ? NaN : Number(v[k]));
  const power = powerToW(n("power"), v.powerUnit === "dBm" ? "dBm" : "W");
  const gain = gainToDbi(n("gain"), v.gainUnit === "dBd" ? "dBd" : "dBi");
  const carriers = v.carriers === undefined || v.carriers === "" ? 1 : n("carriers");
  const loss = v.lossDb === undefined || v.lossDb === "" ? 0 : n("lossDb");
  if (![power, gain, carriers, loss].every(Number.isFinite)) return null;
  return emitterEirp({ powerPerCarrierW: power, carriers, lossDb: loss, gainDbi: gain });
}

export function EmitterForm({ intent, formId, defaults, library, submitLabel, onDone, onCancel }: Props) {
  const fetcher = useFetcher<Answer>();
  const answer = fetcher.state === "idle" ? fetcher.data : undefined;
  const [version, setVersion] = useState(defaults.version ?? "");
  const [overriding, setOverriding] = useState(false);
  const [form, fields] = useForm({
    id: formId,
    lastResult: answer?.result as never,
    defaultValue: defaults,
    onValidate: ({ formData }) => {
      formData.delete("intent");
      return parseWithZod(formData, { schema: emitterFormSchema });
    },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const succeeded = (answer?.result as { status?: string } | undefined)?.status === "success";
  useEffect(() => {
    if (succeeded) {
      setOverriding(false);
      if (answer?.savedVersion) setVersion(String(answer.savedVersion));
      onDone?.();
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [succeeded, answer]);
  const conflict = answer?.conflict && !overriding ? answer.conflict : null;
  const values = (form.value ?? defaults) as Record<string, unknown>;
  const shown = preview(values);
  const choice = String(values.patternChoice ?? "");
  const parametric = isParametricKind(choice);
  const model = String(values.model ?? "spherical");
  const tilt = Number(values.mechanicalTiltDeg || 0) + Number(values.electricalTiltDeg || 0);
  const patternOptions = [
    { value: "", label: "None (isotropic, or 3GPP from beamwidths)" },
    ...library.map((p) => ({ value: `lib:${p.id}`, label: `Library: ${p.name}` })),
    ...PARAMETRIC_KINDS.map((k) => ({ value: k, label: `Parametric: ${parametricLabels[k]}` })),
  ];
  const busy = fetcher.state !== "idle";
  return (
    <fetcher.Form method="post" {...getFormProps(form)} className="space-y-3">
      <input type="hidden" name="intent" value={intent} />
      {defaults.id ? <input type="hidden" name="id" value={defaults.id} /> : null}
      {version ? <input type="hidden" name="version" value={version} /> : null}
      <FormErrors errors={form.errors} />
      {conflict ? (
        <ConflictPanel
          theirs={conflict}
          mine={values}
          onKeepMine={() => {
            setVersion(String(conflict.version));
            setOverriding(true);
          }}
          onTakeTheirs={onCancel}
        />
      ) : null}
      {overriding ? <p className="text-sm text-ink-700">Your values are kept below on top of their version {version}. Save to apply them.</p> : null}
      <fieldset className="grid grid-cols-2 gap-x-3 sm:grid-cols-4 lg:grid-cols-8">
        <legend className="label-caps mb-1">Emitter</legend>
        <Field label="Label" maxLength={40} placeholder="A1" {...inputProps(fields.label, "text")} />
        <div className="col-span-1 lg:col-span-2">
          <Field label="Operator" maxLength={100} {...inputProps(fields.operator, "text")} />
        </div>
        <Field label="Band / service" maxLength={60} {...inputProps(fields.band, "text")} />
        <Field label="Frequency (MHz)" step="any" inputMode="decimal" {...inputProps(fields.frequencyMHz, "number")} />
        <Field label="Power per carrier" step="any" inputMode="decimal" {...inputProps(fields.power, "number")} />
        <SelectField label="Power unit" options={POWER_UNITS.map((u) => ({ value: u, label: u }))} {...selectProps(fields.powerUnit)} />
        <Field label="Carriers" step="1" inputMode="numeric" {...inputProps(fields.carriers, "number")} />
        <Field label="Loss (dB)" hint="line, jumpers, combiner" step="any" {...inputProps(fields.lossDb, "number")} />
        <Field label="Gain" step="any" inputMode="decimal" {...inputProps(fields.gain, "number")} />
        <SelectField label="Gain unit" hint="dBd stored as dBd + 2.15" options={GAIN_UNITS.map((u) => ({ value: u, label: u }))} {...selectProps(fields.gainUnit)} />
        <div className="col-span-2 lg:col-span-3">
          <SelectField label="Pattern" options={patternOptions} {...selectProps(fields.patternChoice)} />
        </div>
        <Field label="H beamwidth (°)" hint={parametric ? "required" : "optional"} step="any" {...inputProps(fields.hBeamwidthDeg, "number")} />
        <Field label="V beamwidth (°)" hint={parametric ? "required" : "optional"} step="any" {...inputProps(fields.vBeamwidthDeg, "number")} />
      </fieldset>
      <fieldset className="grid grid-cols-2 gap-x-3 sm:grid-cols-4 lg:grid-cols-8">
        <legend className="label-caps mb-1">Where it points</legend>
        <Field label="Azimuth (°)" hint="clockwise from north" step="any" {...inputProps(fields.azimuthDeg, "number")} />
        <Field label="Mech. tilt (°)" hint="down is positive" step="any" {...inputProps(fields.mechanicalTiltDeg, "number")} />
        <Field label="Elec. tilt (°)" hint={Number.isFinite(tilt) ? `total ${Number(tilt.toFixed(3))}°` : undefined} step="any" {...inputProps(fields.electricalTiltDeg, "number")} />
        <Field label="x (m)" hint="east" step="any" {...inputProps(fields.x, "number")} />
        <Field label="y (m)" hint="north" step="any" {...inputProps(fields.y, "number")} />
        <Field label="z (m)" hint="above datum" step="any" {...inputProps(fields.z, "number")} />
        <SelectField label="Model" options={MODELS.map((m) => ({ value: m, label: modelLabels[m] }))} {...selectProps(fields.model)} />
        {model === "aperture" ? (
          <Field label="Dish diameter (m)" step="any" {...inputProps(fields.dishDiameterM, "number")} />
        ) : (
          <Field label="Aperture (m)" hint={model === "spherical" ? "optional" : "required"} step="any" {...inputProps(fields.apertureM, "number")} />
        )}
      </fieldset>
      <fieldset className="grid grid-cols-2 gap-x-3 sm:grid-cols-4 lg:grid-cols-8">
        <legend className="label-caps mb-1">Time averaging (IEC 62232)</legend>
        <Field label="Duty factor" hint="0 to 1" step="any" {...inputProps(fields.dutyFactor, "number")} />
        <Field label="F_PR" hint="actual-maximum factor" step="any" {...inputProps(fields.actualMaxFactor, "number")} />
        <Field label="TDD factor" hint="downlink share" step="any" {...inputProps(fields.tddFactor, "number")} />
        <div className="col-span-2 sm:col-span-1 lg:col-span-4">
          <Field label="Notes" maxLength={1000} {...inputProps(fields.notes, "text")} />
        </div>
        <label className="flex min-h-10 items-center gap-2 self-start pt-6 text-sm font-medium text-ink-900">
          <input type="checkbox" name="active" defaultChecked={defaults.active === "on"} className="h-5 w-5 accent-ink-900" />
          Active
        </label>
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <Button size="sm" disabled={busy}>{busy ? "Saving…" : submitLabel}</Button>
        {onCancel ? (
          <Button size="sm" type="button" tone="quiet" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
        <output className="figures text-sm text-graphite-600" aria-live="polite">
          {shown ? `EIRP ${formatWatts(shown.eirpW)} · ERP ${formatWatts(shown.erpW)}` : null}
        </output>
      </div>
    </fetcher.Form>
  );
}
