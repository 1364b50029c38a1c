// Two frozen assessments of a site side by side: what changed in the inventory (records added,
// removed, and each changed field with its value before and after) and in the results (worst point
// per surface, area over each limit). Records are matched by id, so a renamed emitter is a change,
// not a removal and an addition. Pure: the page and the JSON API share it.

type Rec = Record<string, unknown> & { id: string };
export type FieldChange = { field: string; before: unknown; after: unknown };
export type RecordDiff = { added: { id: string; label: string }[]; removed: { id: string; label: string }[]; changed: { id: string; label: string; fields: FieldChange[] }[] };
export type Pair = { a: number | null; b: number | null };
export type SurfaceDiff = { surfaceId: string; name: string; worstPercent: Pair; overGeneralM2: Pair; overOccupationalM2: Pair; overTenTimesOccupationalM2: Pair };

/** Fields that follow from others or count edits: a change of theirs is never the change made. */
const DERIVED = new Set(["version", "eirpW", "erpW", "gain", "createdAt", "updatedAt"]);

const labelOf = (r: Rec) => String(r.label ?? r.name ?? r.id);

/** Nested plain objects ({ x, y, z }) compared field by field as "position.x"; arrays and patterns as wholes. */
function flatten(record: Record<string, unknown>, prefix = ""): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(record)) {
    if (DERIVED.has(key) || key === "id") continue;
    const name = prefix ? `${prefix}.${key}` : key;
    if (value && typeof value === "object" && !Array.isArray(value) && key === "position") Object.assign(out, flatten(value as Record<string, unknown>, name));
    else out[name] = value ?? null;
  }
  return out;
}

export function diffRecords(before: Rec[], after: Rec[]): RecordDiff {
  const old = new Map(before.map((r) => [r.id, r]));
  const now = new Map(after.map((r) => [r.id, r]));
  const diff: RecordDiff = { added: [], removed: [], changed: [] };
  for (const r of after) if (!old.has(r.id)) diff.added.push({ id: r.id, label: labelOf(r) });
  for (const r of before) if (!now.has(r.id)) diff.removed.push({ id: r.id, label: labelOf(r) });
  for (const r of after) {
    const was = old.get(r.id);
    if (!was) continue;
    const [a, b] = [flatten(was), flatten(r)];
    const fields = [...new Set([...Object.keys(a), ...Object.keys(b)])]
      .filter((k) => JSON.stringify(a[k] ?? null) !== JSON.stringify(b[k] ?? null))
      .map((k) => ({ field: k, before: a[k] ?? null, after: b[k] ?? null }));
    if (fields.length) diff.changed.push({ id: r.id, label: labelOf(r), fields });
  }
  return diff;
}

type Side = {
  options: Record<string, unknown>;
  inventory: { emitters: Rec[]; surfaces: Rec[]; obstructions?: Rec[]; accessPoints?: Rec[] };
  summary: { worstPercent: number; areas: { surfaceId: string; overGeneralM2: number; overOccupationalM2: number; overTenTimesOccupationalM2: number }[] };
  results: { surfaces: { surfaceId: string; name: string; worstPercent: number }[] };
};

export function compareAssessments(a: Side, b: Side) {
  const surfaceIds = [...new Set([...a.results.surfaces.map((s) => s.surfaceId), ...b.results.surfaces.map((s) => s.surfaceId)])];
  const pick = (side: Side, id: string) => ({ result: side.results.surfaces.find((s) => s.surfaceId === id), areas: side.summary.areas.find((s) => s.surfaceId === id) });
  const surfaces: SurfaceDiff[] = surfaceIds.map((id) => {
    const [x, y] = [pick(a, id), pick(b, id)];
    const pair = (f: (s: typeof x) => number | undefined): Pair => ({ a: f(x) ?? null, b: f(y) ?? null });
    return {
      surfaceId: id,
      name: y.result?.name ?? x.result?.name ?? id,
      worstPercent: pair((s) => s.result?.worstPercent),
      overGeneralM2: pair((s) => s.areas?.overGeneralM2),
      overOccupationalM2: pair((s) => s.areas?.overOccupationalM2),
      overTenTimesOccupationalM2: pair((s) => s.areas?.overTenTimesOccupationalM2),
    };
  });
  const options = diffRecords([{ id: "options", ...a.options }], [{ id: "options", ...b.options }]).changed[0]?.fields ?? [];
  return {
    options,
    inventory: {
      emitters: diffRecords(a.inventory.emitters, b.inventory.emitters),
      surfaces: diffRecords(a.inventory.surfaces, b.inventory.surfaces),
      obstructions: diffRecords(a.inventory.obstructions ?? [], b.inventory.obstructions ?? []),
      accessPoints: diffRecords(a.inventory.accessPoints ?? [], b.inventory.accessPoints ?? []),
    },
    results: { worstPercent: { a: a.summary.worstPercent, b: b.summary.worstPercent }, surfaces },
  };
}
export type Comparison = ReturnType<typeof compareAssessments>;
