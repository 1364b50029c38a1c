// A server-paged table on TanStack Table: sorting and paging live in the URL, so the loader
// does the work, links can be shared, and Back restores the view.
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef } from "@tanstack/react-table";
import type { ReactNode } from "react";
import { Link, useNavigate, useSearchParams } from "react-router";
import { pageSizeOptions, pageWindow } from "~/lib/paging";

declare module "@tanstack/react-table" {
  interface ColumnMeta<TData, TValue> {
    /** The URL sort key of this column; absent when it cannot be sorted. */
    sortKey?: string;
    align?: "right";
  }
}

type Props<Row> = {
  caption: string;
  columns: ColumnDef<Row, any>[];
  rows: Row[];
  total: number;
  page: number;
  pageSize: number;
  sort: string;
  dir: "asc" | "desc";
  empty: ReactNode;
  getRowId?: (row: Row) => string;
};

function withParams(params: URLSearchParams, changes: Record<string, string | null>) {
  const next = new URLSearchParams(params);
  for (const [k, v] of Object.entries(changes)) {
    if (v === null) next.delete(k);
    else next.set(k, v);
  }
  return `?${next.toString()}`;
}

export function DataTable<Row>({ caption, columns, rows, total, page, pageSize, sort, dir, empty, getRowId }: Props<Row>) {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), manualPagination: true, manualSorting: true, getRowId });
  const { pages, pastEnd, text } = pageWindow(total, page, pageSize);
  return (
    <div>
      <div className="relative overflow-x-auto rounded-sheet border border-rule bg-white">
        <table className="min-w-full divide-y divide-rule text-sm">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-paper">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const key = header.column.columnDef.meta?.sortKey;
                  const active = key === sort;
                  const label = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
                  const right = header.column.columnDef.meta?.align === "right";
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={active ? (dir === "asc" ? "ascending" : "descending") : undefined}
                      className={`px-3 py-2 font-medium text-graphite-600 ${right ? "text-right" : "text-left"}`}
                    >
                      {key ? (
                        <Link
                          to={withParams(params, { sort: key, dir: active && dir === "asc" ? "desc" : "asc", page: null })}
                          className="inline-flex items-center gap-1 hover:text-ink-900"
                        >
                          {label}
                          <span aria-hidden="true" className={active ? "text-ink-900" : "text-graphite-300"}>
                            {active && dir === "desc" ? "▾" : "▴"}
                          </span>
                        </Link>
                      ) : (
                        label
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-rule">
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="hover:bg-paper/60">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={`px-3 py-2 align-middle text-ink-700 ${cell.column.columnDef.meta?.align === "right" ? "text-right tabular-nums" : ""}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 ? (
          <div className="px-6 py-10 text-center text-sm text-graphite-600">
            {pastEnd ? (
              <>
                This list has {pages === 1 ? "one page" : `${pages} pages`}; there is nothing on page {page}.{" "}
                <Link className="underline" to={withParams(params, { page: pages === 1 ? null : String(pages) })}>
                  Go to page {pages}
                </Link>
              </>
            ) : (
              empty
            )}
          </div>
        ) : null}
      </div>
      <nav aria-label="Pages" className="mt-3 flex flex-wrap items-center justify-between gap-3 text-sm text-graphite-600">
        <span className="tabular-nums">{text}</span>
        <span className="flex items-center gap-2">
          <label className="flex items-center gap-1">
            <span>Rows</span>
            <select
              className="rounded-control border border-rule bg-white px-1.5 py-1"
              value={pageSize}
              onChange={(e) => {
                navigate(withParams(params, { pageSize: e.target.value, page: null }));
              }}
            >
              {pageSizeOptions(pageSize).map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
          </label>
          {page > 1 && !pastEnd ? (
            <Link className="rounded-control px-2 py-1 ring-1 ring-rule hover:bg-paper" to={withParams(params, { page: String(page - 1) })}>
              Previous
            </Link>
          ) : null}
          <span className="tabular-nums">
            Page {Math.min(page, pages)} of {pages}
          </span>
          {page < pages ? (
            <Link className="rounded-control px-2 py-1 ring-1 ring-rule hover:bg-paper" to={withParams(params, { page: String(page + 1) })}>
              Next
            </Link>
          ) : null}
        </span>
      </nav>
    </div>
  );
}
