// Invitations: send, withdraw, look up, accept. Every write in one transaction with its audit event.
import { randomUUID } from "node:crypto";
import { and, asc, eq, gt } from "drizzle-orm";
import { auth } from "~/features/auth/auth.server";
import { accountExists } from "~/features/auth/accounts.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import { linkMail, sendMail } from "~/infra/mail.server";
import { audit, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { invitationProblem } from "./invitation-status";
import { roleLabels, type Role } from "~/lib/roles";

const { member, invitation, organization, user, account } = schema;
const INVITATION_DAYS = 7;

export async function listPendingInvitations(organizationId: string) {
  return db
    .select({ id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt, clientId: schema.clientInvitation.clientId, clientName: schema.client.name })
    .from(invitation)
    .leftJoin(schema.clientInvitation, eq(schema.clientInvitation.invitationId, invitation.id))
    .leftJoin(schema.client, eq(schema.client.id, schema.clientInvitation.clientId))
    .where(and(eq(invitation.organizationId, organizationId), eq(invitation.status, "pending"), gt(invitation.expiresAt, new Date())))
    .orderBy(asc(invitation.email));
}

/** Invitations still open for an address, from any organisation (the welcome page). */
export async function invitationsFor(email: string) {
  return db
    .select({ id: invitation.id, organizationName: organization.name, role: invitation.role })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .where(and(eq(invitation.email, email), eq(invitation.status, "pending"), gt(invitation.expiresAt, new Date())));
}

/**
 * Sends an invitation. An earlier pending one to the same address becomes "superseded" (its
 * link then says a newer one replaced it). The mail goes out inside the transaction: if it
 * can't be sent, no invitation is left behind.
 */
export async function inviteMember(
  actor: Actor & { inviterName: string; organizationName: string },
  email: string,
  role: Role,
  binding: { clientId?: string | null; contactId?: string | null } = {},
) {
  return db.transaction(async (tx) => {
    const clientName = role === "client" ? await bindableClient(tx, actor.organizationId, binding.clientId) : null;
    const [already] = await tx
      .select({ id: member.id })
      .from(member)
      .innerJoin(user, eq(user.id, member.userId))
      .where(and(eq(member.organizationId, actor.organizationId), eq(user.email, email)));
    if (already) throw new DomainError("This person is already a member.", 409, "email");
    await tx
      .update(invitation)
      .set({ status: "superseded" })
      .where(and(eq(invitation.organizationId, actor.organizationId), eq(invitation.email, email), eq(invitation.status, "pending")));
    const id = randomUUID();
    const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86_400_000);
    await tx.insert(invitation).values({ id, organizationId: actor.organizationId, email, role, status: "pending", expiresAt, inviterId: actor.userId });
    if (clientName) await tx.insert(schema.clientInvitation).values({ invitationId: id, clientId: binding.clientId!, contactId: binding.contactId ?? null });
    await audit(tx, actor, "invitation.created", "invitation", id, { email, role, ...(clientName ? { clientId: binding.clientId, client: clientName } : {}) });
    const mail = linkMail(email, `Join ${actor.organizationName} on Isotrope`, [
      clientName
        ? `${actor.inviterName} invites you to see ${clientName}'s sites and documents from ${actor.organizationName} on Isotrope.`
        : `${actor.inviterName} invites you to ${actor.organizationName} on Isotrope as ${roleLabels[role]}.`,
      `The link works for ${INVITATION_DAYS} days. It replaces any earlier invitation from ${actor.organizationName}.`,
    ], { label: "Accept the invitation", url: `${env.APP_URL}/invite/${id}` });
    try {
      await sendMail(mail);
    } catch {
      throw new DomainError("The invitation e-mail could not be sent, so no invitation was made. Try again in a moment.", 503);
    }
    return id;
  });
}

/** The client a `client` invitation binds to: required, and of the inviting organisation. */
async function bindableClient(tx: Tx, organizationId: string, clientId: string | null | undefined) {
  if (!clientId) throw new DomainError("Choose the client this person may see.", 400, "clientId");
  const [row] = await tx.select({ name: schema.client.name }).from(schema.client).where(and(eq(schema.client.id, clientId), eq(schema.client.organizationId, organizationId)));
  if (!row) throw new DomainError("No such client in your organisation.", 400, "clientId");
  return row.name;
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
  if (invitationId.length > 100) return null;
  const [row] = await db
    .select({
      id: invitation.id, email: invitation.email, role: invitation.role, status: invitation.status, expiresAt: invitation.expiresAt,
      organizationId: invitation.organizationId, organizationName: organization.name, inviterName: user.name,
    })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .leftJoin(user, eq(user.id, invitation.inviterId))
    .where(eq(invitation.id, invitationId));
  if (!row) return null;
  return { ...row, problem: invitationProblem(row), hasAccount: await accountExists(row.email) };
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
  await tx.insert(member).values({ id: memberId, organizationId: inv.organizationId, userId, role: inv.role, openedAt: new Date() });
  // A client member sees only the client its invitation names.
  const [binding] = await tx.select().from(schema.clientInvitation).where(eq(schema.clientInvitation.invitationId, inv.id));
  if (binding) await tx.insert(schema.clientMember).values({ memberId, clientId: binding.clientId });
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

/**
 * A signed-in person accepts an invitation sent to their own address. Memberships of other
 * organisations stay; the joined one opens now in every session and at later sign-ins
 * (member.opened_at), and the account page switches back.
 */
export async function acceptAsUser(invitationId: string, userId: string, email: string) {
  return db.transaction(async (tx) => {
    const organizationId = await consumeInvitation(tx, invitationId, userId, email);
    await tx.update(schema.session).set({ activeOrganizationId: organizationId }).where(eq(schema.session.userId, userId));
    return organizationId;
  });
}
