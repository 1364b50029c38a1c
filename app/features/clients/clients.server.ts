// Clients (landlords, property companies) and their contacts. Each write is one transaction
// with its audit row; contacts are replaced as a list with their client.
import { and, asc, desc, eq, ilike, inArray, sql } from "drizzle-orm";
import { clientScope, type Scope } from "~/features/sites/scope.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError, staleEdit } from "~/lib/domain-error";
import { likePattern, type Paging } from "~/lib/paging";
import { changedFields, snapshot } from "~/lib/snapshot";
import type { ClientInput, ClientPatch, ContactInput } from "./schemas";

const { client, clientContact, site } = schema;

export const clientSortKeys = ["name", "sites", "updated"] as const;
export type ClientSort = (typeof clientSortKeys)[number];

const siteCount = sql<number>`(select count(*)::int from ${site} where ${site.clientId} = ${client.id})`;
const sortColumns = { name: client.name, sites: siteCount, updated: client.updatedAt } as const;

export async function listClients(scope: Scope, filter: Paging & { sort: ClientSort; dir: "asc" | "desc" }) {
  const where = and(clientScope(scope), filter.q ? ilike(client.name, likePattern(filter.q)) : undefined);
  const rows = await db
    .select({
      id: client.id,
      name: client.name,
      siteCount,
      contactCount: sql<number>`(select count(*)::int from ${clientContact} where ${clientContact.clientId} = ${client.id})`,
      updatedAt: client.updatedAt,
      total: sql<number>`count(*) over ()::int`,
    })
    .from(client)
    .where(where)
    .orderBy(filter.dir === "desc" ? desc(sortColumns[filter.sort]) : asc(sortColumns[filter.sort]), asc(client.id))
    .limit(filter.pageSize)
    .offset((filter.page - 1) * filter.pageSize);
  let total = rows[0]?.total ?? 0;
  if (!rows.length && filter.page > 1) {
    const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(client).where(where);
    total = row?.n ?? 0;
  }
  return { clients: rows.map(({ total: _t, ...r }) => r), total };
}

/** Names for pickers (site form, filters). */
export async function clientOptions(scope: Scope) {
  return db.select({ id: client.id, name: client.name }).from(client).where(clientScope(scope)).orderBy(asc(client.name)).limit(1000);
}

export async function findClient(scope: Scope, clientId: string) {
  const [row] = await db.select().from(client).where(and(clientScope(scope), eq(client.id, clientId)));
  if (!row) return null;
  const contacts = await db.select().from(clientContact).where(eq(clientContact.clientId, clientId)).orderBy(asc(clientContact.createdAt), asc(clientContact.name));
  return { ...row, contacts };
}

export async function requireClient(scope: Scope, clientId: string) {
  const found = await findClient(scope, clientId);
  if (!found) throw new DomainError("No such client.", 404);
  return found;
}

const contactFields = (c: typeof clientContact.$inferSelect) => ({ id: c.id, name: c.name, email: c.email, phone: c.phone, role: c.role });

/** Replaces the client's contacts: ids kept are updated, new ones inserted, missing ones deleted. */
async function replaceContacts(tx: Tx, organizationId: string, clientId: string, contacts: ContactInput[]) {
  const existing = await tx.select().from(clientContact).where(eq(clientContact.clientId, clientId));
  const known = new Set(existing.map((c) => c.id));
  const keep = new Set(contacts.flatMap((c) => (c.id && known.has(c.id) ? [c.id] : [])));
  const gone = existing.filter((c) => !keep.has(c.id)).map((c) => c.id);
  if (gone.length) await tx.delete(clientContact).where(inArray(clientContact.id, gone));
  for (const c of contacts) {
    const values = { name: c.name, email: c.email, phone: c.phone, role: c.role };
    if (c.id && keep.has(c.id)) await tx.update(clientContact).set(values).where(eq(clientContact.id, c.id));
    else await tx.insert(clientContact).values({ ...values, organizationId, clientId });
  }
  const after = await tx.select().from(clientContact).where(eq(clientContact.clientId, clientId)).orderBy(asc(clientContact.createdAt));
  return { before: existing.map(contactFields), after: after.map(contactFields) };
}

export async function createClient(actor: Actor & Scope, input: ClientInput) {
  return db.transaction(async (tx) => {
    const { contacts, ...fields } = input;
    const [row] = await tx.insert(client).values({ ...fields, organizationId: actor.organizationId }).returning();
    const saved = await replaceContacts(tx, actor.organizationId, row.id, contacts);
    await auditChange(tx, actor, { action: "client.created", entity: "client", entityId: row.id, before: null, after: { ...snapshot(row), contacts: saved.after } });
    return row;
  });
}

export async function updateClient(actor: Actor & Scope, clientId: string, patch: ClientPatch) {
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(client).where(and(clientScope(actor), eq(client.id, clientId))).for("update");
    if (!current) throw new DomainError("No such client.", 404);
    if (current.version !== patch.version) throw staleEdit({ ...snapshot(current), version: current.version });
    const { version: _v, contacts, ...fields } = patch;
    const [row] = await tx.update(client).set({ ...fields, version: current.version + 1, updatedAt: new Date() }).where(eq(client.id, clientId)).returning();
    const before: Record<string, unknown> = snapshot(current);
    const after: Record<string, unknown> = snapshot(row);
    if (contacts) {
      const saved = await replaceContacts(tx, actor.organizationId, clientId, contacts);
      before.contacts = saved.before;
      after.contacts = saved.after;
    }
    const diff = changedFields(before, after);
    if (diff.keys.length) await auditChange(tx, actor, { action: "client.updated", entity: "client", entityId: clientId, before: diff.before, after: diff.after });
    return row;
  });
}

export async function deleteClient(actor: Actor & Scope, clientId: string) {
  await db.transaction(async (tx) => {
    const [current] = await tx.select().from(client).where(and(clientScope(actor), eq(client.id, clientId))).for("update");
    if (!current) throw new DomainError("No such client.", 404);
    const [sites] = await tx.select({ n: sql<number>`count(*)::int` }).from(site).where(eq(site.clientId, clientId));
    if (sites.n > 0) throw new DomainError(`This client has ${sites.n} site${sites.n === 1 ? "" : "s"}. Move or delete them first.`, 409);
    await tx.delete(client).where(eq(client.id, clientId));
    await auditChange(tx, actor, { action: "client.deleted", entity: "client", entityId: clientId, before: snapshot(current), after: null });
  });
}
