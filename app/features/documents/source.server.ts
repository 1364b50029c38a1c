// Loads what a document's PDF is drawn from: the document, its frozen assessment, the
// organisation's name and the site's readings (for the comparison with predictions).
import { and, asc, eq, lte } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import type { DocumentSource, SourceAssessment } from "./pdf/source";

type DocumentRow = typeof schema.document.$inferSelect;

export const verifyUrl = (code: string) => `${env.APP_URL.replace(/\/$/, "")}/verify/${code}`;

export async function loadSource(doc: DocumentRow): Promise<DocumentSource> {
  const [row] = await db.select().from(schema.assessment).where(eq(schema.assessment.id, doc.assessmentId));
  const [org] = await db.select({ name: schema.organization.name }).from(schema.organization).where(eq(schema.organization.id, doc.organizationId));
  const readings = await db
    .select({ r: schema.reading, visitedOn: schema.visit.visitedOn })
    .from(schema.reading)
    .innerJoin(schema.visit, eq(schema.visit.id, schema.reading.visitId))
    .where(and(eq(schema.visit.siteId, doc.siteId), lte(schema.reading.createdAt, row.createdAt)))
    .orderBy(asc(schema.visit.visitedOn), asc(schema.reading.position))
    .limit(500);
  return {
    kind: doc.kind,
    version: doc.version,
    code: doc.code,
    draft: doc.state === "draft" || doc.state === "in_review",
    organizationName: org?.name ?? "",
    authorName: doc.authorName,
    reviewerName: doc.reviewerName,
    createdAt: doc.createdAt,
    issuedAt: doc.issuedAt,
    expiresAt: doc.expiresAt,
    verifyUrl: verifyUrl(doc.code),
    assessment: row as unknown as SourceAssessment,
    readings: readings.map(({ r, visitedOn }) => ({ id: r.id, visitId: r.visitId, label: r.label || "—", surfaceId: r.surfaceId, x: r.x, y: r.y, heightM: r.heightM, value: r.value, unit: r.unit, powerDensityWm2: r.powerDensityWm2, percentStandard: r.percentStandard, percentTier: r.percentTier, frequencyMHz: r.frequencyMHz, visitedOn: String(visitedOn) })),
  };
}
