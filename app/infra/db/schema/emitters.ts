// The organisation's antenna pattern library and each site's emitters, stored in the engine's
// units (W, dBi, MHz, degrees, metres) with the unit each value was entered in kept for display.
import { boolean, doublePrecision, index, integer, jsonb, pgTable, text } from "drizzle-orm/pg-core";
import type { z } from "zod/mini";
import type { patternSchema } from "~/engine/schema";
import { organization } from "./auth";
import { createdAt, id, updatedAt, version } from "./columns";
import { site } from "./sites";

/** The engine's pattern object (app/engine/README.md, "Emitter"). */
export type EnginePattern = z.output<typeof patternSchema>;

export const antennaPattern = pgTable(
  "antenna_pattern",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    maker: text("maker").notNull().default(""),
    model: text("model").notNull().default(""),
    /** "tabulated", "3gpp-38.901" or "itu-r-f.1336-sectoral" (the pattern object's own type). */
    kind: text("kind").notNull(),
    gainDbi: doublePrecision("gain_dbi"),
    frequencyMHz: doublePrecision("frequency_mhz"),
    hBeamwidthDeg: doublePrecision("h_beamwidth_deg"),
    vBeamwidthDeg: doublePrecision("v_beamwidth_deg"),
    pattern: jsonb("pattern").$type<EnginePattern>().notNull(),
    notes: text("notes").notNull().default(""),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("antenna_pattern_org_idx").on(t.organizationId, t.name)],
);

export const emitter = pgTable(
  "emitter",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    position: integer("position").notNull().default(0),
    label: text("label").notNull(),
    operator: text("operator").notNull().default(""),
    band: text("band").notNull().default(""),
    frequencyMHz: doublePrecision("frequency_mhz").notNull(),
    powerPerCarrierW: doublePrecision("power_per_carrier_w").notNull(),
    powerUnit: text("power_unit").$type<"W" | "dBm">().notNull().default("W"),
    carriers: integer("carriers").notNull().default(1),
    lossDb: doublePrecision("loss_db").notNull().default(0),
    gainDbi: doublePrecision("gain_dbi").notNull(),
    gainUnit: text("gain_unit").$type<"dBi" | "dBd">().notNull().default("dBi"),
    patternId: text("pattern_id").references(() => antennaPattern.id, { onDelete: "restrict" }),
    /** A parametric pattern of the emitter's own, when it uses no library pattern (null = isotropic unless beamwidths say otherwise). */
    pattern: jsonb("pattern").$type<EnginePattern>(),
    hBeamwidthDeg: doublePrecision("h_beamwidth_deg"),
    vBeamwidthDeg: doublePrecision("v_beamwidth_deg"),
    azimuthDeg: doublePrecision("azimuth_deg").notNull().default(0),
    mechanicalTiltDeg: doublePrecision("mechanical_tilt_deg").notNull().default(0),
    electricalTiltDeg: doublePrecision("electrical_tilt_deg").notNull().default(0),
    x: doublePrecision("x").notNull(),
    y: doublePrecision("y").notNull(),
    z: doublePrecision("z").notNull(),
    model: text("model").$type<"spherical" | "cylindrical" | "auto" | "aperture">().notNull().default("spherical"),
    apertureM: doublePrecision("aperture_m"),
    dishDiameterM: doublePrecision("dish_diameter_m"),
    dutyFactor: doublePrecision("duty_factor").notNull().default(1),
    actualMaxFactor: doublePrecision("actual_max_factor").notNull().default(1),
    tddFactor: doublePrecision("tdd_factor").notNull().default(1),
    active: boolean("active").notNull().default(true),
    notes: text("notes").notNull().default(""),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("emitter_site_idx").on(t.siteId, t.position), index("emitter_pattern_idx").on(t.patternId)],
);
