// The emitters: figures, compliance distances for both tiers, the pattern as polar diagrams, and
// the what-if controls (on/off, power in dB or %, azimuth, total downtilt). Edits are not saved.
// Each row is memoised on what it shows, so an edit redraws the edited emitter's row, not all of them.
import { memo, useEffect, useMemo, useState } from "react";
import type { EnginePattern } from "~/infra/db/schema/emitters";
import { emitterPattern, type InventoryEmitter } from "./engine-inputs";
import type { EmitterView, ExposureResult } from "./exposure-result";
import { tierLabels, type ExposureOptions } from "./options";
import { PolarDiagrams } from "./polar-diagram";
import { Table, td, th } from "./exposure-tables";
import { dbToPercent, percentToDb, type EmitterEdit, type WhatIfEdits } from "./what-if";

type Props = {
  result: ExposureResult;
  stored: InventoryEmitter[];
  info: Record<string, { operator: string; band: string }>;
  patterns: [string, EnginePattern][];
  options: ExposureOptions;
  edits: WhatIfEdits;
  onEdit: (id: string, edit: EmitterEdit | null) => void;
};

const num = `${td} figures text-right whitespace-nowrap`;
const small = "w-20 rounded-control border border-rule-strong bg-sheet px-2 py-1 text-sm figures text-ink-900 aria-invalid:border-danger-700";

export function EmitterWhatIfTable({ result, stored, info, patterns, options, edits, onEdit }: Props) {
  const views = new Map(result.emitters.map((e) => [e.inventoryId, e]));
  // The pattern drawn on each row, from the stored inventory (a what-if never changes a pattern, and a
  // result's own patterns arrive as new, equal objects): the same object from render to render.
  const drawn = useMemo(() => {
    const library = new Map(patterns);
    return new Map(stored.map((s) => [s.id, emitterPattern(s, library)]));
  }, [stored, patterns]);
  const tiers = tierLabels[options.standard];
  return (
    <Table
      caption="Emitters: figures, compliance distances, patterns and what-if edits"
      testId="emitters"
      head={
        <tr>
          <th className={th}>Emitter</th>
          <th className={`${th} text-right`}>MHz</th>
          <th className={`${th} text-right`}>EIRP W</th>
          <th className={`${th} text-right`} title={`Boresight distance to 100 % of the ${tiers.general} limit, this emitter alone`}>
            Distance, general m
          </th>
          <th className={`${th} text-right`} title={`Boresight distance to 100 % of the ${tiers.occupational} limit, this emitter alone`}>
            Distance, occupational m
          </th>
          <th className={th}>Pattern</th>
          <th className={th}>What-if (not saved)</th>
        </tr>
      }
    >
      {stored.map((s) => (
        <EmitterRow key={s.id} emitter={s} view={views.get(s.id)} edit={edits[s.id]} meta={info[s.id]} pattern={drawn.get(s.id)!} onEdit={onEdit} />
      ))}
    </Table>
  );
}

type RowProps = { emitter: InventoryEmitter; view: EmitterView | undefined; edit: EmitterEdit | undefined; meta: { operator: string; band: string } | undefined; pattern: EnginePattern; onEdit: Props["onEdit"] };

/** The figures a row shows of its emitter's view: a new result redraws only the rows whose figures changed (an edit changes one emitter). */
const shown = (v: EmitterView | undefined) => (v ? [v.eirpW, v.complianceDistanceM?.general, v.complianceDistanceM?.occupational, v.azimuthDeg, v.tiltDeg] : null);
const sameRow = (a: RowProps, b: RowProps) =>
  a.emitter === b.emitter && a.edit === b.edit && a.meta === b.meta && a.pattern === b.pattern && a.onEdit === b.onEdit && JSON.stringify(shown(a.view)) === JSON.stringify(shown(b.view));

const EmitterRow = memo(function EmitterRow({ emitter: s, view: v, edit, meta, pattern, onEdit }: RowProps) {
  return (
    <tr data-emitter-row={s.label} className={edit ? "bg-paper" : undefined}>
      <th scope="row" className={`${td} text-left font-medium`}>
        {s.label}
        <span className="block text-xs font-normal text-graphite-600">{[meta?.operator, meta?.band].filter(Boolean).join(" · ")}</span>
        {!s.active ? <span className="block text-xs font-normal text-graphite-600">inactive in the inventory: left out</span> : null}
      </th>
      <td className={num}>{s.frequencyMHz}</td>
      <td className={num}>{v?.eirpW != null ? Number(v.eirpW.toPrecision(4)) : "–"}</td>
      <td className={num}>{v?.complianceDistanceM ? v.complianceDistanceM.general.toFixed(2) : "–"}</td>
      <td className={num}>{v?.complianceDistanceM ? v.complianceDistanceM.occupational.toFixed(2) : "–"}</td>
      <td className={td}>{v ? <PolarDiagrams pattern={pattern} azimuthDeg={v.azimuthDeg} tiltDeg={v.tiltDeg} label={s.label} /> : null}</td>
      <td className={td}>{s.active ? <EditControls emitter={s} edit={edit ?? NO_EDIT} onEdit={(e) => onEdit(s.id, e)} /> : null}</td>
    </tr>
  );
}, sameRow);

const NO_EDIT: EmitterEdit = {};

function EditControls({ emitter, edit, onEdit }: { emitter: InventoryEmitter; edit: EmitterEdit; onEdit: (edit: EmitterEdit | null) => void }) {
  const [unit, setUnit] = useState<"dB" | "%">("dB");
  const tilt = emitter.mechanicalTiltDeg + emitter.electricalTiltDeg;
  const id = `wi-${emitter.id}`;
  const powerShown = edit.powerDb === undefined ? (unit === "dB" ? 0 : 100) : unit === "dB" ? edit.powerDb : Number(dbToPercent(edit.powerDb).toPrecision(4));
  return (
    <div className="flex flex-wrap items-end gap-x-3 gap-y-1.5">
      <label className="flex items-center gap-1.5 self-center text-sm">
        <input type="checkbox" checked={!edit.off} onChange={(e) => onEdit({ ...edit, off: !e.target.checked || undefined })} aria-label={`${emitter.label} on`} className="h-4 w-4 accent-ink-900" />
        On
      </label>
      <NumberBox
        id={`${id}-power`}
        label={`Power (${unit})`}
        value={powerShown}
        disabled={edit.off}
        onValue={(n) => {
          const db = unit === "dB" ? n : percentToDb(n);
          if (db === null) onEdit({ ...edit, off: true });
          else onEdit({ ...edit, powerDb: db === 0 ? undefined : db });
        }}
      >
        <select aria-label={`${emitter.label} power unit`} value={unit} onChange={(e) => setUnit(e.target.value as "dB" | "%")} className="rounded-control border border-rule-strong bg-sheet px-1 py-1 text-sm">
          <option value="dB">dB</option>
          <option value="%">%</option>
        </select>
      </NumberBox>
      <NumberBox id={`${id}-azimuth`} label="Azimuth °" value={edit.azimuthDeg ?? emitter.azimuthDeg} disabled={edit.off} onValue={(n) => onEdit({ ...edit, azimuthDeg: n === emitter.azimuthDeg ? undefined : n })} />
      <NumberBox id={`${id}-tilt`} label="Downtilt °" value={edit.tiltDeg ?? tilt} disabled={edit.off} onValue={(n) => onEdit({ ...edit, tiltDeg: n === tilt ? undefined : n })} />
    </div>
  );
}

/** A number input that keeps what is typed and reports each value that parses (committed on change, so the map follows the typing). */
function NumberBox({ id, label, value, disabled, onValue, children }: { id: string; label: string; value: number; disabled?: boolean; onValue: (n: number) => void; children?: React.ReactNode }) {
  const [text, setText] = useState(String(value));
  useEffect(() => {
    if (Number(text) !== value) setText(String(value));
    // Only when the value changes from outside (reset, unit switch).
  }, [value]);
  const valid = text.trim() !== "" && Number.isFinite(Number(text));
  return (
    <div>
      <label htmlFor={id} className="block text-xs text-graphite-600">
        {label}
      </label>
      <div className="flex gap-1">
        <input
          id={id}
          type="number"
          inputMode="decimal"
          step="any"
          value={text}
          disabled={disabled}
          aria-invalid={!valid || undefined}
          onChange={(e) => {
            setText(e.target.value);
            const n = Number(e.target.value);
            if (e.target.value.trim() !== "" && Number.isFinite(n)) onValue(n);
          }}
          className={small}
        />
        {children}
      </div>
    </div>
  );
}
