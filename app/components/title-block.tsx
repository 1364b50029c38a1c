import type { ReactNode } from "react";

export type TitleCell = { label: string; value: ReactNode; figure?: boolean };

/** A drawing's title block: ruled cells, a small-capitals label over each value. */
export function TitleBlock({ cells, label }: { cells: TitleCell[]; label: string }) {
  return (
    <dl aria-label={label} className="grid gap-px overflow-hidden rounded-sheet border border-ink-900 bg-rule md:auto-cols-fr md:grid-flow-col">
      {cells.map((cell) => (
        <div key={cell.label} className="min-w-0 bg-sheet px-4 py-3">
          <dt className="label-caps">{cell.label}</dt>
          <dd className={`mt-1 text-lg text-ink-900 [overflow-wrap:anywhere] ${cell.figure ? "figures" : "font-medium"}`}>{cell.value}</dd>
        </div>
      ))}
    </dl>
  );
}
