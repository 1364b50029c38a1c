// Sorting the emitters table by a column, in the order TanStack Table's headers click through (the
// table used it before, decision 0009): a first click sorts text A→Z and numbers largest first, a
// second reverses, a third goes back to the stored order. Ties keep the stored order.
export type SortState = { id: string; desc: boolean } | null;
type Sortable<R> = { id: string; value: (row: R) => string | number };

export function nextSort<R>(current: SortState, column: Sortable<R>, rows: readonly R[]): SortState {
  const firstDesc = rows.length > 0 && typeof column.value(rows[0]) !== "string";
  if (!current || current.id !== column.id) return { id: column.id, desc: firstDesc };
  if (current.desc === firstDesc) return { id: column.id, desc: !firstDesc };
  return null;
}

const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });

export function sortRows<R>(rows: readonly R[], columns: readonly Sortable<R>[], state: SortState): readonly R[] {
  const column = state && columns.find((c) => c.id === state.id);
  if (!state || !column) return rows;
  const keyed = rows.map((row, index) => ({ row, index, key: column.value(row) }));
  keyed.sort((a, b) => {
    const order = typeof a.key === "number" && typeof b.key === "number" ? a.key - b.key : collator.compare(String(a.key), String(b.key));
    return (state.desc ? -order : order) || a.index - b.index;
  });
  return keyed.map((k) => k.row);
}
