// Organisations, members and invitations: every write in one transaction with its audit event.
import { randomUUID } from "node:crypto";
import { and, asc, eq, gt, sql } from "drizzle-orm";
import { auth } from "./auth.server";
import { db, schema, type Tx } from "./db.server";
import { env } from "./env.server";
import { linkMail, sendMail } from "./mail.server";
import { roleLabels, type Role } from "./roles";

const { member, invitation, organization, user, account, auditEvent } = schema;
const INVITATION_DAYS = 7;

export class DomainError extends Error {
  constructor(
    message: string,
    readonly status = 400,
    readonly field?: string,
  ) {
    super(message);
  }
}

type Actor = { organizationId: string; userId: string };

function audit(tx: Tx, actor: Actor, action: string, subjectType: string, subjectId: string, detail: Record<string, unknown> = {}) {
  return tx.insert(auditEvent).values({ organizationId: actor.organizationId, actorUserId: actor.userId, action, subjectType, subjectId, detail });
}

export async function accountExists(email: string) {
  const [row] = await db.select({ id: user.id }).from(user).where(eq(user.email, email.toLowerCase()));
  return Boolean(row);
}

export async function listMembers(organizationId: string) {
  return db
    .select({ id: member.id, role: member.role, joinedAt: member.createdAt, userId: user.id, name: user.name, email: user.email })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, organizationId))
    .orderBy(asc(user.name));
}

export async function listPendingInvitations(organizationId: string) {
  return db
    .select({ id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt })
    .from(invitation)
    .where(and(eq(invitation.organizationId, organizationId), eq(invitation.status, "pending"), gt(invitation.expiresAt, new Date())))
    .orderBy(asc(invitation.email));
}

/** Member and waiting-invitation counts for the overview. */
export async function teamCounts(organizationId: string) {
  const [members, pending] = await Promise.all([
    db.select({ n: sql<number>`count(*)::int` }).from(member).where(eq(member.organizationId, organizationId)),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(invitation)
      .where(and(eq(invitation.organizationId, organizationId), eq(invitation.status, "pending"), gt(invitation.expiresAt, new Date()))),
  ]);
  return { members: members[0]?.n ?? 0, pending: pending[0]?.n ?? 0 };
}

/** Invitations still open for an address, from any organisation (the welcome page). */
export async function invitationsFor(email: string) {
  return db
    .select({ id: invitation.id, organizationName: organization.name, role: invitation.role })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .where(and(eq(invitation.email, email), eq(invitation.status, "pending"), gt(invitation.expiresAt, new Date())));
}

export async function createOrganization(userId: string, name: string) {
  return db.transaction(async (tx) => {
    const existing = await tx.select({ id: member.id }).from(member).where(eq(member.userId, userId));
    if (existing.length) throw new DomainError("You already belong to an organisation.", 409);
    const id = randomUUID();
    const slug = `${name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 40) || "org"}-${id.slice(0, 6)}`;
    await tx.insert(organization).values({ id, name, slug });
    await tx.insert(member).values({ id: randomUUID(), organizationId: id, userId, role: "owner" });
    await audit(tx, { organizationId: id, userId }, "organization.created", "organization", id, { name });
    return id;
  });
}

export async function inviteMember(actor: Actor & { inviterName: string; organizationName: string }, email: string, role: Role) {
  const id = await db.transaction(async (tx) => {
    const [already] = await tx
      .select({ id: member.id })
      .from(member)
      .innerJoin(user, eq(user.id, member.userId))
      .where(and(eq(member.organizationId, actor.organizationId), eq(user.email, email)));
    if (already) throw new DomainError("This person is already a member.", 409, "email");
    await tx
      .update(invitation)
      .set({ status: "canceled" })
      .where(and(eq(invitation.organizationId, actor.organizationId), eq(invitation.email, email), eq(invitation.status, "pending")));
    const id = randomUUID();
    const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86_400_000);
    await tx.insert(invitation).values({ id, organizationId: actor.organizationId, email, role, status: "pending", expiresAt, inviterId: actor.userId });
    await audit(tx, actor, "invitation.created", "invitation", id, { email, role });
    return id;
  });
  await sendMail(
    linkMail(email, `Join ${actor.organizationName} on Isotrope`, [
      `${actor.inviterName} invites you to ${actor.organizationName} on Isotrope as ${roleLabels[role]}.`,
      `The link works for ${INVITATION_DAYS} days.`,
    ], { label: "Accept the invitation", url: `${env.APP_URL}/invite/${id}` }),
  );
  return id;
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

export async function cancelInvitation(actor: Actor, invitationId: string) {
  await db.transaction(async (tx) => {
    const updated = await tx
      .update(invitation)
      .set({ status: "canceled" })
      .where(and(eq(invitation.id, invitationId), eq(invitation.organizationId, actor.organizationId), eq(invitation.status, "pending")))
      .returning({ id: invitation.id });
    if (!updated.length) throw new DomainError("No such pending invitation.", 404);
    await audit(tx, actor, "invitation.canceled", "invitation", invitationId);
  });
}

/** An invitation for the public accept page, with why it can't be used, if it can't. */
export async function findInvitation(invitationId: string) {
  const [row] = await db
    .select({ id: invitation.id, email: invitation.email, role: invitation.role, status: invitation.status, expiresAt: invitation.expiresAt, organizationId: invitation.organizationId, organizationName: organization.name })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .where(eq(invitation.id, invitationId));
  if (!row) return null;
  const problem =
    row.status === "accepted" ? "This invitation has already been used." :
    row.status !== "pending" ? "This invitation was withdrawn. Ask for a new one." :
    row.expiresAt < new Date() ? "This invitation has expired. Ask for a new one." : null;
  return { ...row, problem, hasAccount: await accountExists(row.email) };
}

/** Marks the invitation used and adds the membership; fails if someone used it first. */
async function consumeInvitation(tx: Tx, invitationId: string, userId: string, email: string) {
  const [inv] = await tx
    .update(invitation)
    .set({ status: "accepted" })
    .where(and(eq(invitation.id, invitationId), eq(invitation.status, "pending"), eq(invitation.email, email), gt(invitation.expiresAt, new Date())))
    .returning();
  if (!inv) throw new DomainError("This invitation can no longer be used.", 410);
  const [dup] = await tx.select({ id: member.id }).from(member).where(and(eq(member.organizationId, inv.organizationId), eq(member.userId, userId)));
  if (dup) throw new DomainError("You are already a member of this organisation.", 409);
  const memberId = randomUUID();
  await tx.insert(member).values({ id: memberId, organizationId: inv.organizationId, userId, role: inv.role });
  await audit(tx, { organizationId: inv.organizationId, userId }, "invitation.accepted", "member", memberId, { invitationId, role: inv.role });
  return inv.organizationId;
}

/** A new person accepts: the account, its password, the membership, all or nothing. The invite proves the mailbox. */
export async function acceptAsNewUser(invitationId: string, email: string, name: string, password: string) {
  const ctx = await auth.$context;
  const hash = await ctx.password.hash(password);
  return db.transaction(async (tx) => {
    const [taken] = await tx.select({ id: user.id }).from(user).where(eq(user.email, email));
    if (taken) throw new DomainError("An account with this e-mail already exists: sign in to accept.", 409);
    const userId = randomUUID();
    await tx.insert(user).values({ id: userId, name, email, emailVerified: true });
    await tx.insert(account).values({ id: randomUUID(), accountId: userId, providerId: "credential", userId, password: hash });
    return consumeInvitation(tx, invitationId, userId, email);
  });
}

/** A signed-in person accepts an invitation sent to their own address. */
export async function acceptAsUser(invitationId: string, userId: string, email: string) {
  return db.transaction(async (tx) => {
    const organizationId = await consumeInvitation(tx, invitationId, userId, email);
    await tx.update(schema.session).set({ activeOrganizationId: organizationId }).where(eq(schema.session.userId, userId));
    return organizationId;
  });
}
