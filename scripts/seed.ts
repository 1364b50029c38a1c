// Seeds the invented demo scenario, once, into an empty database.
import { randomUUID } from "node:crypto";
import { sql as rawSql } from "drizzle-orm";
import { auth } from "../app/features/auth/auth.server";
import { db, schema, sql } from "../app/infra/db.server";
import type { Role } from "../app/lib/roles";
import { seedBilling } from "./demo/billing";
import { seedDocuments } from "./demo/documents";
import { seedFilings } from "./demo/filings";
import { seedInventory } from "./demo/inventory";

const password = process.env.DEMO_PASSWORD ?? "isotrope-demo";

const organisations = [
  {
    name: "Kestrel Lane RF Consulting",
    slug: "kestrel-lane",
    people: [
      ["owner", "Maren Quill"],
      ["engineer", "Tobin Arkwright"],
      ["reviewer", "Ilse Navarro-Penn"],
      ["billing", "Dov Hallorann"],
      ["client", "Priya Fenwick (Larchmont Estates)"],
      ["regulator", "Osric Vey (Spectrum Safety Office)"],
    ].map(([role, name]) => ({ role: role as Role, name, email: `${role}@demo.isotrope.test` })),
  },
  {
    name: "Second Harbour Engineering",
    slug: "second-harbour",
    people: [{ role: "engineer" as Role, name: "Wendell Soto-Marsh", email: "engineer@second.isotrope.test" }],
  },
];

async function main() {
  const [{ n }] = await db.select({ n: rawSql<number>`count(*)::int` }).from(schema.user);
  if (n > 0) {
    console.log("database already has data; demo seed skipped");
    return;
  }
  const hash = await (await auth.$context).password.hash(password);
  let mainOrganizationId = "";
  await db.transaction(async (tx) => {
    for (const [index, org] of organisations.entries()) {
      const organizationId = randomUUID();
      await tx.insert(schema.organization).values({ id: organizationId, name: org.name, slug: org.slug });
      const members: Partial<Record<Role, { userId: string; memberId: string }>> = {};
      for (const person of org.people) {
        const userId = randomUUID();
        const memberId = randomUUID();
        await tx.insert(schema.user).values({ id: userId, name: person.name, email: person.email, emailVerified: true });
        await tx.insert(schema.account).values({ id: randomUUID(), accountId: userId, providerId: "credential", userId, password: hash });
        await tx.insert(schema.member).values({ id: memberId, organizationId, userId, role: person.role });
        members[person.role] = { userId, memberId };
      }
      if (index === 0) await seedInventory(tx, { organizationId, engineerId: members.engineer!.userId, clientMemberId: members.client?.memberId ?? null });
      if (index === 0) mainOrganizationId = organizationId;
    }
  });
  await seedDocuments(mainOrganizationId);
  await seedFilings(mainOrganizationId);
  await seedBilling(mainOrganizationId);
  console.log(`demo scenario seeded: ${organisations.map((o) => o.name).join(", ")}`);
}

main()
  .then(() => sql.end())
  .catch(async (error) => {
    console.error(error);
    await sql.end();
    process.exit(1);
  });
