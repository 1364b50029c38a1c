// Sites: list, read, create, update (optimistic concurrency), delete. Each write is one
// transaction with its audit row.
import { and, asc, desc, eq, ilike, or, sql } from "drizzle-orm";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { likePattern, type Paging } from "~/lib/paging";
import { oncePerRequest } from "~/lib/request-memo.server";
import { changedFields, snapshot } from "~/lib/snapshot";
import type { SiteKind } from "./kinds";
import type { SiteInput, SitePatch } from "./schemas";
import { clientScope, siteScope, type Scope } from "./scope.server";

const { site, client } = schema;

export const siteSortKeys = ["name", "kind", "city", "client", "emitters", "updated"] as const;
export type SiteSort = (typeof siteSortKeys)[number];
export type SiteFilter = Paging & { kind?: SiteKind | null; clientId?: string | null; sort: SiteSort; dir: "asc" | "desc" };

const sortColumns = {
  name: site.name,
  kind: site.kind,
  city: site.city,
  client: client.name,
  emitters: site.emitterCount,
  updated: site.updatedAt,
} as const;

type ListShape = { q: boolean; kind: boolean; clientId: boolean; scopeClient: boolean; sort: SiteSort; dir: "asc" | "desc" };
type ListStatements = { page: ReturnType<typeof pageStatement>; count: ReturnType<typeof countStatement> };
const placeholder = (name: string) => sql.placeholder(name);

function listWhere(shape: ListShape) {
  const q = placeholder("q");
  return and(
    eq(site.organizationId, placeholder("organizationId")),
    shape.scopeClient ? eq(site.clientId, placeholder("scopeClientId")) : undefined,
    shape.q ? or(ilike(site.name, q), ilike(site.city, q), ilike(site.address, q)) : undefined,
    shape.kind ? eq(site.kind, placeholder("kind")) : undefined,
    shape.clientId ? eq(site.clientId, placeholder("clientId")) : undefined,
  );
}

function pageStatement(shape: ListShape, name: string) {
  // Ties go in the sort's own direction, so one (organization_id, column, id) index serves both
  // directions (read backwards for desc): emitter counts tie on most sites.
  const by = shape.dir === "desc" ? desc : asc;
  return db
    .select({
      id: site.id,
      name: site.name,
      kind: site.kind,
      city: site.city,
      clientId: site.clientId,
      clientName: client.name,
      emitterCount: site.emitterCount,
      updatedAt: site.updatedAt,
      // The total as an uncorrelated subquery, counted once (an InitPlan) by the organisation's
      // indexes like the count statement, in the same round trip; a page past the end has no row
      // to carry it, and then the count statement is asked.
      total: sql<number>`(select count(*)::int from ${site} where ${listWhere(shape)})`,
    })
    .from(site)
    .leftJoin(client, eq(client.id, site.clientId))
    .where(listWhere(shape))
    .orderBy(by(sortColumns[shape.sort]), by(site.id))
    .limit(placeholder("limit"))
    .offset(placeholder("offset"))
    .prepare(name);
}

function countStatement(shape: ListShape, name: string) {
  return db.select({ n: sql<number>`count(*)::int` }).from(site).where(listWhere(shape)).prepare(name);
}

/** Prepared statements per shape of the list (which filters, which sort): at most a few dozen, each planned once per connection. */
const statements = new Map<string, ListStatements>();
function statementsFor(shape: ListShape): ListStatements {
  const key = `${shape.q ? "q" : ""}${shape.kind ? "k" : ""}${shape.clientId ? "c" : ""}${shape.scopeClient ? "s" : ""}_${shape.sort}_${shape.dir}`;
  let found = statements.get(key);
  if (!found) {
    found = { page: pageStatement(shape, `sites_page_${key}`), count: countStatement(shape, `sites_count_${key}`) };
    statements.set(key, found);
  }
  return found;
}

/**
 * One page of sites with the total. Emitter counts are the site's own column, kept by a trigger on
 * the emitter table (migration 0005), so sorting by them is an index scan like the others.
 */
export async function listSites(scope: Scope, filter: SiteFilter) {
  const scopeClient = scope.role === "client";
  if (scopeClient && !scope.clientId) return { sites: [], total: 0 };
  const shape: ListShape = { q: Boolean(filter.q), kind: Boolean(filter.kind), clientId: Boolean(filter.clientId), scopeClient, sort: filter.sort, dir: filter.dir };
  const { page, count } = statementsFor(shape);
  const values = {
    organizationId: scope.organizationId,
    ...(scopeClient ? { scopeClientId: scope.clientId } : {}),
    ...(filter.q ? { q: likePattern(filter.q) } : {}),
    ...(filter.kind ? { kind: filter.kind } : {}),
    ...(filter.clientId ? { clientId: filter.clientId } : {}),
  };
  const offset = (filter.page - 1) * filter.pageSize;
  // The page with the total in one statement (a window count over the page would read every
  // matching row first; the subquery counts by the organisation's indexes, as the count statement does).
  const rows = await page.execute({ ...values, limit: filter.pageSize, offset });
  if (rows.length === 0) {
    const [counted] = offset > 0 ? await count.execute(values) : [{ n: 0 }];
    return { sites: [], total: counted?.n ?? 0 };
  }
  return { sites: rows.map(({ total: _total, ...row }) => row), total: rows[0].total };
}

/** A site of an organisation by id, prepared once (every site page asks it). */
const siteById = db
  .select({ site, clientName: client.name })
  .from(site)
  .leftJoin(client, eq(client.id, site.clientId))
  .where(and(eq(site.organizationId, placeholder("organizationId")), eq(site.id, placeholder("siteId"))))
  .prepare("site_by_id");

/** One site within the scope, or null (another organisation's site is simply not found). */
export async function findSite(scope: Scope, siteId: string) {
  const [row] =
    scope.role === "client"
      ? await db.select({ site, clientName: client.name }).from(site).leftJoin(client, eq(client.id, site.clientId)).where(and(siteScope(scope), eq(site.id, siteId)))
      : await siteById.execute({ organizationId: scope.organizationId, siteId });
  return row ? { ...row.site, clientName: row.clientName } : null;
}

/**
 * findSite, asked once per request: a site page's parent loader (routes/sites/site.tsx) and its
 * section's loader share one query. For loaders only (see lib/request-memo.server.ts).
 */
export function findSiteForRequest(args: { request: Request; context?: unknown }, scope: Scope, siteId: string) {
  return oncePerRequest(args, `site:${scope.organizationId}:${scope.role}:${scope.clientId ?? ""}:${siteId}`, () => findSite(scope, siteId));
}

export async function requireSite(scope: Scope, siteId: string) {
  const found = await findSite(scope, siteId);
  if (!found) throw new DomainError("No such site.", 404);
  return found;
}

async function checkClient(tx: Tx, scope: Scope, clientId: string | null | undefined) {
  if (!clientId) return;
  const [row] = await tx.select({ id: client.id }).from(client).where(and(clientScope(scope), eq(client.id, clientId)));
  if (!row) throw new DomainError("No such client in your organisation.", 400, "clientId");
}

export async function createSite(actor: Actor & Scope, input: SiteInput) {
  return db.transaction(async (tx) => {
    await checkClient(tx, actor, input.clientId);
    const [row] = await tx.insert(site).values({ ...input, organizationId: actor.organizationId }).returning();
    await auditChange(tx, actor, { action: "site.created", entity: "site", entityId: row.id, siteId: row.id, before: null, after: snapshot(row) });
    return row;
  });
}

/** Locks the site row for the rest of the transaction (inventory edits serialise on it). */
export async function lockSite(tx: Tx, scope: Scope, siteId: string) {
  const [row] = await tx.select().from(site).where(and(siteScope(scope), eq(site.id, siteId))).for("update");
  if (!row) throw new DomainError("No such site.", 404);
  return row;
}

/** Marks the site's inventory as changed (surfaces, emitters): its updatedAt moves on. */
export async function touchSite(tx: Tx, siteId: string) {
  await tx.update(site).set({ updatedAt: new Date() }).where(eq(site.id, siteId));
}

export async function updateSite(actor: Actor & Scope, siteId: string, patch: SitePatch) {
  return db.transaction(async (tx) => {
    const current = await lockSite(tx, actor, siteId);
    if (current.version !== patch.version) throw staleEdit(snapshotWithVersion(current));
    const { version: _v, ...fields } = patch;
    if (fields.clientId !== undefined) await checkClient(tx, actor, fields.clientId);
    const [row] = await tx
      .update(site)
      .set({ ...fields, version: current.version + 1, updatedAt: new Date() })
      .where(eq(site.id, siteId))
      .returning();
    const diff = changedFields(snapshot(current), snapshot(row));
    if (diff.keys.length) {
      await auditChange(tx, actor, { action: "site.updated", entity: "site", entityId: siteId, siteId, before: diff.before, after: diff.after });
    }
    return row;
  });
}

export async function deleteSite(actor: Actor & Scope, siteId: string) {
  await db.transaction(async (tx) => {
    const current = await lockSite(tx, actor, siteId);
    await tx.delete(site).where(eq(site.id, siteId));
    await auditChange(tx, actor, { action: "site.deleted", entity: "site", entityId: siteId, siteId, before: snapshot(current), after: null });
  });
}

function snapshotWithVersion(row: typeof site.$inferSelect) {
  return { ...snapshot(row), version: row.version };
}
