// Site visits (surveys): who, when, conditions, instruments; their photos and field readings.
import { date, doublePrecision, index, integer, jsonb, pgTable, text, timestamp } from "drizzle-orm/pg-core";
import { organization } from "./auth";
import { createdAt, id, updatedAt, version } from "./columns";
import { storedFile } from "./files";
import { site, surface } from "./sites";

export type Instrument = { probe: string; serial: string; calibrationDate: string | null };

export const visit = pgTable(
  "visit",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    visitedOn: date("visited_on", { mode: "string" }).notNull(),
    people: text("people").notNull().default(""),
    conditions: text("conditions").notNull().default(""),
    instruments: jsonb("instruments").$type<Instrument[]>().notNull().default([]),
    notes: text("notes").notNull().default(""),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("visit_site_idx").on(t.siteId, t.visitedOn)],
);

export const photo = pgTable(
  "photo",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    visitId: text("visit_id").notNull().references(() => visit.id, { onDelete: "cascade" }),
    fileId: text("file_id").notNull().references(() => storedFile.id),
    thumbFileId: text("thumb_file_id").notNull().references(() => storedFile.id),
    caption: text("caption").notNull().default(""),
    widthPx: integer("width_px").notNull(),
    heightPx: integer("height_px").notNull(),
    takenAt: timestamp("taken_at", { withTimezone: true }),
    latitude: doublePrecision("latitude"),
    longitude: doublePrecision("longitude"),
    version: version(),
    createdAt: createdAt(),
  },
  (t) => [index("photo_visit_idx").on(t.visitId)],
);

export type ReadingUnit = "V/m" | "A/m" | "W/m2" | "mW/cm2" | "uW/cm2" | "percent";

/** One field reading, kept as entered (value, unit) and as power density (W/m²) by the plane-wave relations. */
export const reading = pgTable(
  "reading",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    visitId: text("visit_id").notNull().references(() => visit.id, { onDelete: "cascade" }),
    surfaceId: text("surface_id").references(() => surface.id, { onDelete: "set null" }),
    /** Order within the visit, as entered or imported. */
    position: integer("position").notNull().default(0),
    label: text("label").notNull().default(""),
    x: doublePrecision("x").notNull(),
    y: doublePrecision("y").notNull(),
    heightM: doublePrecision("height_m").notNull(),
    value: doublePrecision("value").notNull(),
    unit: text("unit").$type<ReadingUnit>().notNull(),
    /** For readings in % of a standard: which standard and tier. */
    percentStandard: text("percent_standard"),
    percentTier: text("percent_tier"),
    /** null for a broadband reading. */
    frequencyMHz: doublePrecision("frequency_mhz"),
    powerDensityWm2: doublePrecision("power_density_wm2"),
    notes: text("notes").notNull().default(""),
    version: version(),
    createdAt: createdAt(),
  },
  (t) => [index("reading_visit_idx").on(t.visitId, t.position)],
);
