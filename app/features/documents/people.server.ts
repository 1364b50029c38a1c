// Who hears about a document: the organisation's reviewers, its author, the client's members.
import { and, eq, ne } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";

const { member, user, clientMember } = schema;

export async function reviewerAddresses(organizationId: string, exceptUserId: string | null) {
  const rows = await db.select({ email: user.email }).from(member).innerJoin(user, eq(user.id, member.userId)).where(and(eq(member.organizationId, organizationId), eq(member.role, "reviewer"), exceptUserId ? ne(member.userId, exceptUserId) : undefined));
  return rows.map((r) => r.email);
}

export async function userAddress(userId: string | null) {
  if (!userId) return null;
  const [row] = await db.select({ email: user.email }).from(user).where(eq(user.id, userId));
  return row?.email ?? null;
}

/** The client members bound to the site's client. */
export async function clientAddresses(organizationId: string, siteId: string) {
  const rows = await db
    .select({ email: user.email })
    .from(schema.site)
    .innerJoin(clientMember, eq(clientMember.clientId, schema.site.clientId))
    .innerJoin(member, and(eq(member.id, clientMember.memberId), eq(member.organizationId, organizationId), eq(member.role, "client")))
    .innerJoin(user, eq(user.id, member.userId))
    .where(and(eq(schema.site.id, siteId), eq(schema.site.organizationId, organizationId)));
  return rows.map((r) => r.email);
}
