// Members of an organisation: list, count, change role, remove. Every write in one transaction with its audit event.
import { and, asc, eq, sql, type Placeholder, type SQL } from "drizzle-orm";
import { db, schema, type Tx } from "~/infra/db.server";
import { audit, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import type { Role } from "~/lib/roles";

const { member, invitation, user } = schema;

export async function listMembers(organizationId: string) {
  return db
    .select({ id: member.id, role: member.role, joinedAt: member.createdAt, userId: user.id, name: user.name, email: user.email, clientName: schema.client.name })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .leftJoin(schema.clientMember, eq(schema.clientMember.memberId, member.id))
    .leftJoin(schema.client, eq(schema.client.id, schema.clientMember.clientId))
    .where(eq(member.organizationId, organizationId))
    .orderBy(asc(user.name));
}

/**
 * Member and waiting-invitation counts as select columns, for a statement over one organisation
 * row whose id is the given parameter: the overview asks them with other counts in one round trip
 * (features/overview/counts.server.ts).
 */
export function teamCountColumns(organizationId: SQL | Placeholder) {
  return {
    members: sql<number>`(select count(*)::int from ${member} where ${member.organizationId} = ${organizationId})`,
    pending: sql<number>`(select count(*)::int from ${invitation} where ${invitation.organizationId} = ${organizationId} and ${invitation.status} = 'pending' and ${invitation.expiresAt} > now())`,
  };
}

/** Member and waiting-invitation counts for the owner's overview: one round trip, built once. */
const teamCountsQuery = db.select(teamCountColumns(sql.placeholder("organizationId"))).from(schema.organization).where(eq(schema.organization.id, sql.placeholder("organizationId"))).prepare("team_counts");

export async function teamCounts(organizationId: string) {
  const [row] = await teamCountsQuery.execute({ organizationId });
  return { members: row?.members ?? 0, pending: row?.pending ?? 0 };
}

async function ownerCount(tx: Tx, organizationId: string) {
  const [row] = await tx
    .select({ n: sql<number>`count(*)::int` })
    .from(member)
    .where(and(eq(member.organizationId, organizationId), eq(member.role, "owner")));
  return row?.n ?? 0;
}

/** Loads a member of the actor's organisation inside the transaction, or fails with 404. */
async function ownMember(tx: Tx, actor: Actor, memberId: string) {
  const [row] = await tx.select().from(member).where(and(eq(member.id, memberId), eq(member.organizationId, actor.organizationId))).for("update");
  if (!row) throw new DomainError("No such member in your organisation.", 404);
  return row;
}

export async function changeRole(actor: Actor, memberId: string, role: Role) {
  await db.transaction(async (tx) => {
    const target = await ownMember(tx, actor, memberId);
    if (target.role === role) return;
    if (target.role === "owner" && (await ownerCount(tx, actor.organizationId)) <= 1) {
      throw new DomainError("The organisation needs at least one owner. Make someone else owner first.", 409);
    }
    await tx.update(member).set({ role }).where(eq(member.id, memberId));
    await audit(tx, actor, "member.role-changed", "member", memberId, { from: target.role, to: role });
  });
}

export async function removeMember(actor: Actor, memberId: string) {
  await db.transaction(async (tx) => {
    const target = await ownMember(tx, actor, memberId);
    if (target.userId === actor.userId) throw new DomainError("You cannot remove yourself.", 409);
    if (target.role === "owner" && (await ownerCount(tx, actor.organizationId)) <= 1) {
      throw new DomainError("The organisation needs at least one owner.", 409);
    }
    await tx.delete(member).where(eq(member.id, memberId));
    await audit(tx, actor, "member.removed", "member", memberId, { userId: target.userId, role: target.role });
  });
}
