// Creating a consultancy: the organisation and its first owner.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
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
    await tx.insert(member).values({ id: randomUUID(), organizationId: id, userId, role: "owner" });
    await audit(tx, { organizationId: id, userId }, "organization.created", "organization", id, { name });
    return id;
  });
}
