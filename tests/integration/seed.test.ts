// The demo seed: one account per role in the demo consultancy, one in a second organisation,
// and never a second run over existing data.
import { execFileSync } from "node:child_process";
import { and, eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { evaluateSite } from "~/features/exposure/evaluate-site";
import { loadSiteInventory } from "~/features/exposure/inventory.server";
import { optionsSchema } from "~/features/exposure/options";
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

describe("demo inventory", () => {
  async function demoOrgId() {
    const [row] = await db.select({ id: schema.organization.id }).from(schema.organization).where(eq(schema.organization.slug, "kestrel-lane"));
    return row.id;
  }

  it("has three invented sites of three kinds, each with a client", async () => {
    const sites = await db.select().from(schema.site).where(eq(schema.site.organizationId, await demoOrgId()));
    expect(sites.map((s) => s.kind).sort()).toEqual(["monopole", "rooftop", "street-pole"]);
    expect(sites.every((s) => s.clientId)).toBe(true);
  });

  it("puts 12 or more emitters of three operators from 700 MHz to 3.7 GHz on the rooftop, one massive-MIMO with F_PR and TDD", async () => {
    const [rooftop] = await db.select().from(schema.site).where(and(eq(schema.site.kind, "rooftop"), eq(schema.site.organizationId, await demoOrgId())));
    const emitters = await db.select().from(schema.emitter).where(eq(schema.emitter.siteId, rooftop.id));
    expect(emitters.length).toBeGreaterThanOrEqual(12);
    expect(new Set(emitters.map((e) => e.operator)).size).toBe(3);
    const f = emitters.map((e) => e.frequencyMHz);
    expect(Math.min(...f)).toBeGreaterThanOrEqual(700);
    expect(Math.max(...f)).toBeLessThanOrEqual(3700);
    expect(emitters.some((e) => e.actualMaxFactor < 1 && e.tddFactor < 1)).toBe(true);
    const surfaces = await db.select().from(schema.surface).where(eq(schema.surface.siteId, rooftop.id));
    expect(surfaces.map((s) => s.elevationM).filter((v) => v !== null).sort()).toEqual([-3.5, 0, 4.2]);
    expect(surfaces.some((s) => s.kind === "facade")).toBe(true);
  });

  it("binds the demo client member to the rooftop's client, and has a visit with readings and two tabulated patterns", async () => {
    const [client] = await db
      .select({ clientId: schema.clientMember.clientId })
      .from(schema.clientMember)
      .innerJoin(schema.member, eq(schema.member.id, schema.clientMember.memberId))
      .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
      .where(eq(schema.user.email, "client@demo.isotrope.test"));
    const [rooftop] = await db.select().from(schema.site).where(and(eq(schema.site.kind, "rooftop"), eq(schema.site.organizationId, await demoOrgId())));
    expect(client.clientId).toBe(rooftop.clientId);
    const visits = await db.select().from(schema.visit).where(eq(schema.visit.siteId, rooftop.id));
    const readings = await db.select().from(schema.reading).where(eq(schema.reading.visitId, visits[0].id));
    expect(readings.length).toBeGreaterThanOrEqual(5);
    const patterns = await db.select().from(schema.antennaPattern).where(eq(schema.antennaPattern.organizationId, await demoOrgId()));
    expect(patterns.filter((p) => p.kind === "tabulated")).toHaveLength(2);
  });

  it("has part of the rooftop's main roof above the general-population limit, averaged over 0–2 m", async () => {
    const [rooftop] = await db.select().from(schema.site).where(and(eq(schema.site.kind, "rooftop"), eq(schema.site.organizationId, await demoOrgId())));
    const inventory = await loadSiteInventory(rooftop.organizationId, rooftop.id);
    const site = evaluateSite(inventory, optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: 0.5 }));
    const main = site.surfaces.find((s) => s.name === "Main roof")!;
    expect(main.areas.overGeneralM2).toBeGreaterThan(5);
    expect(main.areas.overGeneralM2).toBeLessThan(main.areas.totalM2 / 10);
  });
});

describe("demo filing", () => {
  it("holds a filing of Calloway House's issued assessment to the demo regulator, with its issued report", async () => {
    const rows = await db
      .select({ authority: schema.filing.authority, site: schema.site.name, email: schema.user.email, reportState: schema.document.state, kind: schema.document.kind })
      .from(schema.filing)
      .innerJoin(schema.site, eq(schema.site.id, schema.filing.siteId))
      .innerJoin(schema.member, eq(schema.member.id, schema.filing.regulatorMemberId))
      .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
      .innerJoin(schema.document, eq(schema.document.id, schema.filing.documentId))
      .where(eq(schema.user.email, "regulator@demo.isotrope.test"));
    expect(rows).toEqual([{ authority: "Spectrum Safety Office", site: "Calloway House", email: "regulator@demo.isotrope.test", reportState: "issued", kind: "report" }]);
  });
});
