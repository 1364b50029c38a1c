// The Exposure options as a GET form: the choice lands in the URL, so a map can be bookmarked
// and the section, 3D and assessment pages read the same options.
import { Form } from "react-router";
import { Button } from "~/components/button";
import { STANDARD_IDS } from "~/engine/limits";
import { evaluationOf } from "./evaluation-choice";
import { modelNames, reflectionFactors, standardLabels, tierLabels, type ExposureOptions } from "./options";

const control = "block w-full min-h-9 rounded-control border border-rule-strong bg-sheet px-2 py-1.5 text-sm text-ink-900";

export function OptionsForm({ options }: { options: ExposureOptions }) {
  const tiers = tierLabels[options.standard];
  return (
    <Form method="get" className="grid grid-cols-2 items-end gap-x-3 gap-y-2 sm:grid-cols-4 lg:grid-cols-[2fr_2fr_2fr_1fr_1fr_1fr_1fr_1fr_1.3fr_auto]" aria-label="Exposure options">
      <Select name="standard" label="Standard" value={options.standard} options={STANDARD_IDS.map((s) => [s, standardLabels[s]])} />
      <Select name="tier" label="Tier" value={options.tier} options={[["general", tiers.general], ["occupational", tiers.occupational]]} />
      <Select name="evaluation" label="Evaluation" value={evaluationOf(options)} options={[["average", "Spatial average over the span"], ["at", "Value at one height (From)"], ["max", "Maximum over the span"]]} />
      <Num name="from" label="From m" value={options.heights.fromM} step="0.1" />
      <Num name="to" label="To m" value={options.heights.toM} step="0.1" />
      <Num name="heights" label="Heights" value={options.heights.count} step="1" />
      <Num name="step" label="Grid step m" value={options.gridStepM} step="0.05" />
      <Select name="reflection" label="Reflection" value={String(options.reflectionFactor)} options={reflectionFactors.map((f) => [String(f), String(f)])} />
      <Select name="model" label="Default model" value={options.defaultModel} options={modelNames.map((m) => [m, m])} />
      <Button type="submit" size="sm" tone="secondary">
        Compute
      </Button>
    </Form>
  );
}

function Select({ name, label, value, options }: { name: string; label: string; value: string; options: [string, string][] }) {
  return (
    <label className="block min-w-0 text-xs text-graphite-600">
      {label}
      <select name={name} defaultValue={value} key={value} className={control}>
        {options.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
    </label>
  );
}

function Num({ name, label, value, step }: { name: string; label: string; value: number; step: string }) {
  return (
    <label className="block min-w-0 text-xs text-graphite-600">
      {label}
      <input name={name} type="number" inputMode="decimal" step={step} defaultValue={value} key={value} className={`${control} figures`} />
    </label>
  );
}
