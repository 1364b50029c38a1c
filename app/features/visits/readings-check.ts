// Checks a batch of readings (from JSON, the CSV file or the table's form) against the field
// rules and the site's surfaces, and turns each valid one into the row to store: the value and
// unit as entered, and the power density by the plane-wave relations. Pure.
import { toPowerDensity, type ReadingUnit } from "./reading-units";
import { readingInputSchema, type ReadingInput } from "./schemas";
import type { StandardId, Tier } from "./standards";

export type SurfaceRef = { id: string; name: string };
export type ReadingProblem = { index: number; field: string; message: string };
export type NewReading = {
  surfaceId: string | null;
  label: string;
  x: number;
  y: number;
  heightM: number;
  value: number;
  unit: ReadingUnit;
  percentStandard: StandardId | null;
  percentTier: Tier | null;
  frequencyMHz: number | null;
  powerDensityWm2: number | null;
  notes: string;
};

type SurfaceChoice = { ok: true; id: string | null } | { ok: false; field: "surface" | "surfaceId"; message: string };

/** The surface a reading names, by id (`surfaceId`) or by name or id (`surface`); it must be one of the site's. */
export function resolveSurface(input: { surfaceId?: string | null; surface?: string }, surfaces: SurfaceRef[]): SurfaceChoice {
  const byName = input.surface?.trim() ?? "";
  if (input.surfaceId && byName) return { ok: false, field: "surface", message: "Give the surface once: its id or its name." };
  if (input.surfaceId) {
    return surfaces.some((s) => s.id === input.surfaceId) ? { ok: true, id: input.surfaceId } : { ok: false, field: "surfaceId", message: "No such surface on this site." };
  }
  if (!byName) return { ok: true, id: null };
  const exact = surfaces.find((s) => s.id === byName);
  if (exact) return { ok: true, id: exact.id };
  const named = surfaces.filter((s) => s.name.trim().toLocaleLowerCase() === byName.toLocaleLowerCase());
  if (named.length === 1) return { ok: true, id: named[0].id };
  if (named.length > 1) return { ok: false, field: "surface", message: `${named.length} surfaces of this site are named “${byName}”: give the surface's id.` };
  return { ok: false, field: "surface", message: `This site has no surface named “${byName}”.` };
}

/** The row to store from a reading that passed the schema, its surface resolved. */
export function toNewReading(r: ReadingInput, surfaceId: string | null): NewReading {
  const c = toPowerDensity(r);
  return {
    surfaceId,
    label: r.label,
    x: r.x,
    y: r.y,
    heightM: r.heightM,
    value: r.value,
    unit: r.unit,
    percentStandard: r.standard,
    percentTier: r.tier,
    frequencyMHz: r.frequencyMHz,
    powerDensityWm2: c.ok ? c.powerDensityWm2 : null,
    notes: r.notes,
  };
}

/** Every reading checked: the valid ones ready to store, and every problem (first per field) of the others. */
export function checkReadings(raw: readonly unknown[], surfaces: SurfaceRef[]) {
  const valid: { index: number; reading: NewReading }[] = [];
  const problems: ReadingProblem[] = [];
  raw.forEach((item, index) => {
    const parsed = readingInputSchema.safeParse(item);
    if (!parsed.success) {
      const seen = new Set<string>();
      for (const issue of parsed.error.issues) {
        const field = issue.code === "unrecognized_keys" ? issue.keys.join(", ") : String(issue.path[0] ?? "reading");
        if (seen.has(field)) continue;
        seen.add(field);
        problems.push({ index, field, message: issue.code === "unrecognized_keys" ? `Unknown field${issue.keys.length === 1 ? "" : "s"}: ${issue.keys.join(", ")}.` : issue.message });
      }
      return;
    }
    const surface = resolveSurface(parsed.data, surfaces);
    if (!surface.ok) {
      problems.push({ index, field: surface.field, message: surface.message });
      return;
    }
    valid.push({ index, reading: toNewReading(parsed.data, surface.id) });
  });
  return { valid, problems };
}
