import { flexRender, getCoreRowModel, useReactTable, type ColumnDef } from "@tanstack/react-table";
import { EmptyState } from "./panels";

/** A plain data table on TanStack Table: header, rows, an empty state. */
export function TableShell<Row>({ columns, rows, caption, empty }: { columns: ColumnDef<Row, any>[]; rows: Row[]; caption: string; empty: string }) {
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel() });
  if (rows.length === 0) return <EmptyState title={empty} />;
  return (
    <div className="relative overflow-x-auto rounded-card border border-ink-200">
      <table className="min-w-full divide-y divide-ink-200 text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-50">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-3 py-2 text-left font-medium text-ink-600">
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-ink-100 bg-white">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-middle text-ink-800">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
