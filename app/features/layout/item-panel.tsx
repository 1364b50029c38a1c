// The selected record of the layout editor: its name, heights, who may be there, and its points in
// a coordinate table. Every keystroke changes the working copy, so the plan redraws as you type.
import type { ReactNode } from "react";
import { Button } from "~/components/button";
import { itemTypeLabels, type LayoutItem, type TextPoint } from "./editor-state";
import { accessKinds, accessLabels, accessPointKinds } from "./schemas";

type Props = { item: LayoutItem; problems: { field: string; message: string }[]; onChange: (item: LayoutItem) => void; onRemove: () => void };

const input = "block w-full min-w-0 rounded-control border border-rule-strong bg-sheet px-2 py-1.5 text-sm tabular-nums focus:outline-2 focus:outline-flag-600";

function Labelled({ id, label, children }: { id: string; label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <label htmlFor={id} className="mb-1 block text-xs font-medium text-graphite-600">
        {label}
      </label>
      {children}
    </div>
  );
}

function Metres({ id, label, value, onChange }: { id: string; label: string; value: string; onChange: (v: string) => void }) {
  return (
    <Labelled id={id} label={label}>
      <input id={id} inputMode="decimal" autoComplete="off" className={input} value={value} onChange={(e) => onChange(e.target.value)} />
    </Labelled>
  );
}

/** A new last point: halfway along the closing edge (so the outline stays valid), or beside the only point. */
function nextPoint(points: TextPoint[]): TextPoint {
  const n = (s: string) => Number(s.replace(",", "."));
  if (points.length === 0) return ["0", "0"];
  const [lx, ly] = points[points.length - 1].map(n);
  const [fx, fy] = points[0].map(n);
  if (![lx, ly, fx, fy].every(Number.isFinite)) return ["", ""];
  const round = (v: number) => String(Number(v.toFixed(2)));
  if (points.length === 1) return [round(lx + 1), round(ly)];
  return [round((lx + fx) / 2), round((ly + fy) / 2)];
}

function PointsTable({ id, points, onChange, fixed }: { id: string; points: TextPoint[]; onChange: (points: TextPoint[]) => void; fixed?: boolean }) {
  const set = (i: number, axis: 0 | 1, value: string) => onChange(points.map((p, j) => (j === i ? ((axis === 0 ? [value, p[1]] : [p[0], value]) as TextPoint) : p)));
  return (
    <div>
      <table className="w-full text-sm">
        <caption className="sr-only">Points in site metres (x east, y north)</caption>
        <thead>
          <tr className="text-left text-xs text-graphite-600">
            <th scope="col" className="w-8 pb-1 font-medium">#</th>
            <th scope="col" className="pb-1 font-medium">x (m, east)</th>
            <th scope="col" className="pb-1 pl-2 font-medium">y (m, north)</th>
            {fixed ? null : <th scope="col" className="w-8 pb-1"><span className="sr-only">Remove</span></th>}
          </tr>
        </thead>
        <tbody>
          {points.map((p, i) => (
            <tr key={i}>
              <th scope="row" className="pr-1 text-left font-normal text-graphite-600 tabular-nums">{i + 1}</th>
              <td className="py-0.5">
                <input aria-label={`Point ${i + 1} x`} id={`${id}-${i}-x`} inputMode="decimal" autoComplete="off" className={input} value={p[0]} onChange={(e) => set(i, 0, e.target.value)} />
              </td>
              <td className="py-0.5 pl-2">
                <input aria-label={`Point ${i + 1} y`} inputMode="decimal" autoComplete="off" className={input} value={p[1]} onChange={(e) => set(i, 1, e.target.value)} />
              </td>
              {fixed ? null : (
                <td className="pl-1 text-right">
                  <button type="button" aria-label={`Remove point ${i + 1}`} className="rounded-control px-1.5 py-1 text-graphite-600 hover:bg-paper hover:text-danger-700" onClick={() => onChange(points.filter((_, j) => j !== i))}>
                    ×
                  </button>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
      {fixed ? null : (
        <Button type="button" tone="secondary" size="sm" className="mt-2" onClick={() => onChange([...points, nextPoint(points)])}>
          Add point
        </Button>
      )}
    </div>
  );
}

export function ItemPanel({ item, problems, onChange, onRemove }: Props) {
  const id = `item-${item.key}`;
  const patch = (fields: Partial<LayoutItem>) => onChange({ ...item, ...fields } as LayoutItem);
  return (
    <div className="space-y-3">
      <div className="flex items-center justify-between gap-2">
        <p className="label-caps text-graphite-600">{itemTypeLabels[item.type]}</p>
        <Button type="button" tone="danger" size="sm" onClick={onRemove}>
          Remove {itemTypeLabels[item.type].toLowerCase()}
        </Button>
      </div>
      <Labelled id={`${id}-name`} label="Name">
        <input id={`${id}-name`} className={input} maxLength={100} value={item.name} onChange={(e) => patch({ name: e.target.value })} />
      </Labelled>
      {item.type === "area" || item.type === "facade" ? (
        <Labelled id={`${id}-access`} label="Who may be there">
          <select id={`${id}-access`} className={input} value={item.access} onChange={(e) => patch({ access: e.target.value as typeof item.access })}>
            {accessKinds.map((k) => (
              <option key={k} value={k}>
                {accessLabels[k]}
              </option>
            ))}
          </select>
        </Labelled>
      ) : null}
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
        {item.type === "area" ? <Metres id={`${id}-elevation`} label="Elevation (m)" value={item.elevationM} onChange={(v) => patch({ elevationM: v })} /> : null}
        {item.type === "facade" ? (
          <>
            <Metres id={`${id}-bottom`} label="Bottom (m)" value={item.bottomM} onChange={(v) => patch({ bottomM: v })} />
            <Metres id={`${id}-top`} label="Top (m)" value={item.topM} onChange={(v) => patch({ topM: v })} />
          </>
        ) : null}
        {item.type === "obstruction" ? (
          <>
            <Metres id={`${id}-base`} label="Base (m)" value={item.baseM} onChange={(v) => patch({ baseM: v })} />
            <Metres id={`${id}-height`} label="Height (m)" value={item.heightM} onChange={(v) => patch({ heightM: v })} />
          </>
        ) : null}
        {item.type === "access" ? (
          <>
            <Labelled id={`${id}-kind`} label="Kind">
              <select id={`${id}-kind`} className={input} value={item.kind} onChange={(e) => patch({ kind: e.target.value as typeof item.kind })}>
                {accessPointKinds.map((k) => (
                  <option key={k} value={k}>
                    {k}
                  </option>
                ))}
              </select>
            </Labelled>
            <Metres id={`${id}-x`} label="x (m, east)" value={item.x} onChange={(v) => patch({ x: v })} />
            <Metres id={`${id}-y`} label="y (m, north)" value={item.y} onChange={(v) => patch({ y: v })} />
            <Metres id={`${id}-z`} label="z (m)" value={item.z} onChange={(v) => patch({ z: v })} />
            <label className="col-span-2 flex items-center gap-2 self-end pb-1.5 text-sm">
              <input type="checkbox" checked={item.locked} onChange={(e) => patch({ locked: e.target.checked })} /> Locked
            </label>
          </>
        ) : null}
      </div>
      {item.type === "area" || item.type === "obstruction" ? <PointsTable id={id} points={item.polygon} onChange={(polygon) => patch({ polygon })} /> : null}
      {item.type === "facade" ? <PointsTable id={id} points={item.line} fixed onChange={(line) => patch({ line })} /> : null}
      {problems.length ? (
        <ul role="alert" className="space-y-1 rounded-control border-l-4 border-danger-700 bg-danger-100 px-3 py-2 text-sm text-danger-700" data-testid="item-problems">
          {problems.map((p, i) => (
            <li key={i}>{p.message}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
