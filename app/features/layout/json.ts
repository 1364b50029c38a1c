// Surfaces as the JSON API shows and takes them (issue contract):
// { id, name, kind: "area" | "facade", polygon | line, elevationM | bottomM, topM, access }.
import type { schema } from "~/infra/db.server";

type SurfaceRow = typeof schema.surface.$inferSelect;

export function surfaceJson(row: SurfaceRow) {
  return row.kind === "facade"
    ? { id: row.id, name: row.name, kind: "facade" as const, line: row.line, bottomM: row.bottomM, topM: row.topM, access: row.access }
    : { id: row.id, name: row.name, kind: "area" as const, polygon: row.polygon, elevationM: row.elevationM, access: row.access };
}
