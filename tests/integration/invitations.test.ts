// Invitations say what really happened to them and what to do next; joining a second
// organisation does what the page says.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { requireMember } from "~/features/auth/guard.server";
import { db, schema } from "~/infra/db.server";
import * as account from "~/routes/account/account";
import * as invite from "~/routes/auth/invite";
import * as members from "~/routes/members/members";
import * as signIn from "~/routes/auth/sign-in";
import { createOrg, freshIp, makeRequest, outcome, password, type Org } from "./fixtures";

// The mail adapter as it is, with a switch to make the next send fail (an SMTP server that's down).
const mailFailure = vi.hoisted(() => ({ next: false }));
vi.mock("~/infra/mail.server", async (importOriginal) => {
  const real = await importOriginal<typeof import("~/infra/mail.server")>();
  return {
    ...real,
    sendMail: async (mail: Parameters<typeof real.sendMail>[0]) => {
      if (mailFailure.next) {
        mailFailure.next = false;
        throw new Error("connect ECONNREFUSED");
      }
      return real.sendMail(mail);
    },
  };
});

const args = (request: Request, params: Record<string, string> = {}) => ({ request, params, context: {} }) as never;
const text = (body: unknown) => JSON.stringify(body);
const invitationsTo = (organizationId: string, email: string) =>
  db.select().from(schema.invitation).where(and(eq(schema.invitation.organizationId, organizationId), eq(schema.invitation.email, email)));

let org: Org;
beforeAll(async () => {
  org = await createOrg("inv");
});

const inviteForm = (form: Record<string, string>) => outcome(() => members.action(args(makeRequest("/members", { cookie: org.people.owner.cookie, form: { intent: "invite", ...form } }))));
const openLink = (id: string, cookie?: string) => outcome(() => invite.loader(args(makeRequest(`/invite/${id}`, { cookie }), { invitationId: id })));

/** Signs in through the page, as a browser would, and returns the session cookies. */
async function signInCookie(email: string) {
  const response = (await signIn.action(args(makeRequest("/sign-in", { ip: freshIp(), form: { email, password } })))) as Response;
  expect(response.status).toBe(302);
  return response.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
}

describe("invitation form", () => {
  it("asks for the invitee's address, not 'your' address", async () => {
    const got = await inviteForm({ email: "", role: "engineer" });
    expect(got.status).toBe(400);
    expect(text(got.body)).toContain("Enter the e-mail address of the person you are inviting.");
  });

  it("refuses an over-long address with the limit, and stores nothing", async () => {
    const email = `${"a".repeat(60)}@${"b".repeat(75_000)}.test`;
    const got = await inviteForm({ email, role: "engineer" });
    expect(got.status).toBe(400);
    expect(text(got.body)).toContain("Use at most 254 characters.");
    expect(await db.select().from(schema.invitation).where(eq(schema.invitation.organizationId, org.id))).toHaveLength(0);
  });
});

describe("an invitation whose mail can't be sent", () => {
  it("says so and leaves no invitation behind", async () => {
    const email = `unsent-${randomUUID()}@fixture.test`;
    mailFailure.next = true;
    const got = await inviteForm({ email, role: "engineer" });
    expect(got.status).toBe(503);
    expect(text(got.body)).toContain("could not be sent, so no invitation was made");
    expect(await invitationsTo(org.id, email)).toHaveLength(0);
    expect(await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.organizationId, org.id))).toHaveLength(0);
  });
});

describe("a re-sent invitation", () => {
  it("marks the older link replaced, not withdrawn", async () => {
    const email = `twice-${randomUUID()}@fixture.test`;
    expect((await inviteForm({ email, role: "engineer" })).status).toBe(302);
    expect((await inviteForm({ email, role: "reviewer" })).status).toBe(302);
    const rows = await invitationsTo(org.id, email);
    const old = rows.find((r) => r.role === "engineer")!;
    const fresh = rows.find((r) => r.role === "reviewer")!;
    expect([old.status, fresh.status]).toEqual(["superseded", "pending"]);
    const page = await openLink(old.id);
    expect(page.status).toBe(410);
    expect(text(page.body)).toContain("sent you a newer invitation, which replaces this one");
    expect(text(page.body)).not.toContain("withdrew");
    expect((await openLink(fresh.id)).status).toBe(200);
  });
});

describe("a used invitation", () => {
  it("offers a next step", async () => {
    const email = `used-${randomUUID()}@fixture.test`;
    await inviteForm({ email, role: "billing" });
    const [inv] = await invitationsTo(org.id, email);
    const accept = () =>
      outcome(() => invite.action(args(makeRequest(`/invite/${inv.id}`, { ip: freshIp(), form: { name: "Used Once", password: "joining-Pass-8", confirm: "joining-Pass-8" } }), { invitationId: inv.id })));
    expect((await accept()).status).toBe(302);
    const page = await openLink(inv.id);
    expect(page.status).toBe(410);
    expect(page.body).toMatchObject({ problem: "This invitation has already been used. Sign in to continue.", next: { label: "Go to sign-in", to: "/sign-in" } });
  });
});

describe("joining a second organisation", () => {
  it("says the first membership stays, opens the new one now and at later sign-ins, and switches back", async () => {
    const other = await createOrg("second");
    const person = other.people.engineer;
    const id = randomUUID();
    await db.insert(schema.invitation).values({
      id, organizationId: org.id, email: person.email, role: "reviewer", status: "pending",
      expiresAt: new Date(Date.now() + 86_400_000), inviterId: org.people.owner.userId,
    });
    const page = await openLink(id, person.cookie);
    expect(page.body).toMatchObject({ otherOrganizations: [other.name], signedInEmail: person.email });

    const joined = await outcome(() => invite.action(args(makeRequest(`/invite/${id}`, { cookie: person.cookie, form: {} }), { invitationId: id })));
    expect(joined).toMatchObject({ status: 302, location: "/" });
    const rows = await db.select().from(schema.member).where(eq(schema.member.userId, person.userId));
    expect(rows.map((m) => m.organizationId).sort()).toEqual([org.id, other.id].sort());
    // Now, in the session that joined, and in a session started later.
    expect((await requireMember(makeRequest("/", { cookie: person.cookie }))).organizationId).toBe(org.id);
    expect((await requireMember(makeRequest("/", { cookie: await signInCookie(person.email) }))).organizationId).toBe(org.id);

    const back = await outcome(() =>
      account.action(args(makeRequest("/account", { cookie: person.cookie, form: { intent: "switch-organization", organizationId: other.id } }))),
    );
    expect(back).toMatchObject({ status: 302, location: "/" });
    expect((await requireMember(makeRequest("/", { cookie: person.cookie }))).organizationId).toBe(other.id);
    expect((await requireMember(makeRequest("/", { cookie: await signInCookie(person.email) }))).organizationId).toBe(other.id);
  });

  it("refuses to switch to an organisation one doesn't belong to", async () => {
    const stranger = await createOrg("stranger");
    const got = await outcome(() =>
      account.action(args(makeRequest("/account", { cookie: stranger.people.client.cookie, form: { intent: "switch-organization", organizationId: org.id } }))),
    );
    expect(got.status).toBe(404);
  });
});
