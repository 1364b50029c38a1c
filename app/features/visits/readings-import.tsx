// Imports a readings CSV through POST /api/v1/visits/:id/readings: all rows or none, with a
// row-by-row report of what is wrong; then, on request, the valid rows only.
import { useRef, useState, type FormEvent } from "react";
import { useRevalidator } from "react-router";
import { Button } from "~/components/button";
import { READINGS_CSV_COLUMNS } from "./readings-csv-columns";

type Problem = { row: number | null; column: string | null; message: string };
type Outcome = { kind: "stored"; count: number; skipped: number } | { kind: "refused"; message: string; problems: Problem[]; validCount: number };

async function send(visitId: string, file: File, validOnly: boolean): Promise<Outcome> {
  const response = await fetch(`/api/v1/visits/${visitId}/readings${validOnly ? "?validOnly=true" : ""}`, { method: "POST", body: file, headers: { "content-type": "text/csv", accept: "application/json" } });
  const answer = (await response.json().catch(() => null)) as { readings?: unknown[]; skipped?: unknown[]; error?: { message: string }; problems?: Problem[]; validCount?: number } | null;
  if (response.ok && answer?.readings) return { kind: "stored", count: answer.readings.length, skipped: answer.skipped?.length ?? 0 };
  return { kind: "refused", message: answer?.error?.message ?? `The server answered ${response.status}.`, problems: answer?.problems ?? [], validCount: answer?.validCount ?? 0 };
}

export function ReadingsImport({ visitId }: { visitId: string }) {
  const revalidator = useRevalidator();
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  async function run(validOnly: boolean) {
    const file = input.current?.files?.[0];
    if (!file) return setOutcome({ kind: "refused", message: "Choose a CSV file first.", problems: [], validCount: 0 });
    setBusy(true);
    const result = await send(visitId, file, validOnly);
    setBusy(false);
    setOutcome(result);
    if (result.kind === "stored") {
      if (input.current) input.current.value = "";
      await revalidator.revalidate();
    }
  }

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    void run(false);
  };

  return (
    <form onSubmit={onSubmit} className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-0 flex-1 basis-60">
          <label htmlFor="readings-csv" className="mb-1 block text-sm font-medium text-ink-700">
            CSV file
          </label>
          <input ref={input} id="readings-csv" type="file" accept=".csv,text/csv" onChange={() => setOutcome(null)} className="block w-full text-sm text-ink-700 file:mr-3 file:rounded-control file:border-0 file:bg-white file:px-3 file:py-2 file:text-sm file:font-medium file:ring-1 file:ring-rule" />
        </div>
        <Button tone="secondary" disabled={busy}>
          {busy ? "Importing…" : "Import"}
        </Button>
      </div>
      <details className="text-sm text-graphite-600">
        <summary className="cursor-pointer text-ink-700">The file's columns</summary>
        <p className="mt-2">One reading per row; the first row names the columns (any order, any case). x_m, y_m, height_m, value and unit are required. UTF-8, UTF-16 or Latin-1; commas or semicolons.</p>
        <code className="mt-2 block overflow-x-auto rounded bg-paper px-2 py-1 text-xs whitespace-nowrap text-ink-700">{READINGS_CSV_COLUMNS.map((c) => c.name).join(",")}</code>
        <ul className="mt-2 space-y-0.5">
          {READINGS_CSV_COLUMNS.map((c) => (
            <li key={c.name}>
              <code className="text-ink-700">{c.name}</code>: {c.help}
            </li>
          ))}
        </ul>
      </details>
      {outcome?.kind === "stored" ? (
        <p role="status" className="text-sm text-ok-700">
          Stored {outcome.count} reading{outcome.count === 1 ? "" : "s"}
          {outcome.skipped ? `; ${outcome.skipped} problem${outcome.skipped === 1 ? "" : "s"} left out` : ""}.
        </p>
      ) : null}
      {outcome?.kind === "refused" ? (
        <div role="alert" className="space-y-2 rounded-control border border-danger-700/30 bg-danger-100 p-3 text-sm text-danger-700">
          <p className="font-medium">{outcome.message}</p>
          {outcome.problems.length ? (
            <div className="overflow-x-auto rounded bg-white">
              <table className="min-w-full text-left text-ink-700">
                <caption className="sr-only">Problems in the file</caption>
                <thead className="bg-paper text-graphite-600">
                  <tr>
                    <th scope="col" className="px-2 py-1 font-medium">Row</th>
                    <th scope="col" className="px-2 py-1 font-medium">Column</th>
                    <th scope="col" className="px-2 py-1 font-medium">Problem</th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-rule">
                  {outcome.problems.map((p, i) => (
                    <tr key={i}>
                      <td className="px-2 py-1 tabular-nums">{p.row ?? "file"}</td>
                      <td className="px-2 py-1">{p.column ?? "—"}</td>
                      <td className="px-2 py-1 break-words">{p.message}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          {outcome.validCount > 0 ? (
            <div className="flex flex-wrap items-center gap-2 text-ink-700">
              <span>
                Fix the file and import it again, or store the {outcome.validCount} valid reading{outcome.validCount === 1 ? "" : "s"} only.
              </span>
              <Button type="button" tone="secondary" disabled={busy} onClick={() => void run(true)}>
                Store the {outcome.validCount} valid reading{outcome.validCount === 1 ? "" : "s"} only
              </Button>
            </div>
          ) : null}
        </div>
      ) : null}
    </form>
  );
}
