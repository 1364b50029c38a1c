// What History records of a row: its own fields, without bookkeeping columns.
const bookkeeping = new Set(["organizationId", "createdAt", "updatedAt", "version", "emitterCount"]);

export function snapshot(row: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(row).filter(([k]) => !bookkeeping.has(k)));
}

/** The fields that differ between two snapshots, as a before and an after holding only those. */
export function changedFields(before: Record<string, unknown>, after: Record<string, unknown>) {
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].filter(
    (k) => JSON.stringify(before[k] ?? null) !== JSON.stringify(after[k] ?? null),
  );
  return {
    keys,
    before: Object.fromEntries(keys.map((k) => [k, before[k] ?? null])),
    after: Object.fromEntries(keys.map((k) => [k, after[k] ?? null])),
  };
}
