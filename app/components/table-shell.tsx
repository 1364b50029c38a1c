import { flexRender, getCoreRowModel, useReactTable, type ColumnDef } from "@tanstack/react-table";
import { EmptyState } from "./panels";

type Props<Row> = {
  columns: ColumnDef<Row, any>[];
  rows: Row[];
  caption: string;
  empty: string;
  /** Below 48rem, show each row as a card with the column names beside the values (app.css, .table-stack). */
  stack?: boolean;
};

/** A plain data table on TanStack Table: header, rows, an empty state; figures line up. */
export function TableShell<Row>({ columns, rows, caption, empty, stack = false }: Props<Row>) {
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel() });
  if (rows.length === 0) return <EmptyState title={empty} />;
  return (
    <div className={`rounded-sheet border border-rule bg-sheet ${stack ? "md:overflow-x-auto" : "overflow-x-auto"}`}>
      <table className={`min-w-full text-sm ${stack ? "table-stack" : ""}`}>
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-ink-900">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="label-caps px-4 py-2.5 text-left font-medium">
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule last:border-b-0">
              {row.getVisibleCells().map((cell) => {
                const header = cell.column.columnDef.header;
                return (
                  <td key={cell.id} data-label={typeof header === "string" ? header : ""} className="px-4 py-2.5 align-middle text-ink-900 [overflow-wrap:anywhere]">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
