// Organisations: creating one with its first owner, the ones a person belongs to, and which one they work in.
import { randomUUID } from "node:crypto";
import { and, asc, desc, eq, isNotNull } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { audit } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";

const { member, organization } = schema;

export async function createOrganization(userId: string, name: string) {
  return db.transaction(async (tx) => {
    const existing = await tx.select({ id: member.id }).from(member).where(eq(member.userId, userId));
    if (existing.length) throw new DomainError("You already belong to an organisation.", 409);
    const id = randomUUID();
    const slug = `${name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 40) || "org"}-${id.slice(0, 6)}`;
    await tx.insert(organization).values({ id, name, slug });
    await tx.insert(member).values({ id: randomUUID(), organizationId: id, userId, role: "owner", openedAt: new Date() });
    await audit(tx, { organizationId: id, userId }, "organization.created", "organization", id, { name });
    return id;
  });
}

/** The organisation a new session opens: the one the person last joined or switched to (null: the guard's default). */
export async function preferredOrganizationId(userId: string): Promise<string | null> {
  const [row] = await db
    .select({ organizationId: member.organizationId })
    .from(member)
    .where(and(eq(member.userId, userId), isNotNull(member.openedAt)))
    .orderBy(desc(member.openedAt))
    .limit(1);
  return row?.organizationId ?? null;
}

/** Every organisation the person belongs to, for the account page and the invitation page. */
export async function membershipsOf(userId: string) {
  return db
    .select({ organizationId: organization.id, organizationName: organization.name, role: member.role })
    .from(member)
    .innerJoin(organization, eq(organization.id, member.organizationId))
    .where(eq(member.userId, userId))
    .orderBy(asc(organization.name));
}

/** Opens another of the person's organisations: now, in all their sessions, and at later sign-ins. */
export async function switchOrganization(userId: string, organizationId: string): Promise<string> {
  return db.transaction(async (tx) => {
    const opened = await tx
      .update(member)
      .set({ openedAt: new Date() })
      .where(and(eq(member.userId, userId), eq(member.organizationId, organizationId)))
      .returning({ id: member.id });
    if (!opened.length) throw new DomainError("You are not a member of that organisation.", 404);
    await tx.update(schema.session).set({ activeOrganizationId: organizationId }).where(eq(schema.session.userId, userId));
    const [org] = await tx.select({ name: organization.name }).from(organization).where(eq(organization.id, organizationId));
    return org.name;
  });
}
