// Documents made from a frozen assessment: report, landlord letter, certificate. Each walks
// draft → in_review → issued → superseded | withdrawn (app/features/documents/lifecycle.ts); a
// reissue is a new row (version n+1) pointing at the one it replaces. The PDF is rendered by a
// background job (render_* columns show how that went); once a document is issued its bytes and
// their SHA-256 are stored and a trigger (migration "documents_frozen") refuses to change them.
import { customType, index, integer, pgTable, text, timestamp, uniqueIndex, type AnyPgColumn } from "drizzle-orm/pg-core";
import { assessment } from "./assessments";
import { organization, user } from "./auth";
import { createdAt, id, updatedAt } from "./columns";
import { site } from "./sites";

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => "bytea" });

export const documentKinds = ["report", "letter", "certificate"] as const;
export type DocumentKind = (typeof documentKinds)[number];
export const documentStates = ["draft", "in_review", "issued", "superseded", "withdrawn"] as const;
export type DocumentState = (typeof documentStates)[number];
export const renderStates = ["queued", "rendering", "ready", "failed"] as const;
export type RenderState = (typeof renderStates)[number];

export const document = pgTable(
  "document",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    siteId: text("site_id").notNull().references(() => site.id, { onDelete: "cascade" }),
    assessmentId: text("assessment_id").notNull().references(() => assessment.id, { onDelete: "cascade" }),
    kind: text("kind").$type<DocumentKind>().notNull(),
    state: text("state").$type<DocumentState>().notNull().default("draft"),
    /** 1 for the first of a series; a reissue is previous.version + 1. */
    version: integer("version").notNull().default(1),
    /** The document this one replaces (a reissue), if any. */
    previousId: text("previous_id").references((): AnyPgColumn => document.id, { onDelete: "set null" }),
    authorUserId: text("author_user_id").references(() => user.id, { onDelete: "set null" }),
    authorName: text("author_name").notNull(),
    reviewerUserId: text("reviewer_user_id").references(() => user.id, { onDelete: "set null" }),
    reviewerName: text("reviewer_name"),
    /** Verification code (certificates; reports and letters carry one too, for their footer). Unguessable. */
    code: text("code").notNull(),
    renderStatus: text("render_status").$type<RenderState>().notNull().default("queued"),
    renderAttempts: integer("render_attempts").notNull().default(0),
    renderError: text("render_error"),
    renderedAt: timestamp("rendered_at", { withTimezone: true }),
    pdf: bytea("pdf"),
    sha256: text("sha256"),
    byteSize: integer("byte_size"),
    submittedAt: timestamp("submitted_at", { withTimezone: true }),
    issuedAt: timestamp("issued_at", { withTimezone: true }),
    /** Certificates: the date after which the verification page says "expired". */
    expiresAt: timestamp("expires_at", { withTimezone: true }),
    supersededAt: timestamp("superseded_at", { withTimezone: true }),
    supersededById: text("superseded_by_id"),
    withdrawnAt: timestamp("withdrawn_at", { withTimezone: true }),
    withdrawnReason: text("withdrawn_reason"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("document_site_idx").on(t.siteId, t.createdAt),
    index("document_org_idx").on(t.organizationId, t.state),
    uniqueIndex("document_code_idx").on(t.code),
  ],
);
