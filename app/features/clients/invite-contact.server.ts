// Inviting a client's contact as a `client` member bound to that client.
import { and, eq, inArray } from "drizzle-orm";
import { inviteMember } from "~/features/members/invitations.server";
import { db, schema } from "~/infra/db.server";
import type { Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";

export async function inviteClientContact(actor: Actor & { inviterName: string; organizationName: string }, clientId: string, contactId: string) {
  const [contact] = await db
    .select({ id: schema.clientContact.id, email: schema.clientContact.email, name: schema.clientContact.name })
    .from(schema.clientContact)
    .where(and(eq(schema.clientContact.id, contactId), eq(schema.clientContact.clientId, clientId), eq(schema.clientContact.organizationId, actor.organizationId)));
  if (!contact) throw new DomainError("No such contact of this client.", 404);
  if (!contact.email) throw new DomainError(`${contact.name} has no e-mail address. Add one first.`, 400);
  await inviteMember(actor, contact.email, "client", { clientId, contactId: contact.id });
  return contact;
}

/**
 * Which of these e-mail addresses already belong to a member of the organisation: the client page
 * offers no invitation to them (inviting one would be refused as "already a member").
 */
export async function memberAddresses(organizationId: string, emails: readonly string[]): Promise<Set<string>> {
  const wanted = [...new Set(emails.filter(Boolean))];
  if (!wanted.length) return new Set();
  const rows = await db
    .select({ email: schema.user.email })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(and(eq(schema.member.organizationId, organizationId), inArray(schema.user.email, wanted)));
  return new Set(rows.map((r) => r.email));
}
