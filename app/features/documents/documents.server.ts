// Reading documents, always through the site's scope (another organisation's, or for a client
// member another client's, is not found). A client member sees issued documents only.
import { and, desc, eq, getTableColumns, inArray, type SQL } from "drizzle-orm";
import { siteScope, type Scope } from "~/features/sites/scope.server";
import { db, schema } from "~/infra/db.server";
import type { DocumentKind, DocumentState } from "~/infra/db/schema/documents";
import { DomainError } from "~/lib/domain-error";

const { document, site } = schema;
export type DocumentRow = typeof document.$inferSelect;

/** Every column but the PDF bytes. */
const { pdf: _pdf, ...columns } = getTableColumns(document);
export type DocumentListRow = Omit<DocumentRow, "pdf">;

function visible(scope: Scope): SQL | undefined {
  return scope.role === "client" ? inArray(document.state, ["issued"]) : undefined;
}

export type DocumentFilter = { siteId?: string; kind?: DocumentKind; state?: DocumentState };

export async function listDocuments(scope: Scope, filter: DocumentFilter = {}): Promise<DocumentListRow[]> {
  const rows = await db
    .select({ d: columns })
    .from(document)
    .innerJoin(site, eq(site.id, document.siteId))
    .where(and(siteScope(scope), visible(scope), filter.siteId ? eq(document.siteId, filter.siteId) : undefined, filter.kind ? eq(document.kind, filter.kind) : undefined, filter.state ? eq(document.state, filter.state) : undefined))
    .orderBy(desc(document.createdAt))
    .limit(500);
  return rows.map((r) => r.d);
}

export async function findDocument(scope: Scope, id: string, siteId?: string): Promise<DocumentListRow | null> {
  const [row] = await db
    .select({ d: columns })
    .from(document)
    .innerJoin(site, eq(site.id, document.siteId))
    .where(and(siteScope(scope), visible(scope), eq(document.id, id), siteId ? eq(document.siteId, siteId) : undefined));
  return row?.d ?? null;
}

export async function requireDocument(scope: Scope, id: string, siteId?: string) {
  const row = await findDocument(scope, id, siteId);
  if (!row) throw new DomainError("No such document.", 404);
  return row;
}

/** The stored PDF of a document in scope, or why there is none yet. */
export async function documentPdf(scope: Scope, id: string) {
  const found = await requireDocument(scope, id);
  const [row] = await db.select({ pdf: document.pdf, sha256: document.sha256 }).from(document).where(eq(document.id, found.id));
  if (!row?.pdf) throw new DomainError(found.renderStatus === "failed" ? "The PDF could not be made; see the document's page." : "The PDF is still being made. Try again in a moment.", 409);
  return { doc: found, pdf: row.pdf, sha256: row.sha256! };
}

export const pdfFileName = (doc: Pick<DocumentRow, "kind" | "version" | "code">) => `isotrope-${doc.kind}-v${doc.version}-${doc.code}.pdf`;
