// The public verification of a certificate by its code (issue 9 §6): what a stranger may learn is
// the verdict (valid, superseded with the newer code, withdrawn, expired; anything else is unknown),
// the site's public name and city, the dates, the standard and tier, and the issuer. Nothing else
// (no address, client, results or people but the issuing reviewer) is read into the answer.
// Codes (newCode in commands.server.ts) are 20 characters drawn uniformly from a 32-letter alphabet
// (each from one random byte mod 32, and 256 is a multiple of 32, so unbiased): 20 × 5 = 100 bits.
// At the page's rate limit (verify-limit.server.ts) a guesser would need far more than 10^20 years
// to expect one hit among even a million issued codes.
import { eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { verdict } from "./lifecycle";

export async function verifyCertificate(code: string, now = new Date()) {
  const normalised = code.trim().toUpperCase();
  if (!/^[A-Z0-9-]{4,40}$/.test(normalised)) return null;
  const [row] = await db
    .select({ d: schema.document, organizationName: schema.organization.name, site: schema.assessment.site, standard: schema.assessment.standard, tier: schema.assessment.tier })
    .from(schema.document)
    .innerJoin(schema.organization, eq(schema.organization.id, schema.document.organizationId))
    .innerJoin(schema.assessment, eq(schema.assessment.id, schema.document.assessmentId))
    .where(eq(schema.document.code, normalised));
  if (!row || row.d.kind !== "certificate") return null;
  const state = verdict(row.d, now);
  if (state === "unknown") return null;
  let newerCode: string | null = null;
  if (row.d.supersededById) {
    const [newer] = await db.select({ code: schema.document.code }).from(schema.document).where(eq(schema.document.id, row.d.supersededById));
    newerCode = newer?.code ?? null;
  }
  const site = (row.site as { site: { name: string; city: string } }).site;
  return {
    verdict: state,
    code: row.d.code,
    siteName: site.name,
    city: site.city,
    standard: row.standard,
    tier: row.tier,
    issuedAt: row.d.issuedAt?.toISOString() ?? null,
    expiresAt: row.d.expiresAt?.toISOString() ?? null,
    issuer: `${row.d.reviewerName ?? ""}, ${row.organizationName}`,
    newerCode,
  };
}
