// Clients (landlords, property companies), their contacts, and which client a `client` member or invitation is bound to.
import { index, pgTable, text } from "drizzle-orm/pg-core";
import { invitation, member, organization } from "./auth";
import { createdAt, id, updatedAt, version } from "./columns";

export const client = pgTable(
  "client",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    billingAddress: text("billing_address").notNull().default(""),
    notes: text("notes").notNull().default(""),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("client_org_name_idx").on(t.organizationId, t.name)],
);

export const clientContact = pgTable(
  "client_contact",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    clientId: text("client_id").notNull().references(() => client.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    email: text("email").notNull().default(""),
    phone: text("phone").notNull().default(""),
    role: text("role").notNull().default(""),
    createdAt: createdAt(),
  },
  (t) => [index("client_contact_client_idx").on(t.clientId)],
);

/** A `client` member sees only this client's records. */
export const clientMember = pgTable(
  "client_member",
  {
    memberId: text("member_id").primaryKey().references(() => member.id, { onDelete: "cascade" }),
    clientId: text("client_id").notNull().references(() => client.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
  },
  (t) => [index("client_member_client_idx").on(t.clientId)],
);

/** The client an invitation with the `client` role binds its member to on acceptance. */
export const clientInvitation = pgTable("client_invitation", {
  invitationId: text("invitation_id").primaryKey().references(() => invitation.id, { onDelete: "cascade" }),
  clientId: text("client_id").notNull().references(() => client.id, { onDelete: "cascade" }),
  contactId: text("contact_id").references(() => clientContact.id, { onDelete: "set null" }),
});
