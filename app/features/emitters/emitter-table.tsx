// The site's emitters in one dense table (TanStack Table; sortable by any column), each row with
// its EIRP and ERP from the engine's unit functions, edited in place (EmitterForm through a
// fetcher) and deleted after a second click. Below 48rem each row is a card (.table-stack).
import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { Fragment, useMemo, useState } from "react";
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
  const [sorting, setSorting] = useState<SortingState>([]);
  const names = useMemo(
    () => new Map(library.map((p) => [p.id, p.name])),
    [library],
  );
  const colours = useMemo(
    () => operatorColours(rows.map((r) => r.operator)),
    [rows],
  );
  const columns = useMemo<ColumnDef<EmitterRowView, unknown>[]>(
    () => [
      {
        id: "label",
        header: "Label",
        accessorKey: "label",
        cell: (c) => (
          <span className="font-semibold">
            {c.row.original.label}
            {c.row.original.active ? null : (
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
        accessorKey: "operator",
        cell: (c) => {
          const i = colours.get(c.row.original.operator.trim() || "—") ?? 0;
          return (
            <span
              className="inline-flex max-w-28 items-center max-md:max-w-none gap-1.5"
              title={c.row.original.operator}
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
              <span className="truncate">{c.row.original.operator || "—"}</span>
            </span>
          );
        },
      },
      {
        id: "band",
        header: "Band",
        accessorKey: "band",
        cell: (c) => (
          <span className="block max-w-20 truncate max-md:max-w-none" title={c.row.original.band}>
            {c.row.original.band || "—"}
          </span>
        ),
      },
      {
        id: "frequencyMHz",
        header: "MHz",
        accessorKey: "frequencyMHz",
        cell: (c) => formatNumber(c.row.original.frequencyMHz),
      },
      {
        id: "power",
        header: "Power",
        accessorFn: (r) => r.powerPerCarrierW * r.carriers,
        cell: (c) => {
          const r = c.row.original;
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
        accessorKey: "lossDb",
        cell: (c) => `${c.row.original.lossDb} dB`,
      },
      {
        id: "gain",
        header: "Gain",
        accessorKey: "gainDbi",
        cell: (c) => {
          const r = c.row.original;
          return `${tidy(gainFromDbi(r.gainDbi, r.gainUnit))} ${r.gainUnit}`;
        },
      },
      {
        id: "eirp",
        header: "EIRP",
        accessorKey: "eirpW",
        cell: (c) => (
          <span className="font-semibold">
            {formatWatts(c.row.original.eirpW)}
          </span>
        ),
      },
      {
        id: "erp",
        header: "ERP",
        accessorKey: "erpW",
        cell: (c) => formatWatts(c.row.original.erpW),
      },
      {
        id: "pattern",
        header: "Pattern",
        accessorFn: (r) => patternText(r, names),
        cell: (c) => (
          <span
            className="block max-w-36 truncate"
            title={String(c.getValue())}
          >
            {String(c.getValue())}
          </span>
        ),
      },
      { id: "azimuthDeg", header: "Az°", accessorKey: "azimuthDeg" },
      {
        id: "tilt",
        header: "Tilt°",
        accessorFn: (r) => r.mechanicalTiltDeg + r.electricalTiltDeg,
        cell: (c) => {
          const r = c.row.original;
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
        accessorFn: (r) => r.z,
        cell: (c) => {
          const r = c.row.original;
          return `${r.x}, ${r.y}, ${r.z}`;
        },
      },
      {
        id: "model",
        header: "Model",
        accessorKey: "model",
        cell: (c) => {
          const r = c.row.original;
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
        accessorFn: (r) => r.dutyFactor * r.actualMaxFactor * r.tddFactor,
        cell: (c) => {
          const r = c.row.original;
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
    ],
    [names, colours],
  );
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (r) => r.id,
  });
  const span = columns.length + (canEdit ? 1 : 0);
  return (
    <div className="relative max-w-full overflow-x-auto rounded-sheet border border-rule bg-sheet">
      <table className="table-stack min-w-full text-sm md:text-[13px]">
        <caption className="sr-only">
          Emitters of this site, with EIRP and ERP
        </caption>
        <thead className="border-b border-ink-900">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th
                    key={h.id}
                    scope="col"
                    aria-sort={
                      sorted === "asc"
                        ? "ascending"
                        : sorted === "desc"
                          ? "descending"
                          : undefined
                    }
                    className={`label-caps px-1.5 py-2 text-left font-medium whitespace-nowrap ${h.column.id === "label" ? "md:sticky md:left-0 md:z-10 md:bg-sheet" : ""}`}
                  >
                    <button
                      type="button"
                      className="inline-flex items-center gap-0.5 hover:text-ink-900"
                      onClick={h.column.getToggleSortingHandler()}
                    >
                      {flexRender(h.column.columnDef.header, h.getContext())}
                      <span aria-hidden="true" className="w-2">
                        {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}
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
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <Fragment key={row.id}>
              <tr
                className={`border-b border-rule align-top ${editing === row.id ? "bg-paper" : "hover:bg-paper/60"} ${row.original.active ? "" : "text-graphite-600"}`}
              >
                {row.getVisibleCells().map((cell) => (
                  <td
                    key={cell.id}
                    data-label={String(cell.column.columnDef.header)}
                    className={`px-1.5 py-1.5 whitespace-nowrap text-ink-900 tabular-nums max-md:whitespace-normal ${phoneHidden.has(cell.column.id) ? "max-md:hidden!" : ""} ${cell.column.id === "label" ? "md:sticky md:left-0 md:z-10 md:bg-sheet" : ""}`}
                  >
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
                {canEdit ? (
                  <td
                    data-label=""
                    className="px-2 py-1 text-right whitespace-nowrap"
                  >
                    <button
                      type="button"
                      className={buttonClass("quiet", "px-2 py-1")}
                      aria-expanded={editing === row.id}
                      onClick={() =>
                        setEditing(editing === row.id ? null : row.id)
                      }
                      aria-label={`Edit emitter ${row.original.label}`}
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
                          ...formDefaults(row.original),
                          id: row.original.id,
                          version: String(row.original.version),
                        }}
                        library={library}
                        submitLabel={`Save ${row.original.label}`}
                        onDone={() => setEditing(null)}
                        onCancel={() => setEditing(null)}
                      />
                      <div className="mt-3 border-t border-rule pt-3">
                        <DeleteEmitter row={row.original} />
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
