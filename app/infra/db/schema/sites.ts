// Sites and their layout: walkable areas and facades (surfaces), obstructions, access points,
// and an optional roof drawing placed under the plan. Geometry in site-local metres:
// x east, y north, z up from the site's datum.
import { boolean, doublePrecision, index, integer, jsonb, pgTable, text } from "drizzle-orm/pg-core";
import { organization } from "./auth";
import { client } from "./clients";
import { createdAt, id, updatedAt, version } from "./columns";
import { storedFile } from "./files";

export type XY = [number, number];

export const site = pgTable(
  "site",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    clientId: text("client_id").references(() => client.id, { onDelete: "set null" }),
    name: text("name").notNull(),
    kind: text("kind").notNull(),
    address: text("address").notNull().default(""),
    city: text("city").notNull().default(""),
    latitude: doublePrecision("latitude"),
    longitude: doublePrecision("longitude"),
    datumNote: text("datum_note").notNull().default(""),
    accessNotes: text("access_notes").notNull().default(""),
    /** Kept by a trigger on emitter (migration 0004_site_emitter_count), for lists sorted by it. */
    emitterCount: integer("emitter_count").notNull().default(0),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("site_org_name_idx").on(t.organizationId, t.name),
    index("site_org_updated_idx").on(t.organizationId, t.updatedAt),
    // With the id, so a page sorted by emitter count (most sites tie) is read off the index either way.
    index("site_org_emitters_idx").on(t.organizationId, t.emitterCount, t.id),
    // Kind and city tie often too: a page sorted by either is read off its index, not sorted whole.
    index("site_org_kind_idx").on(t.organizationId, t.kind, t.id),
    index("site_org_city_idx").on(t.organizationId, t.city, t.id),
    index("site_client_idx").on(t.clientId),
    // Trigram index (pg_trgm, migrations 0014 and 0015) for the list's search, `%text%` on name,
    // city or address: a bitmap scan of the matches instead of testing every site of the organisation.
    index("site_search_idx").using("gin", t.name.op("gin_trgm_ops"), t.city.op("gin_trgm_ops"), t.address.op("gin_trgm_ops")),
  ],
);

/** An area (polygon at an elevation) or a facade (a plan segment from bottomM to topM). */
export const surface = pgTable(
  "surface",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    position: integer("position").notNull().default(0),
    name: text("name").notNull(),
    kind: text("kind").$type<"area" | "facade">().notNull(),
    polygon: jsonb("polygon").$type<XY[]>(),
    line: jsonb("line").$type<[XY, XY]>(),
    elevationM: doublePrecision("elevation_m"),
    bottomM: doublePrecision("bottom_m"),
    topM: doublePrecision("top_m"),
    access: text("access").$type<"public" | "workers" | "none">().notNull().default("public"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("surface_site_idx").on(t.siteId)],
);

/** Plant rooms, parapets, stair housings: a footprint from baseM up by heightM. */
export const obstruction = pgTable(
  "obstruction",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    position: integer("position").notNull().default(0),
    name: text("name").notNull(),
    polygon: jsonb("polygon").$type<XY[]>().notNull(),
    baseM: doublePrecision("base_m").notNull().default(0),
    heightM: doublePrecision("height_m").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("obstruction_site_idx").on(t.siteId)],
);

/** Doors, hatches, ladders: where people reach a level. */
export const accessPoint = pgTable(
  "access_point",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    position: integer("position").notNull().default(0),
    name: text("name").notNull(),
    kind: text("kind").$type<"door" | "hatch" | "ladder" | "stair" | "gate">().notNull(),
    x: doublePrecision("x").notNull(),
    y: doublePrecision("y").notNull(),
    z: doublePrecision("z").notNull().default(0),
    locked: boolean("locked").notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [index("access_point_site_idx").on(t.siteId)],
);

/**
 * A roof drawing or aerial image under the plan. Two image points (pixels) a known distance
 * apart give the scale; the first lands on (originX, originY) in site metres, rotated by rotationDeg.
 */
export const siteBackdrop = pgTable("site_backdrop", {
  siteId: text("site_id").primaryKey().references(() => site.id, { onDelete: "cascade" }),
  organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
  fileId: text("file_id").notNull().references(() => storedFile.id, { onDelete: "cascade" }),
  widthPx: integer("width_px").notNull(),
  heightPx: integer("height_px").notNull(),
  p1: jsonb("p1").$type<XY>().notNull(),
  p2: jsonb("p2").$type<XY>().notNull(),
  distanceM: doublePrecision("distance_m").notNull(),
  originX: doublePrecision("origin_x").notNull().default(0),
  originY: doublePrecision("origin_y").notNull().default(0),
  rotationDeg: doublePrecision("rotation_deg").notNull().default(0),
  opacity: doublePrecision("opacity").notNull().default(0.5),
  updatedAt: updatedAt(),
});
