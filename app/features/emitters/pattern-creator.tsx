// Adds a pattern to the library: a tabulated pattern from a CSV file (pattern-csv.ts, read in the
// browser) or a parametric model from its beamwidths; both cuts are drawn before saving, with the
// engine's own pattern functions. Saved through POST /api/v1/patterns; its field errors shown in place.
import { useMemo, useState, type FormEvent } from "react";
import { useRevalidator } from "react-router";
import { Button } from "~/components/button";
import { Field, SelectField } from "~/components/field";
import { decodeTextFile } from "~/lib/text-file";
import { patternFromCsv, PATTERN_CSV_COLUMNS, type TabulatedPattern } from "./pattern-csv";
import { PatternPolars } from "./polar-diagram";
import { patternCuts } from "./polar";
import { parametricPattern } from "./convert";
import { parametricLabels, type ParametricKind } from "./schemas";
import type { CsvProblem } from "./csv";

type Kind = "tabulated" | ParametricKind;
const kinds: { value: Kind; label: string }[] = [
  { value: "tabulated", label: "Tabulated cuts from a CSV file" },
  { value: "3gpp-38.901", label: parametricLabels["3gpp-38.901"] },
  { value: "itu-r-f.1336-sectoral", label: parametricLabels["itu-r-f.1336-sectoral"] },
];

export function PatternCreator() {
  const revalidator = useRevalidator();
  const [kind, setKind] = useState<Kind>("tabulated");
  const [table, setTable] = useState<{ pattern: TabulatedPattern | null; problems: CsvProblem[] } | null>(null);
  const [h, setH] = useState("65");
  const [v, setV] = useState("7");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const spec = useMemo(() => {
    if (kind === "tabulated") return table?.pattern ?? null;
    const hb = Number(h);
    const vb = Number(v);
    if (!(hb > 0 && vb > 0 && hb <= (kind === "3gpp-38.901" ? 360 : 180) && vb <= (kind === "3gpp-38.901" ? 180 : 90))) return null;
    return parametricPattern(kind, hb, vb);
  }, [kind, table, h, v]);
  const cuts = useMemo(() => (spec ? patternCuts(spec) : null), [spec]);

  async function readFile(file: File | undefined) {
    setTable(file ? patternFromCsv(decodeTextFile(new Uint8Array(await file.arrayBuffer())).text) : null);
  }

  async function save(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    if (!spec) return setMessage({ ok: false, text: kind === "tabulated" ? "Choose a pattern CSV file without problems first." : "Enter both beamwidths." });
    const num = (k: string) => (String(form.get(k) ?? "").trim() === "" ? null : Number(form.get(k)));
    setBusy(true);
    const response = await fetch("/api/v1/patterns", {
      method: "POST",
      headers: { "content-type": "application/json", accept: "application/json" },
      body: JSON.stringify({ name: form.get("name"), maker: form.get("maker"), model: form.get("model"), gainDbi: num("gainDbi"), frequencyMHz: num("frequencyMHz"), notes: form.get("notes"), pattern: spec }),
    });
    const answer = (await response.json().catch(() => null)) as { pattern?: { name: string }; error?: { message: string; fields?: Record<string, string> } } | null;
    setBusy(false);
    if (response.status === 201 && answer?.pattern) {
      setErrors({});
      setMessage({ ok: true, text: `“${answer.pattern.name}” is in the library.` });
      event.currentTarget?.reset?.();
      setTable(null);
      await revalidator.revalidate();
      return;
    }
    setErrors(answer?.error?.fields ?? {});
    setMessage({ ok: false, text: answer?.error?.message ?? `The server answered ${response.status}.` });
  }

  const err = (k: string) => (errors[k] ? [errors[k]] : undefined);
  return (
    <form onSubmit={save} className="space-y-4" noValidate>
      <div className="grid grid-cols-1 gap-x-3 sm:grid-cols-2 lg:grid-cols-3">
        <Field id="pattern-name" name="name" label="Name" maxLength={120} required errors={err("name")} />
        <Field id="pattern-maker" name="maker" label="Maker" maxLength={100} errors={err("maker")} />
        <Field id="pattern-model" name="model" label="Model" maxLength={100} errors={err("model")} />
        <Field id="pattern-gain" name="gainDbi" label="Gain (dBi)" type="number" step="any" errors={err("gainDbi")} />
        <Field id="pattern-frequency" name="frequencyMHz" label="Frequency (MHz)" type="number" step="any" errors={err("frequencyMHz")} />
        <Field id="pattern-notes" name="notes" label="Notes" maxLength={1000} errors={err("notes")} />
        <SelectField id="pattern-kind" name="kind" label="Pattern" value={kind} onChange={(e) => setKind(e.target.value as Kind)} options={kinds} />
        {kind === "tabulated" ? (
          <div className="sm:col-span-2">
            <label htmlFor="pattern-csv" className="mb-1 block text-sm font-medium text-ink-900">
              Cuts (CSV: {PATTERN_CSV_COLUMNS.map((c) => c.name).join(", ")})
            </label>
            <input id="pattern-csv" type="file" accept=".csv,text/csv" onChange={(e) => void readFile(e.target.files?.[0])} className="block w-full text-sm text-ink-700 file:mr-3 file:rounded-control file:border-0 file:bg-sheet file:px-3 file:py-2 file:text-sm file:font-medium file:ring-1 file:ring-rule-strong" />
          </div>
        ) : (
          <>
            <Field id="pattern-h" label="Horizontal beamwidth (°)" type="number" step="any" value={h} onChange={(e) => setH(e.target.value)} errors={err("pattern.hBeamwidthDeg")} />
            <Field id="pattern-v" label="Vertical beamwidth (°)" type="number" step="any" value={v} onChange={(e) => setV(e.target.value)} errors={err("pattern.vBeamwidthDeg")} />
          </>
        )}
      </div>
      {table?.problems.length ? (
        <div role="alert" className="rounded-control border border-danger-700/30 bg-danger-100 p-3 text-sm text-danger-700">
          <p className="font-medium">The file has {table.problems.length} problem{table.problems.length === 1 ? "" : "s"}:</p>
          <ul className="mt-1 list-disc pl-5">
            {table.problems.slice(0, 20).map((p, i) => (
              <li key={i}>
                {p.row ? `Row ${p.row}` : "File"}
                {p.column ? `, ${p.column}` : ""}: {p.message}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {cuts ? (
        <div>
          <p className="mb-2 text-sm text-graphite-600">
            Preview (nothing saved yet): half-power beamwidths {cuts.hBeamwidthDeg.toFixed(1)}° horizontal, {cuts.vBeamwidthDeg.toFixed(1)}° vertical; rings every 10 dB.
          </p>
          <PatternPolars horizontal={cuts.horizontal} vertical={cuts.vertical} name="Preview" />
        </div>
      ) : null}
      {message ? (
        <p role={message.ok ? "status" : "alert"} className={`text-sm ${message.ok ? "text-ok-700" : "text-danger-700"}`}>
          {message.text}
        </p>
      ) : null}
      {!spec && !message ? (
        <p className="text-sm text-graphite-600">
          {kind === "tabulated" ? "Choose the CSV file of the cuts: both are drawn here before anything is saved." : "Enter both beamwidths to draw the pattern before saving."}
        </p>
      ) : null}
      {/* Not disabled without a pattern: a click says what is missing instead of doing nothing. */}
      <Button disabled={busy}>{busy ? "Saving…" : "Save to the library"}</Button>
    </form>
  );
}
