// What changed between two assessments: options, inventory records (added, removed, each changed
// field before and after) and results (worst point and areas per surface, A beside B).
import { fieldLabel, showField } from "~/features/history/describe";
import type { Comparison, Pair, RecordDiff } from "./compare";
import { figure } from "./format";

const th = "label-caps px-3 py-2 text-left font-medium";
const td = "px-3 py-2 align-top";
/** "Grid step (m) 0.5 → 1": the field's label and its values in words, as the History shows them. */
const change = (f: { field: string; before: unknown; after: unknown }) => `${fieldLabel(f.field)} ${showField(f.field, f.before)} → ${showField(f.field, f.after)}`;

function Changes({ title, diff }: { title: string; diff: RecordDiff }) {
  const none = !diff.added.length && !diff.removed.length && !diff.changed.length;
  return (
    <div className="space-y-1">
      <h4 className="font-semibold">{title}</h4>
      {none ? <p className="text-sm text-graphite-600">No change.</p> : (
        <ul className="space-y-1 text-sm">
          {diff.added.map((r) => <li key={`a${r.id}`}><span className="font-medium">Added</span> <span className="break-words">{r.label}</span></li>)}
          {diff.removed.map((r) => <li key={`r${r.id}`}><span className="font-medium">Removed</span> <span className="break-words">{r.label}</span></li>)}
          {diff.changed.map((r) => (
            <li key={`c${r.id}`}>
              <span className="font-medium">Changed</span> <span className="break-words">{r.label}</span>:
              <ul className="ml-5 list-disc">
                {r.fields.map((f) => <li key={f.field} className="[overflow-wrap:anywhere]">{change(f)}</li>)}
              </ul>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

const pair = (p: Pair, unit: string, digits: (v: number) => string) => (
  <span className="figures whitespace-nowrap">{p.a === null ? "—" : `${digits(p.a)} ${unit}`} → {p.b === null ? "—" : `${digits(p.b)} ${unit}`}</span>
);

export function ComparisonTables({ comparison }: { comparison: Comparison }) {
  const pct = figure;
  const area = (v: number) => v.toFixed(1);
  return (
    <>
      <section aria-labelledby="inventory-changes" className="space-y-3">
        <h3 id="inventory-changes" className="text-lg font-semibold">What changed in the inventory</h3>
        {comparison.options.length ? <p className="text-sm">Options: {comparison.options.map(change).join("; ")}</p> : <p className="text-sm text-graphite-600">Same options.</p>}
        <div className="grid gap-4 md:grid-cols-2">
          <Changes title="Emitters" diff={comparison.inventory.emitters} />
          <Changes title="Surfaces" diff={comparison.inventory.surfaces} />
          <Changes title="Obstructions" diff={comparison.inventory.obstructions} />
          <Changes title="Access points" diff={comparison.inventory.accessPoints} />
        </div>
      </section>
      <section aria-labelledby="result-changes" className="space-y-2">
        <h3 id="result-changes" className="text-lg font-semibold">What changed in the results</h3>
        <p className="text-sm">Worst point over the site: {pair(comparison.results.worstPercent, "%", pct)}</p>
        <div className="overflow-x-auto rounded-sheet border border-rule bg-sheet">
          <table className="min-w-full text-sm">
            <caption className="sr-only">Worst point and areas per surface, A then B</caption>
            <thead className="border-b border-ink-900">
              <tr>{["Surface", "Worst point", "Over general", "Over occupational", "Over 10× occupational"].map((h) => <th key={h} scope="col" className={th}>{h}</th>)}</tr>
            </thead>
            <tbody>
              {comparison.results.surfaces.map((s) => (
                <tr key={s.surfaceId} className="border-b border-rule last:border-b-0">
                  <th scope="row" className={`${td} text-left font-medium break-words`}>{s.name}</th>
                  <td className={td}>{pair(s.worstPercent, "%", pct)}</td>
                  <td className={td}>{pair(s.overGeneralM2, "m²", area)}</td>
                  <td className={td}>{pair(s.overOccupationalM2, "m²", area)}</td>
                  <td className={td}>{pair(s.overTenTimesOccupationalM2, "m²", area)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </>
  );
}
