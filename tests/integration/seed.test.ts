// The demo seed: one account per role in the demo consultancy, one in a second organisation,
// and never a second run over existing data.
import { execFileSync } from "node:child_process";
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";

const demo = [
  ["owner@demo.isotrope.test", "owner"],
  ["engineer@demo.isotrope.test", "engineer"],
  ["reviewer@demo.isotrope.test", "reviewer"],
  ["billing@demo.isotrope.test", "billing"],
  ["client@demo.isotrope.test", "client"],
  ["regulator@demo.isotrope.test", "regulator"],
  ["engineer@second.isotrope.test", "engineer"],
];

async function rolesByEmail() {
  const rows = await db
    .select({ email: schema.user.email, role: schema.member.role, org: schema.member.organizationId })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId));
  return rows.filter((r) => r.email.endsWith(".isotrope.test"));
}

describe("demo seed", () => {
  it("has one confirmed account per role, and the second organisation apart", async () => {
    const rows = await rolesByEmail();
    expect(rows.map((r) => [r.email, r.role]).sort()).toEqual([...demo].sort());
    const demoOrgs = new Set(rows.filter((r) => r.email.endsWith("@demo.isotrope.test")).map((r) => r.org));
    const secondOrg = rows.find((r) => r.email === "engineer@second.isotrope.test")?.org;
    expect(demoOrgs.size).toBe(1);
    expect(demoOrgs.has(secondOrg!)).toBe(false);
  });

  it("refuses to run over a database that already has data", async () => {
    const count = async () => (await db.select({ n: sql<number>`count(*)::int` }).from(schema.user))[0].n;
    const before = await count();
    const output = execFileSync("node_modules/.bin/tsx", ["scripts/seed.ts"], { env: process.env, encoding: "utf8" });
    expect(output).toContain("already has data");
    expect(await count()).toBe(before);
  });
});
