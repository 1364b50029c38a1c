// Frozen assessments: everything a report needs, as it was when the assessment was made (the site
// and client, the inventory, the options, every engine request and its response, the summary and
// per-surface results), plus the mitigation plan, which stays editable (with its own version)
// until a document is issued. A trigger (migration "assessment_frozen") refuses any update of the
// frozen columns, so later edits of the site can never change an assessment.
import { index, integer, json, jsonb, pgTable, text } from "drizzle-orm/pg-core";
import { organization, user } from "./auth";
import { createdAt, id, updatedAt } from "./columns";
import { site } from "./sites";

export const assessment = pgTable(
  "assessment",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    authorUserId: text("author_user_id").references(() => user.id, { onDelete: "set null" }),
    /** The author as named when the assessment was made. */
    authorName: text("author_name").notNull(),
    standard: text("standard").notNull(),
    tier: text("tier").notNull(),
    /** The exposure options (app/features/exposure/options.ts), defaults filled in. */
    options: jsonb("options").$type<Record<string, unknown>>().notNull(),
    /** The site and its client as they were: { site, client }. */
    site: jsonb("site").$type<Record<string, unknown>>().notNull(),
    /** surfaces, obstructions, accessPoints, emitters (all stored fields), patterns used. */
    inventory: jsonb("inventory").$type<Record<string, unknown>>().notNull(),
    /** [{ surfaceId, request, response }]: `json`, not `jsonb`, so the stored text is the engine's own bytes. */
    runs: json("runs").$type<unknown[]>().notNull(),
    /** The summary of the API contract (worst point, emitters with compliance distances, areas). */
    summary: jsonb("summary").$type<Record<string, unknown>>().notNull(),
    /** Per-surface results for the pages and documents: classes per cell, areas, contributions. */
    results: jsonb("results").$type<Record<string, unknown>>().notNull(),
    engine: text("engine").notNull(),
    mitigation: jsonb("mitigation").$type<Record<string, unknown>>().notNull(),
    mitigationVersion: integer("mitigation_version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("assessment_site_idx").on(t.siteId, t.createdAt), index("assessment_org_idx").on(t.organizationId, t.createdAt)],
);
