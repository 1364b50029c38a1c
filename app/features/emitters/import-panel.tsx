// The emitter CSV import: choose a file and replace or append; the server checks it without
// writing (a preview of what would be stored, and every problem by row, column and reason); then
// import it whole, or, on an explicit choice, only its valid rows. One transaction either way.
import { useRef, useState } from "react";
import { useRevalidator } from "react-router";
import { Button } from "~/components/button";
import { gainFromDbi, powerFromW, tidy, type EmitterValues } from "./convert";
import { EMITTER_CSV_COLUMNS } from "./csv-columns";
import { formatWatts } from "./format";

type Problem = { row: number | null; column: string | null; message: string };
type Answer = { stored?: boolean; count?: number; emitters?: EmitterValues[]; skipped?: Problem[]; deleted?: number; encoding?: string; error?: { message: string }; problems?: Problem[]; validCount?: number };
type State =
  | { kind: "idle" }
  | { kind: "preview"; emitters: EmitterValues[]; problems: Problem[]; encoding?: string; message?: string }
  | { kind: "refused"; message: string; problems: Problem[]; validCount: number }
  | { kind: "stored"; count: number; deleted: number; skipped: number };

async function send(siteId: string, file: File, query: Record<string, string>): Promise<{ status: number; answer: Answer }> {
  const response = await fetch(`/api/v1/sites/${siteId}/emitters/csv?${new URLSearchParams(query)}`, { method: "POST", body: file, headers: { "content-type": "text/csv", accept: "application/json" } });
  return { status: response.status, answer: ((await response.json().catch(() => null)) ?? { error: { message: `The server answered ${response.status}.` } }) as Answer };
}

function ProblemTable({ problems }: { problems: Problem[] }) {
  return (
    <div className="max-h-72 overflow-auto rounded bg-sheet">
      <table className="min-w-full text-left text-ink-700">
        <caption className="sr-only">Problems in the file</caption>
        <thead className="sticky top-0 bg-paper text-graphite-600">
          <tr>
            <th scope="col" className="px-2 py-1 font-medium">Row</th>
            <th scope="col" className="px-2 py-1 font-medium">Column</th>
            <th scope="col" className="px-2 py-1 font-medium">Problem</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {problems.map((p, i) => (
            <tr key={i}>
              <td className="px-2 py-1 tabular-nums">{p.row ?? "file"}</td>
              <td className="px-2 py-1 font-mono text-xs">{p.column ?? "—"}</td>
              <td className="px-2 py-1 break-words">{p.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function ImportPanel({ siteId, count }: { siteId: string; count: number }) {
  const revalidator = useRevalidator();
  const input = useRef<HTMLInputElement>(null);
  const [mode, setMode] = useState<"append" | "replace">(count ? "append" : "replace");
  const [busy, setBusy] = useState(false);
  const [state, setState] = useState<State>({ kind: "idle" });

  async function run(step: "check" | "all" | "valid") {
    const file = input.current?.files?.[0];
    if (!file) return setState({ kind: "refused", message: "Choose a CSV file first.", problems: [], validCount: 0 });
    setBusy(true);
    const { status, answer } = await send(siteId, file, { mode, ...(step === "check" ? { dryRun: "true", validOnly: "true" } : {}), ...(step === "valid" ? { validOnly: "true" } : {}) });
    setBusy(false);
    if (status === 200 && answer.emitters) return setState({ kind: "preview", emitters: answer.emitters, problems: answer.skipped ?? [], encoding: answer.encoding });
    if (status === 201 && answer.stored) {
      setState({ kind: "stored", count: answer.count ?? 0, deleted: answer.deleted ?? 0, skipped: answer.skipped?.length ?? 0 });
      if (input.current) input.current.value = "";
      return revalidator.revalidate();
    }
    setState({ kind: "refused", message: answer.error?.message ?? `The server answered ${status}.`, problems: answer.problems ?? [], validCount: answer.validCount ?? 0 });
  }

  const preview = state.kind === "preview" ? state : null;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-0 flex-1 basis-60">
          <label htmlFor="emitters-csv" className="mb-1 block text-sm font-medium text-ink-900">
            CSV file (at most 5 MB)
          </label>
          <input ref={input} id="emitters-csv" type="file" accept=".csv,text/csv" onChange={() => setState({ kind: "idle" })} className="block w-full text-sm text-ink-700 file:mr-3 file:rounded-control file:border-0 file:bg-sheet file:px-3 file:py-2 file:text-sm file:font-medium file:ring-1 file:ring-rule-strong" />
        </div>
        <fieldset className="flex gap-3 text-sm">
          <legend className="sr-only">Replace or add</legend>
          <label className="flex items-center gap-1.5">
            <input type="radio" name="import-mode" value="append" checked={mode === "append"} onChange={() => setMode("append")} /> Add to the list
          </label>
          <label className="flex items-center gap-1.5">
            <input type="radio" name="import-mode" value="replace" checked={mode === "replace"} onChange={() => setMode("replace")} /> {count ? `Replace all ${count} emitter${count === 1 ? "" : "s"}` : "Replace (the list is empty)"}
          </label>
        </fieldset>
        <Button type="button" tone="secondary" disabled={busy} onClick={() => void run("check")}>
          {busy ? "Checking…" : "Check the file"}
        </Button>
      </div>
      {preview ? (
        <div className="space-y-2 rounded-control border border-rule bg-paper p-3 text-sm" role="status">
          <p className="font-medium text-ink-900">
            {preview.emitters.length} emitter{preview.emitters.length === 1 ? "" : "s"} ready{preview.problems.length ? `, ${preview.problems.length} problem${preview.problems.length === 1 ? "" : "s"}` : ""}
            {preview.encoding ? ` · read as ${preview.encoding}` : ""} · nothing stored yet.
          </p>
          {preview.emitters.length ? (
            <div className="max-h-60 overflow-auto rounded bg-sheet">
              <table className="min-w-full text-left text-ink-700">
                <caption className="sr-only">What would be stored</caption>
                <thead className="sticky top-0 bg-paper text-graphite-600">
                  <tr>{["Label", "Operator", "MHz", "Power/carrier", "Gain", "Az °", "x, y, z m"].map((h) => <th key={h} scope="col" className="px-2 py-1 font-medium">{h}</th>)}</tr>
                </thead>
                <tbody className="divide-y divide-rule tabular-nums">
                  {preview.emitters.slice(0, 50).map((e, i) => (
                    <tr key={i}>
                      <td className="px-2 py-1 font-medium">{e.label}</td>
                      <td className="px-2 py-1">{e.operator}</td>
                      <td className="px-2 py-1">{e.frequencyMHz}</td>
                      <td className="px-2 py-1">{e.powerUnit === "dBm" ? `${tidy(powerFromW(e.powerPerCarrierW, "dBm"))} dBm` : formatWatts(e.powerPerCarrierW)}</td>
                      <td className="px-2 py-1">{tidy(gainFromDbi(e.gainDbi, e.gainUnit))} {e.gainUnit}</td>
                      <td className="px-2 py-1">{e.azimuthDeg}</td>
                      <td className="px-2 py-1">{e.x}, {e.y}, {e.z}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              {preview.emitters.length > 50 ? <p className="px-2 py-1 text-graphite-600">… and {preview.emitters.length - 50} more.</p> : null}
            </div>
          ) : null}
          {preview.problems.length ? <ProblemTable problems={preview.problems} /> : null}
          <div className="flex flex-wrap gap-2">
            {preview.problems.length === 0 ? (
              <Button type="button" disabled={busy} onClick={() => void run("all")}>
                {mode === "replace" ? `Replace with these ${preview.emitters.length}` : `Add these ${preview.emitters.length}`}
              </Button>
            ) : (
              <>
                <span className="self-center text-ink-700">Fix the file and check it again, or:</span>
                {preview.emitters.length ? (
                  <Button type="button" tone="secondary" disabled={busy} onClick={() => void run("valid")}>
                    Import the {preview.emitters.length} valid row{preview.emitters.length === 1 ? "" : "s"} only
                  </Button>
                ) : null}
              </>
            )}
          </div>
        </div>
      ) : null}
      {state.kind === "stored" ? (
        <p role="status" className="text-sm text-ok-700">
          Stored {state.count} emitter{state.count === 1 ? "" : "s"}
          {state.deleted ? `, replacing ${state.deleted}` : ""}
          {state.skipped ? `; ${state.skipped} problem row${state.skipped === 1 ? "" : "s"} left out` : ""}.
        </p>
      ) : null}
      {state.kind === "refused" ? (
        <div role="alert" className="space-y-2 rounded-control border border-danger-700/30 bg-danger-100 p-3 text-sm text-danger-700">
          <p className="font-medium">{state.message}</p>
          {state.problems.length ? <ProblemTable problems={state.problems} /> : null}
        </div>
      ) : null}
      <details className="text-sm text-graphite-600">
        <summary className="cursor-pointer text-ink-700">The file's columns</summary>
        <p className="mt-2">One emitter per row; the first row names the columns (any order, any case); units are in the names. Give the power in power_per_carrier_w or power_per_carrier_dbm, the gain in gain_dbi or gain_dbd. UTF-8, UTF-16 or Latin-1.</p>
        <ul className="mt-2 grid gap-x-6 gap-y-0.5 sm:grid-cols-2">
          {EMITTER_CSV_COLUMNS.map((c) => (
            <li key={c.name}>
              <code className="text-ink-700">{c.name}</code>
              {c.required ? " (required)" : ""}: {c.help}
            </li>
          ))}
        </ul>
      </details>
    </div>
  );
}
