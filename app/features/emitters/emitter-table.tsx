// The site's emitters in one dense table (sortable by any column), each row with its EIRP and ERP
// from the engine's unit functions, edited in place (EmitterForm through a fetcher) and deleted
// after a second click. Below 48rem each row is a card (.table-stack).
// It is the heaviest server render of the portal (60+ rows × 15 cells), so it is kept lean (decision
// 0009): plain columns sorted by a small hook (sort.ts, TanStack's click order) instead of a table
// model, the cells' shared styles in one CSS rule (.emitter-grid in app.css) instead of on every
// cell, and the row editor rendered only when a row is opened.
import { Fragment, useMemo, useState, type ReactNode } from "react";
import { useFetcher } from "react-router";
import { buttonClass } from "~/components/button";
import {
  formDefaults,
  gainFromDbi,
  powerFromW,
  tidy,
  type EmitterValues,
} from "./convert";
import { EmitterForm, type LibraryOption } from "./emitter-form";
import { formatNumber, formatWatts } from "./format";
import {
  OPERATOR_INK,
  OPERATOR_PALETTE,
  operatorColours,
} from "./operator-palette";
import { parametricLabels, type ParametricKind } from "./schemas";
import { nextSort, sortRows, type SortState } from "./sort";

export type EmitterRowView = EmitterValues & {
  id: string;
  version: number;
  eirpW: number;
  erpW: number;
};

function DeleteEmitter({ row }: { row: EmitterRowView }) {
  const fetcher = useFetcher();
  const [asking, setAsking] = useState(false);
  if (!asking)
    return (
      <button
        type="button"
        className={buttonClass("quiet", "px-2 py-1")}
        onClick={() => setAsking(true)}
        aria-label={`Delete emitter ${row.label}`}
      >
        Delete
      </button>
    );
  return (
    <fetcher.Form method="post" className="inline-flex items-center gap-1">
      <input type="hidden" name="intent" value="delete-emitter" />
      <input type="hidden" name="id" value={row.id} />
      <button
        type="submit"
        className={buttonClass("danger", "px-2 py-1")}
        disabled={fetcher.state !== "idle"}
      >
        Delete {row.label}
      </button>
      <button
        type="button"
        className={buttonClass("quiet", "px-2 py-1")}
        onClick={() => setAsking(false)}
      >
        Keep
      </button>
    </fetcher.Form>
  );
}

function patternText(r: EmitterRowView, names: Map<string, string>) {
  if (r.patternId) return names.get(r.patternId) ?? "library pattern";
  const type = (r.pattern as { type?: string } | null)?.type as
    ParametricKind | undefined;
  const beams =
    r.hBeamwidthDeg && r.vBeamwidthDeg
      ? ` ${r.hBeamwidthDeg}°/${r.vBeamwidthDeg}°`
      : "";
  if (type && parametricLabels[type])
    return `${type === "3gpp-38.901" ? "3GPP" : "F.1336"}${beams}`;
  return beams ? `3GPP${beams}` : "isotropic";
}

/** Columns a phone's card leaves out (the row's editor shows them). */
const phoneHidden = new Set(["band", "lossDb", "model", "factors", "erp"]);

type Column = { id: string; header: string; value: (r: EmitterRowView) => string | number; cell?: (r: EmitterRowView) => ReactNode; className?: string };

/** The cells' class beyond .emitter-grid's shared one: phones leave some out; the label stays put when scrolling sideways. */
const cellClass = (id: string) => (phoneHidden.has(id) ? "phone-hide" : id === "label" ? "sticky-label" : undefined);
const editButton = buttonClass("quiet", "px-2 py-1");

export function EmitterTable({
  rows,
  library,
  canEdit,
}: {
  rows: EmitterRowView[];
  library: LibraryOption[];
  canEdit: boolean;
}) {
  const [editing, setEditing] = useState<string | null>(null);
  const [sorting, setSorting] = useState<SortState>(null);
  const names = useMemo(
    () => new Map(library.map((p) => [p.id, p.name])),
    [library],
  );
  const colours = useMemo(
    () => operatorColours(rows.map((r) => r.operator)),
    [rows],
  );
  const columns = useMemo<Column[]>(
    () => ([
      {
        id: "label",
        header: "Label",
        value: (r) => r.label,
        cell: (r) => (
          <span className="font-semibold">
            {r.label}
            {r.active ? null : (
              <span className="ml-1 rounded-control border border-rule-strong px-1 text-xs font-normal text-graphite-600">
                off
              </span>
            )}
          </span>
        ),
      },
      {
        id: "operator",
        header: "Operator",
        value: (r) => r.operator,
        cell: (r) => {
          const i = colours.get(r.operator.trim() || "—") ?? 0;
          return (
            <span
              className="inline-flex max-w-28 items-center max-md:max-w-none gap-1.5"
              title={r.operator}
            >
              <svg
                width="10"
                height="10"
                aria-hidden="true"
                className="shrink-0"
              >
                <circle
                  cx="5"
                  cy="5"
                  r="4.5"
                  fill={OPERATOR_PALETTE[i]}
                  stroke="#000000"
                  strokeWidth="0.5"
                />
              </svg>
              <span className="truncate">{r.operator || "—"}</span>
            </span>
          );
        },
      },
      {
        id: "band",
        header: "Band",
        value: (r) => r.band,
        cell: (r) => (
          <span className="block max-w-20 truncate max-md:max-w-none" title={r.band}>
            {r.band || "—"}
          </span>
        ),
      },
      {
        id: "frequencyMHz",
        header: "MHz",
        value: (r) => r.frequencyMHz,
        cell: (r) => formatNumber(r.frequencyMHz),
      },
      {
        id: "power",
        header: "Power",
        value: (r) => r.powerPerCarrierW * r.carriers,
        cell: (r) => {
          return (
            <span
              title={`${formatWatts(r.powerPerCarrierW)} per carrier × ${r.carriers}`}
            >
              {r.powerUnit === "dBm"
                ? `${Number(powerFromW(r.powerPerCarrierW, "dBm").toFixed(2))} dBm`
                : formatWatts(r.powerPerCarrierW)}{" "}
              <span className="text-graphite-600">×{r.carriers}</span>
            </span>
          );
        },
      },
      {
        id: "lossDb",
        header: "Loss",
        value: (r) => r.lossDb,
        cell: (r) => `${r.lossDb} dB`,
      },
      {
        id: "gain",
        header: "Gain",
        value: (r) => r.gainDbi,
        cell: (r) => {
          return `${tidy(gainFromDbi(r.gainDbi, r.gainUnit))} ${r.gainUnit}`;
        },
      },
      {
        id: "eirp",
        header: "EIRP",
        value: (r) => r.eirpW,
        cell: (r) => (
          <span className="font-semibold">
            {formatWatts(r.eirpW)}
          </span>
        ),
      },
      {
        id: "erp",
        header: "ERP",
        value: (r) => r.erpW,
        cell: (r) => formatWatts(r.erpW),
      },
      {
        id: "pattern",
        header: "Pattern",
        value: (r) => patternText(r, names),
        cell: (r) => (
          <span
            className="block max-w-36 truncate"
            title={patternText(r, names)}
          >
            {patternText(r, names)}
          </span>
        ),
      },
      { id: "azimuthDeg", header: "Az°", value: (r) => r.azimuthDeg },
      {
        id: "tilt",
        header: "Tilt°",
        value: (r) => r.mechanicalTiltDeg + r.electricalTiltDeg,
        cell: (r) => {
          return (
            <span
              title={`mechanical ${r.mechanicalTiltDeg}° + electrical ${r.electricalTiltDeg}°`}
            >
              {tidy(r.mechanicalTiltDeg + r.electricalTiltDeg)}{" "}
              <span className="text-graphite-600">
                ({r.mechanicalTiltDeg}+{r.electricalTiltDeg})
              </span>
            </span>
          );
        },
      },
      {
        id: "position",
        header: "x, y, z (m)",
        value: (r) => r.z,
        cell: (r) => {
          return `${r.x}, ${r.y}, ${r.z}`;
        },
      },
      {
        id: "model",
        header: "Model",
        value: (r) => r.model,
        cell: (r) => {
          return r.model === "aperture"
            ? `dish ${r.dishDiameterM} m`
            : r.apertureM && r.model !== "spherical"
              ? `${r.model === "cylindrical" ? "cyl." : r.model} ${r.apertureM} m`
              : r.model === "spherical"
                ? "sph."
                : r.model;
        },
      },
      {
        id: "factors",
        header: "Avg.",
        value: (r) => r.dutyFactor * r.actualMaxFactor * r.tddFactor,
        cell: (r) => {
          const f = r.dutyFactor * r.actualMaxFactor * r.tddFactor;
          return (
            <span
              title={`duty ${r.dutyFactor} × F_PR ${r.actualMaxFactor} × TDD ${r.tddFactor}`}
            >
              {f === 1 ? "1" : Number(f.toPrecision(3))}
            </span>
          );
        },
      },
    ] satisfies Column[]).map((column) => ({ ...column, className: cellClass(column.id) })),
    [names, colours],
  );
  const sorted = useMemo(() => sortRows(rows, columns, sorting), [rows, columns, sorting]);
  const span = columns.length + (canEdit ? 1 : 0);
  return (
    <div className="relative max-w-full overflow-x-auto rounded-sheet border border-rule bg-sheet">
      <table className="table-stack emitter-grid min-w-full text-sm md:text-[13px]">
        <caption className="sr-only">
          Emitters of this site, with EIRP and ERP
        </caption>
        <thead className="border-b border-ink-900">
          <tr>
            {columns.map((column) => {
              const dir = sorting?.id === column.id ? (sorting.desc ? "desc" : "asc") : false;
              return (
                <th
                  key={column.id}
                  scope="col"
                  aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : undefined}
                  className={`label-caps px-1.5 py-2 text-left font-medium whitespace-nowrap ${column.id === "label" ? "sticky-label" : ""}`}
                >
                  <button
                    type="button"
                    className="inline-flex items-center gap-0.5 hover:text-ink-900"
                    onClick={() => setSorting((current) => nextSort(current, column, rows))}
                  >
                    {column.header}
                    <span aria-hidden="true" className="w-2">
                      {dir === "asc" ? "▲" : dir === "desc" ? "▼" : ""}
                    </span>
                  </button>
                </th>
              );
            })}
            {canEdit ? (
              <th scope="col" className="px-2 py-2">
                <span className="sr-only">Actions</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {sorted.map((row) => (
            <Fragment key={row.id}>
              <tr className={editing === row.id ? "bg-paper" : row.active ? undefined : "text-graphite-600"}>
                {columns.map((column) => (
                  <td key={column.id} data-label={column.header} className={column.className}>
                    {column.cell ? column.cell(row) : String(column.value(row))}
                  </td>
                ))}
                {canEdit ? (
                  <td data-label="" className="row-actions">
                    <button
                      type="button"
                      className={editButton}
                      aria-expanded={editing === row.id}
                      onClick={() => setEditing(editing === row.id ? null : row.id)}
                      aria-label={`Edit emitter ${row.label}`}
                    >
                      {editing === row.id ? "Close" : "Edit"}
                    </button>
                  </td>
                ) : null}
              </tr>
              {editing === row.id ? (
                <tr className="border-b border-ink-900 bg-paper">
                  <td colSpan={span} className="px-3 py-3">
                    <div className="sticky left-3 max-w-[calc(100vw-4rem)] lg:max-w-[68rem]">
                      <EmitterForm
                        intent="save-emitter"
                        formId={`emitter-${row.id}`}
                        defaults={{
                          ...formDefaults(row),
                          id: row.id,
                          version: String(row.version),
                        }}
                        library={library}
                        submitLabel={`Save ${row.label}`}
                        onDone={() => setEditing(null)}
                        onCancel={() => setEditing(null)}
                      />
                      <div className="mt-3 border-t border-rule pt-3">
                        <DeleteEmitter row={row} />
                      </div>
                    </div>
                  </td>
                </tr>
              ) : null}
            </Fragment>
          ))}
        </tbody>
      </table>
    </div>
  );
}
