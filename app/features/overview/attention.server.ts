// The overview's attention list (issue 9 §7): what waits for the signed-in member's role, each
// item linking to its record. One prepared query per role, the first ATTENTION_LIMIT items and
// the total in the same round trip (a window count):
//   reviewer         documents in review that someone else wrote (the two-person rule: those they may issue)
//   engineer         sites whose inventory changed after the inventory of their latest issued document was frozen
//   owner, billing   issued certificates expiring within 60 days (or already expired and not reissued)
//   regulator        filings addressed to this regulator member in the last 30 days, newest first
import { and, asc, desc, eq, inArray, isNotNull, isNull, lt, ne, or, sql } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import type { Role } from "~/lib/roles";
import { attentionItem, type AttentionList, type AttentionRow } from "./attention";

const { document, site, assessment, auditEvent, filing, member } = schema;

export const ATTENTION_LIMIT = 10;
/** The audit entities that are a site's inventory (what an assessment freezes). */
export const inventoryEntities = ["site", "surface", "obstruction", "access-point", "backdrop", "emitter"] as const;

const organizationId = sql.placeholder("organizationId");
const total = sql<number>`(count(*) over ())::int`;

const inReview = db
  .select({ id: document.id, siteId: document.siteId, siteName: site.name, kind: document.kind, version: document.version, who: document.authorName, at: document.submittedAt, total })
  .from(document)
  .innerJoin(site, eq(site.id, document.siteId))
  .where(
    and(
      eq(document.organizationId, organizationId),
      eq(document.state, "in_review"),
      or(isNull(document.authorUserId), ne(document.authorUserId, sql.placeholder("userId"))),
    ),
  )
  .orderBy(asc(document.submittedAt), asc(document.id))
  .limit(ATTENTION_LIMIT)
  .prepare("attention_reviewer");

/** Each site's latest issued document and when the inventory it describes was frozen. */
const latestIssued = db
  .selectDistinctOn([document.siteId], {
    siteId: document.siteId,
    documentId: sql<string>`${document.id}`.as("document_id"),
    kind: sql<string>`${document.kind}`.as("document_kind"),
    version: sql<number>`${document.version}`.as("document_version"),
    frozenAt: sql<string>`${assessment.createdAt}`.as("frozen_at"),
  })
  .from(document)
  .innerJoin(assessment, eq(assessment.id, document.assessmentId))
  .where(and(eq(document.organizationId, organizationId), eq(document.state, "issued")))
  .orderBy(document.siteId, desc(assessment.createdAt), desc(document.issuedAt))
  .as("latest_issued");

const changedAt = sql<string | null>`(select max(${auditEvent.createdAt}) from ${auditEvent} where ${auditEvent.siteId} = ${latestIssued.siteId} and ${inArray(auditEvent.subjectType, [...inventoryEntities])} and ${auditEvent.createdAt} > ${latestIssued.frozenAt})`;

const changedSites = db
  .select({ id: latestIssued.documentId, siteId: site.id, siteName: site.name, kind: latestIssued.kind, version: latestIssued.version, at: sql<string | null>`${changedAt}`.as("changed_at"), total })
  .from(latestIssued)
  .innerJoin(site, eq(site.id, latestIssued.siteId))
  .where(isNotNull(changedAt))
  .orderBy(sql`changed_at desc`, asc(site.id))
  .limit(ATTENTION_LIMIT)
  .prepare("attention_engineer");

const expiring = db
  .select({ id: document.id, siteId: document.siteId, siteName: site.name, kind: document.kind, version: document.version, at: document.expiresAt, total })
  .from(document)
  .innerJoin(site, eq(site.id, document.siteId))
  .where(
    and(
      eq(document.organizationId, organizationId),
      eq(document.kind, "certificate"),
      eq(document.state, "issued"),
      isNotNull(document.expiresAt),
      lt(document.expiresAt, sql`now() + interval '60 days'`),
    ),
  )
  .orderBy(asc(document.expiresAt), asc(document.id))
  .limit(ATTENTION_LIMIT)
  .prepare("attention_certificates");

/** Filings sent to the signed-in regulator member (its inbox), received in the last 30 days. */
const received = db
  .select({ id: filing.id, siteId: filing.siteId, siteName: site.name, kind: sql<string>`'report'`, version: document.version, at: filing.filedAt, who: filing.authority, total })
  .from(filing)
  .innerJoin(member, eq(member.id, filing.regulatorMemberId))
  .innerJoin(site, eq(site.id, filing.siteId))
  .innerJoin(document, eq(document.id, filing.documentId))
  .where(
    and(
      eq(filing.organizationId, organizationId),
      eq(member.userId, sql.placeholder("userId")),
      sql`${filing.filedAt} > now() - interval '30 days'`,
    ),
  )
  .orderBy(desc(filing.filedAt), asc(filing.id))
  .limit(ATTENTION_LIMIT)
  .prepare("attention_regulator");

type Reason = AttentionRow["reason"];
const queries: Partial<Record<Role, { reason: Reason; run: (member: { organizationId: string; userId: string }) => Promise<(Omit<AttentionRow, "reason"> & { total: number })[]> }>> = {
  reviewer: { reason: "review", run: (m) => inReview.execute({ organizationId: m.organizationId, userId: m.userId }) as never },
  engineer: { reason: "inventory-changed", run: (m) => changedSites.execute({ organizationId: m.organizationId }) as never },
  owner: { reason: "certificate-expiring", run: (m) => expiring.execute({ organizationId: m.organizationId }) as never },
  billing: { reason: "certificate-expiring", run: (m) => expiring.execute({ organizationId: m.organizationId }) as never },
  regulator: { reason: "filing-received", run: (m) => received.execute({ organizationId: m.organizationId, userId: m.userId }) as never },
};

/** The attention list of a member's role, or null for a role that has none (the client, whose home is /portal). */
export async function attentionFor(role: Role, member: { organizationId: string; userId: string }, now = new Date()): Promise<AttentionList | null> {
  const query = queries[role];
  if (!query) return null;
  const rows = await query.run(member);
  return { reason: query.reason, total: rows[0]?.total ?? 0, items: rows.map(({ total: _total, ...row }) => attentionItem({ ...row, reason: query.reason }, now)) };
}
