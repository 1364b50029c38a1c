// Regulator filings (issue 9 §5): an issued assessment (one whose report is issued) sent by an
// engineer or reviewer to a `regulator` member of the organisation. The filing names the issued
// report it went with, so its bundle always holds that report's fixed bytes. `authority` is the
// name of the body the filing is addressed to (e.g. "Spectrum Safety Office"), typed by the filer
// (prefilled from the regulator's name) and kept as filed. A regulator member sees only the filings
// addressed to it.
import { index, pgTable, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";
import { assessment } from "./assessments";
import { member, organization, user } from "./auth";
import { createdAt, id } from "./columns";
import { document } from "./documents";
import { site } from "./sites";

export const filing = pgTable(
  "filing",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    assessmentId: text("assessment_id").notNull().references(() => assessment.id, { onDelete: "cascade" }),
    /** The issued report filed with the assessment. */
    documentId: text("document_id").notNull().references(() => document.id, { onDelete: "cascade" }),
    /** The regulator member whose inbox holds it (null once that member has left the organisation). */
    regulatorMemberId: text("regulator_member_id").references(() => member.id, { onDelete: "set null" }),
    authority: text("authority").notNull(),
    note: text("note").notNull().default(""),
    filedByUserId: text("filed_by_user_id").references(() => user.id, { onDelete: "set null" }),
    filedByName: text("filed_by_name").notNull(),
    filedAt: timestamp("filed_at", { withTimezone: true }).notNull().defaultNow(),
    createdAt: createdAt(),
  },
  (t) => [
    index("filing_org_idx").on(t.organizationId, t.filedAt),
    index("filing_regulator_idx").on(t.regulatorMemberId, t.filedAt),
    uniqueIndex("filing_assessment_regulator_idx").on(t.assessmentId, t.regulatorMemberId),
  ],
);
