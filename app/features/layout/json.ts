// Layout records as the JSON API shows and takes them (issue contract):
// { id, name, kind: "area" | "facade", polygon | line, elevationM | bottomM, topM, access },
// plus obstructions, access points and the roof drawing's placement.
import type { schema } from "~/infra/db.server";

type SurfaceRow = typeof schema.surface.$inferSelect;
type ObstructionRow = typeof schema.obstruction.$inferSelect;
type AccessPointRow = typeof schema.accessPoint.$inferSelect;
type BackdropRow = typeof schema.siteBackdrop.$inferSelect;
// What each mapper reads of its row (readLayout reads just these, as JSON).
export type SurfaceFields = Pick<SurfaceRow, "id" | "name" | "kind" | "polygon" | "line" | "elevationM" | "bottomM" | "topM" | "access">;
export type ObstructionFields = Pick<ObstructionRow, "id" | "name" | "polygon" | "baseM" | "heightM">;
export type AccessPointFields = Pick<AccessPointRow, "id" | "name" | "kind" | "x" | "y" | "z" | "locked">;
export type BackdropFields = Pick<BackdropRow, "fileId" | "widthPx" | "heightPx" | "p1" | "p2" | "distanceM" | "originX" | "originY" | "rotationDeg" | "opacity">;

export function surfaceJson(row: SurfaceFields) {
  return row.kind === "facade"
    ? { id: row.id, name: row.name, kind: "facade" as const, line: row.line, bottomM: row.bottomM, topM: row.topM, access: row.access }
    : { id: row.id, name: row.name, kind: "area" as const, polygon: row.polygon, elevationM: row.elevationM, access: row.access };
}

export function obstructionJson(row: ObstructionFields) {
  return { id: row.id, name: row.name, polygon: row.polygon, baseM: row.baseM, heightM: row.heightM };
}

export function accessPointJson(row: AccessPointFields) {
  return { id: row.id, name: row.name, kind: row.kind, x: row.x, y: row.y, z: row.z, locked: row.locked };
}

/** The roof drawing under the plan: its file (served at /files/:fileId) and where it lies. */
export function backdropJson(row: BackdropFields) {
  return {
    fileId: row.fileId,
    href: `/files/${row.fileId}`,
    widthPx: row.widthPx,
    heightPx: row.heightPx,
    p1: row.p1,
    p2: row.p2,
    distanceM: row.distanceM,
    originX: row.originX,
    originY: row.originY,
    rotationDeg: row.rotationDeg,
    opacity: row.opacity,
  };
}

export type SurfaceJson = ReturnType<typeof surfaceJson>;
export type ObstructionJson = ReturnType<typeof obstructionJson>;
export type AccessPointJson = ReturnType<typeof accessPointJson>;
export type BackdropJson = ReturnType<typeof backdropJson>;
export type LayoutJson = { version: number; surfaces: SurfaceJson[]; obstructions: ObstructionJson[]; accessPoints: AccessPointJson[]; backdrop: BackdropJson | null };
