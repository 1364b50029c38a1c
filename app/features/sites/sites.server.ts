// Sites: list, read, create, update (optimistic concurrency), delete. Each write is one
// transaction with its audit row.
import { and, asc, desc, eq, ilike, or, sql } from "drizzle-orm";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { likePattern, type Paging } from "~/lib/paging";
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

/**
 * One page of sites with the total. Emitter counts are the site's own column, kept by a trigger on
 * the emitter table (migration 0005), so sorting by them is an index scan like the others.
 */
export async function listSites(scope: Scope, filter: SiteFilter) {
  const where = and(
    siteScope(scope),
    filter.q ? or(ilike(site.name, likePattern(filter.q)), ilike(site.city, likePattern(filter.q)), ilike(site.address, likePattern(filter.q))) : undefined,
    filter.kind ? eq(site.kind, filter.kind) : undefined,
    filter.clientId ? eq(site.clientId, filter.clientId) : undefined,
  );
  const order = filter.dir === "desc" ? desc(sortColumns[filter.sort]) : asc(sortColumns[filter.sort]);
  // The page and the count as two queries at once: each can use the organisation's indexes,
  // where a window count over the page would read every matching row first.
  const [rows, total] = await Promise.all([
    db
      .select({
        id: site.id,
        name: site.name,
        kind: site.kind,
        city: site.city,
        clientId: site.clientId,
        clientName: client.name,
        emitterCount: site.emitterCount,
        updatedAt: site.updatedAt,
      })
      .from(site)
      .leftJoin(client, eq(client.id, site.clientId))
      .where(where)
      .orderBy(order, asc(site.id))
      .limit(filter.pageSize)
      .offset((filter.page - 1) * filter.pageSize),
    countSites(where),
  ]);
  return { sites: rows, total };
}

async function countSites(where: ReturnType<typeof and>) {
  const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(site).where(where);
  return row?.n ?? 0;
}

/** One site within the scope, or null (another organisation's site is simply not found). */
export async function findSite(scope: Scope, siteId: string) {
  const [row] = await db
    .select({ site, clientName: client.name })
    .from(site)
    .leftJoin(client, eq(client.id, site.clientId))
    .where(and(siteScope(scope), eq(site.id, siteId)));
  return row ? { ...row.site, clientName: row.clientName } : null;
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
