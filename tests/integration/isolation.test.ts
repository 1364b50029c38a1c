// A member of one organisation can neither read nor change another's data by changing an id.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as apiMe from "~/routes/api/v1/me";
import * as members from "~/routes/members/members";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

let a: Org;
let b: Org;
let bInvitation = "";
const args = (request: Request) => ({ request, params: {}, context: {} }) as never;

beforeAll(async () => {
  a = await createOrg("iso-a");
  b = await createOrg("iso-b");
  bInvitation = randomUUID();
  await db.insert(schema.invitation).values({
    id: bInvitation, organizationId: b.id, email: `someone-${bInvitation}@fixture.test`, role: "client",
    status: "pending", expiresAt: new Date(Date.now() + 86_400_000), inviterId: b.people.owner.userId,
  });
});

const post = (org: Org, form: Record<string, string>) => outcome(() => members.action(args(makeRequest("/members", { cookie: org.people.owner.cookie, form }))));

describe("organisation isolation", () => {
  it("lists only the owner's own members", async () => {
    const data = (await members.loader(args(makeRequest("/members", { cookie: a.people.owner.cookie })))) as { members: { email: string }[] };
    const emails = data.members.map((m) => m.email);
    expect(emails).toContain(a.people.engineer.email);
    expect(emails).not.toContain(b.people.engineer.email);
  });

  it("refuses to change the role of another organisation's member", async () => {
    const got = await post(a, { intent: "change-role", memberId: b.people.engineer.memberId, role: "owner" });
    expect(got.status).toBe(404);
    const [row] = await db.select().from(schema.member).where(eq(schema.member.id, b.people.engineer.memberId));
    expect(row.role).toBe("engineer");
  });

  it("refuses to remove another organisation's member", async () => {
    const got = await post(a, { intent: "remove", memberId: b.people.billing.memberId });
    expect(got.status).toBe(404);
    const rows = await db.select().from(schema.member).where(eq(schema.member.id, b.people.billing.memberId));
    expect(rows).toHaveLength(1);
  });

  it("refuses to withdraw another organisation's invitation", async () => {
    const got = await post(a, { intent: "cancel-invite", invitationId: bInvitation });
    expect(got.status).toBe(404);
    const [row] = await db.select().from(schema.invitation).where(eq(schema.invitation.id, bInvitation));
    expect(row.status).toBe("pending");
  });

  it("answers /api/v1/me with the caller's own organisation", async () => {
    const response = (await apiMe.loader(args(makeRequest("/api/v1/me", { cookie: b.people.engineer.cookie })))) as Response;
    expect(await response.json()).toMatchObject({ email: b.people.engineer.email, role: "engineer", organization: { id: b.id } });
  });

  it("lets an owner change a role in their own organisation, with an audit event", async () => {
    const got = await post(a, { intent: "change-role", memberId: a.people.client.memberId, role: "regulator" });
    expect(got).toMatchObject({ status: 302, location: "/members" });
    const [row] = await db.select().from(schema.member).where(eq(schema.member.id, a.people.client.memberId));
    expect(row.role).toBe("regulator");
    const events = await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.subjectId, a.people.client.memberId));
    expect(events.map((e) => [e.action, e.organizationId, e.detail])).toEqual([["member.role-changed", a.id, { from: "client", to: "regulator" }]]);
  });

  it("keeps the last owner: demoting them is refused and nothing changes", async () => {
    const got = await post(a, { intent: "change-role", memberId: a.people.owner.memberId, role: "engineer" });
    expect(got.status).toBe(409);
    const [row] = await db.select().from(schema.member).where(eq(schema.member.id, a.people.owner.memberId));
    expect(row.role).toBe("owner");
  });
});
