// Visits, photos and readings as the JSON API shows them.
import type { schema } from "~/infra/db.server";
import { calibrationWarnings } from "./calibration";

type VisitRow = typeof schema.visit.$inferSelect;
type PhotoRow = typeof schema.photo.$inferSelect & { fileName: string; mediaType: string; byteSize: number };
type ReadingRow = typeof schema.reading.$inferSelect & { surfaceName?: string | null };

export function visitJson(row: VisitRow, counts?: { photoCount: number; readingCount: number }) {
  return {
    id: row.id,
    siteId: row.siteId,
    visitedOn: row.visitedOn,
    people: row.people,
    conditions: row.conditions,
    instruments: row.instruments,
    notes: row.notes,
    /** Calibrations more than a year older than the visit, or after it: warnings, not refusals. */
    warnings: calibrationWarnings(row.visitedOn, row.instruments).map((w) => w.message),
    ...counts,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function photoJson(row: PhotoRow) {
  return {
    id: row.id,
    visitId: row.visitId,
    caption: row.caption,
    fileName: row.fileName,
    mediaType: row.mediaType,
    byteSize: row.byteSize,
    widthPx: row.widthPx,
    heightPx: row.heightPx,
    /** The camera clock's reading (no time zone), as an ISO string without one. */
    takenAt: row.takenAt ? row.takenAt.toISOString().slice(0, 19) : null,
    latitude: row.latitude,
    longitude: row.longitude,
    url: `/files/${row.fileId}`,
    thumbnailUrl: `/files/${row.thumbFileId}`,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
  };
}

export function readingJson(row: ReadingRow) {
  return {
    id: row.id,
    visitId: row.visitId,
    surfaceId: row.surfaceId,
    ...(row.surfaceName !== undefined ? { surfaceName: row.surfaceName } : {}),
    label: row.label,
    x: row.x,
    y: row.y,
    heightM: row.heightM,
    value: row.value,
    unit: row.unit,
    standard: row.percentStandard,
    tier: row.percentTier,
    /** null: a broadband reading. */
    frequencyMHz: row.frequencyMHz,
    /** W/m² by the plane-wave relations (η₀ = 376.73 Ω); null for a broadband % reading. */
    powerDensityWm2: row.powerDensityWm2,
    notes: row.notes,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
  };
}
