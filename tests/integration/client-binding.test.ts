// A client member is bound to one client and is only ever shown that client's records.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { createClient, findClient, listClients } from "~/features/clients/clients.server";
import { inviteClientContact } from "~/features/clients/invite-contact.server";
import { acceptAsNewUser } from "~/features/members/invitations.server";
import { scopeOf } from "~/features/sites/scope.server";
import { createSite, findSite, listSites } from "~/features/sites/sites.server";
import { db, schema } from "~/infra/db.server";
import * as clientPage from "~/routes/clients/client";
import * as members from "~/routes/members/members";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

let org: Org;
let mine = "";
let theirs = "";
const owner = () => ({ organizationId: org.id, userId: org.people.owner.userId, role: "owner" as const, clientId: null });

beforeAll(async () => {
  org = await createOrg("binding");
  const a = await createClient(owner(), { name: "Bound Landlord", billingAddress: "", notes: "", contacts: [{ name: "Ada Tenantwise", email: `ada-${org.id}@fixture.test`, phone: "", role: "Property manager" }] });
  const b = await createClient(owner(), { name: "Other Landlord", billingAddress: "", notes: "", contacts: [] });
  mine = (await createSite(owner(), { name: "Bound roof", kind: "rooftop", address: "", city: "", clientId: a.id, latitude: null, longitude: null, datumNote: "", accessNotes: "" })).id;
  theirs = (await createSite(owner(), { name: "Other roof", kind: "rooftop", address: "", city: "", clientId: b.id, latitude: null, longitude: null, datumNote: "", accessNotes: "" })).id;
});

describe("client members", () => {
  it("are invited from a client's contact, and bound to that client when they accept", async () => {
    const client = (await listClients(scopeOf({ organizationId: org.id, role: "owner", clientId: null }), { page: 1, pageSize: 10, q: "Bound", sort: "name", dir: "asc" })).clients[0];
    const detail = await findClient(owner(), client.id);
    const contact = detail!.contacts[0];
    await inviteClientContact({ organizationId: org.id, userId: org.people.owner.userId, inviterName: "Owner", organizationName: org.name }, client.id, contact.id);
    const [invitation] = await db.select().from(schema.invitation).where(and(eq(schema.invitation.organizationId, org.id), eq(schema.invitation.email, contact.email)));
    expect(invitation.role).toBe("client");
    const [binding] = await db.select().from(schema.clientInvitation).where(eq(schema.clientInvitation.invitationId, invitation.id));
    expect(binding.clientId).toBe(client.id);

    await acceptAsNewUser(invitation.id, contact.email, "Ada Tenantwise", "tenant-Password-42");
    const [joined] = await db
      .select({ memberId: schema.member.id, role: schema.member.role, clientId: schema.clientMember.clientId })
      .from(schema.member)
      .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
      .leftJoin(schema.clientMember, eq(schema.clientMember.memberId, schema.member.id))
      .where(eq(schema.user.email, contact.email));
    expect(joined).toMatchObject({ role: "client", clientId: client.id });

    const scope = scopeOf({ organizationId: org.id, role: "client", clientId: joined.clientId });
    const sites = await listSites(scope, { page: 1, pageSize: 50, q: "", sort: "name", dir: "asc" });
    expect(sites.sites.map((s) => s.id)).toEqual([mine]);
    expect(await findSite(scope, theirs)).toBeNull();
    expect(await findSite(scope, mine)).not.toBeNull();
    const clients = await listClients(scope, { page: 1, pageSize: 50, q: "", sort: "name", dir: "asc" });
    expect(clients.clients.map((c) => c.name)).toEqual(["Bound Landlord"]);
  });

  it("are not offered a second invitation on the client's page once they sign in", async () => {
    const c = await createClient(owner(), {
      name: "Joined Landlord",
      billingAddress: "",
      notes: "",
      contacts: [
        { name: "Already Here", email: org.people.client.email.toUpperCase(), phone: "", role: "" },
        { name: "Not Yet", email: `not-yet-${org.id}@fixture.test`, phone: "", role: "" },
      ],
    });
    const page = (await clientPage.loader({ request: makeRequest(`/clients/${c.id}`, { cookie: org.people.owner.cookie }), params: { clientId: c.id }, context: {} } as never)) as { client: { contacts: { id: string; name: string }[] }; signsIn: string[] };
    const byName = Object.fromEntries(page.client.contacts.map((x) => [x.name, x.id]));
    expect(page.signsIn).toEqual([byName["Already Here"]]);
  });

  it("see nothing at all while bound to no client", async () => {
    const scope = scopeOf({ organizationId: org.id, role: "client", clientId: null });
    expect((await listSites(scope, { page: 1, pageSize: 50, q: "", sort: "name", dir: "asc" })).total).toBe(0);
    expect((await listClients(scope, { page: 1, pageSize: 50, q: "", sort: "name", dir: "asc" })).total).toBe(0);
    expect(await findSite(scope, mine)).toBeNull();
  });

  it("cannot be invited from the members page without naming the client, and nothing is written", async () => {
    const email = `unbound-${org.id}@fixture.test`;
    const got = await outcome(() => members.action({ request: makeRequest("/members", { cookie: org.people.owner.cookie, form: { intent: "invite", email, role: "client" } }), params: {}, context: {} } as never));
    expect(got.status).toBe(400);
    expect(JSON.stringify(got.body)).toContain("Choose the client this person may see.");
    expect(await db.select().from(schema.invitation).where(eq(schema.invitation.email, email))).toHaveLength(0);
  });

  it("refuse another organisation's client as the binding", async () => {
    const other = await createOrg("binding-other");
    const [foreign] = await db.insert(schema.client).values({ organizationId: other.id, name: "Foreign" }).returning();
    const email = `foreign-${org.id}@fixture.test`;
    const got = await outcome(() => members.action({ request: makeRequest("/members", { cookie: org.people.owner.cookie, form: { intent: "invite", email, role: "client", clientId: foreign.id } }), params: {}, context: {} } as never));
    expect(got.status).toBe(400);
    expect(JSON.stringify(got.body)).toContain("No such client");
    expect(await db.select().from(schema.invitation).where(eq(schema.invitation.email, email))).toHaveLength(0);
  });
});
