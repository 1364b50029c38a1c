// Inviting a client's contact as a `client` member bound to that client.
import { and, eq } from "drizzle-orm";
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
