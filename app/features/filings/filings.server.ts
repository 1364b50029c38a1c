// Filings: who reads which (a regulator member only those addressed to it; the consultancy's
// owner, engineers and reviewers their organisation's), what may be filed (assessments whose
// report is issued), and the filing itself (one transaction with its audit row).
import { and, desc, eq, gte, inArray, lt, type SQL } from "drizzle-orm";
import { queueMails } from "~/features/documents/jobs.server";
import { db, schema } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import { auditChange } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import type { Role } from "~/lib/roles";
import { authorityFromName } from "./authority";
import { filingMail } from "./mail";
import type { FilingFilter } from "./schemas";

const { filing, site, assessment, document, member, user } = schema;

/** Who may read filings: the regulator reads its inbox; these read the organisation's. */
export const filingStaff = ["owner", "engineer", "reviewer"] as const satisfies readonly Role[];
/** Who may file. */
export const filers = ["engineer", "reviewer"] as const satisfies readonly Role[];
export const filingReaders = [...filingStaff, "regulator"] as const satisfies readonly Role[];

export type FilingReader = { organizationId: string; role: Role; memberId: string };

function readable(reader: FilingReader): SQL {
  return reader.role === "regulator"
    ? and(eq(filing.organizationId, reader.organizationId), eq(filing.regulatorMemberId, reader.memberId))!
    : eq(filing.organizationId, reader.organizationId);
}

function filtered(f: FilingFilter): (SQL | undefined)[] {
  return [
    f.siteId ? eq(filing.siteId, f.siteId) : undefined,
    f.authority ? eq(filing.authority, f.authority) : undefined,
    f.from ? gte(filing.filedAt, new Date(`${f.from}T00:00:00Z`)) : undefined,
    // "to" is a whole day, inclusive.
    f.to ? lt(filing.filedAt, new Date(Date.parse(`${f.to}T00:00:00Z`) + 86_400_000)) : undefined,
  ];
}

const listColumns = {
  id: filing.id,
  siteId: filing.siteId,
  assessmentId: filing.assessmentId,
  documentId: filing.documentId,
  authority: filing.authority,
  note: filing.note,
  filedAt: filing.filedAt,
  filedByName: filing.filedByName,
  regulatorMemberId: filing.regulatorMemberId,
  siteName: site.name,
  city: site.city,
  assessmentName: assessment.name,
  standard: assessment.standard,
  tier: assessment.tier,
};

export async function listFilings(reader: FilingReader, f: FilingFilter = {}) {
  return db
    .select(listColumns)
    .from(filing)
    .innerJoin(site, eq(site.id, filing.siteId))
    .innerJoin(assessment, eq(assessment.id, filing.assessmentId))
    .where(and(readable(reader), ...filtered(f)))
    .orderBy(desc(filing.filedAt))
    .limit(500);
}

/** The choices of the inbox's filters: the sites and authorities among the filings this reader sees. */
export async function filterChoices(reader: FilingReader) {
  const rows = await db.selectDistinct({ siteId: filing.siteId, siteName: site.name, authority: filing.authority }).from(filing).innerJoin(site, eq(site.id, filing.siteId)).where(readable(reader));
  const sites = [...new Map(rows.map((r) => [r.siteId, r.siteName])).entries()].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name));
  const authorities = [...new Set(rows.map((r) => r.authority))].sort((a, b) => a.localeCompare(b));
  return { sites, authorities };
}

export async function requireFiling(reader: FilingReader, id: string) {
  const [row] = await db.select().from(filing).where(and(readable(reader), eq(filing.id, id)));
  if (!row) throw new DomainError("No such filing.", 404);
  return row;
}

/** Assessments that may be filed: those with an issued report (the newest one goes with the filing). */
export async function fileableAssessments(organizationId: string) {
  const rows = await db
    .select({ id: assessment.id, name: assessment.name, createdAt: assessment.createdAt, siteName: site.name, documentId: document.id, version: document.version, issuedAt: document.issuedAt })
    .from(document)
    .innerJoin(assessment, eq(assessment.id, document.assessmentId))
    .innerJoin(site, eq(site.id, document.siteId))
    .where(and(eq(document.organizationId, organizationId), eq(document.kind, "report"), eq(document.state, "issued")))
    .orderBy(desc(document.issuedAt));
  return [...new Map(rows.map((r) => [r.id, r])).values()];
}

/** The organisation's regulator members, with the authority their name suggests. */
export async function regulators(organizationId: string) {
  const rows = await db
    .select({ memberId: member.id, name: user.name, email: user.email })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(and(eq(member.organizationId, organizationId), eq(member.role, "regulator")))
    .orderBy(user.name);
  return rows.map((r) => ({ ...r, authority: authorityFromName(r.name) }));
}

export type Filer = { organizationId: string; userId: string; role: Role; name: string };

export async function fileAssessment(who: Filer, input: { assessmentId: string; regulatorMemberId: string; authority: string; note: string }) {
  if (!(filers as readonly Role[]).includes(who.role)) throw new DomainError("Only an engineer or a reviewing engineer files assessments.", 403);
  const filed = await db.transaction(async (tx) => {
    const [a] = await tx
      .select({ id: assessment.id, siteId: assessment.siteId, name: assessment.name, siteName: site.name, organizationName: schema.organization.name })
      .from(assessment)
      .innerJoin(site, eq(site.id, assessment.siteId))
      .innerJoin(schema.organization, eq(schema.organization.id, assessment.organizationId))
      .where(and(eq(assessment.id, input.assessmentId), eq(assessment.organizationId, who.organizationId)));
    if (!a) throw new DomainError("No such assessment in your organisation.", 404, "assessmentId");
    const [report] = await tx
      .select({ id: document.id })
      .from(document)
      .where(and(eq(document.assessmentId, a.id), eq(document.kind, "report"), inArray(document.state, ["issued"])))
      .orderBy(desc(document.issuedAt))
      .limit(1);
    if (!report) throw new DomainError("Only an assessment whose report is issued can be filed.", 409, "assessmentId");
    const [reg] = await tx
      .select({ id: member.id, name: user.name, email: user.email })
      .from(member)
      .innerJoin(user, eq(user.id, member.userId))
      .where(and(eq(member.id, input.regulatorMemberId), eq(member.organizationId, who.organizationId), eq(member.role, "regulator")));
    if (!reg) throw new DomainError("Choose one of your organisation's regulator accounts.", 404, "regulatorMemberId");
    const [already] = await tx.select({ id: filing.id }).from(filing).where(and(eq(filing.assessmentId, a.id), eq(filing.regulatorMemberId, reg.id)));
    if (already) throw new DomainError("This assessment is already filed to that regulator.", 409, "assessmentId");
    const authority = input.authority || authorityFromName(reg.name);
    const [row] = await tx
      .insert(filing)
      .values({ organizationId: who.organizationId, siteId: a.siteId, assessmentId: a.id, documentId: report.id, regulatorMemberId: reg.id, authority, note: input.note, filedByUserId: who.userId, filedByName: who.name })
      .returning();
    await auditChange(tx, who, { action: "filing.created", entity: "filing", entityId: row.id, siteId: a.siteId, before: null, after: { assessmentId: a.id, documentId: report.id, regulatorMemberId: reg.id, authority, note: input.note } });
    return { row, mail: filingMail(reg.email, { siteName: a.siteName, assessmentName: a.name, authority, filerName: who.name, organizationName: a.organizationName, url: `${env.APP_URL.replace(/\/$/, "")}/filings` }) };
  });
  // After the commit, like the documents' mails: the regulator hears of it by e-mail (the mail queue retries).
  await queueMails([filed.mail]);
  return filed.row;
}
