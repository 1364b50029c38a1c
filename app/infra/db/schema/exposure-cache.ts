// The Exposure page's computed results, kept so that opening the page again for an unchanged site
// and options reads them instead of running the engine over the whole site (seconds at 0.25 m).
// Keyed by a hash of everything the computation reads (engine version, result format, options,
// surfaces, emitters, patterns, readings): an edit of the site changes the key, so a row is never
// stale, only unused. A pure optimisation: deleting every row only makes the next opening slower.
import { index, integer, pgTable, primaryKey, text } from "drizzle-orm/pg-core";
import { organization } from "./auth";
import { createdAt } from "./columns";
import { site } from "./sites";

export const exposureResult = pgTable(
  "exposure_result",
  {
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    /** sha256 (hex) of the computation's input and versions. */
    key: text("key").notNull(),
    /** computeExposure's result as JSON text (read back with JSON.parse: the same numbers). */
    result: text("result").notNull(),
    /** How long the computation took when it ran. */
    computeMs: integer("compute_ms").notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.siteId, t.key] }), index("exposure_result_site_created_idx").on(t.siteId, t.createdAt)],
);
