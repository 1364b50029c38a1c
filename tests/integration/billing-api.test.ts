// GET /api/v1/invoices and /api/v1/payments (issue 10 §6): billing and owner see the organisation's;
// a client member only its own client's issued invoices and 403 on payments; another organisation's
// records never show; the payments CSV has the documented columns.
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as invoicesApi from "~/routes/api/v1/invoices";
import * as paymentsApi from "~/routes/api/v1/payments";
import { createOrg, makeRequest, type Org } from "./fixtures";

let org: Org;
let other: Org;
const ids: Record<string, string> = {};

const get = async (mod: { loader: (a: never) => unknown }, path: string, cookie: string) => {
  try {
    return (await mod.loader({ request: makeRequest(path, { cookie }), params: {}, context: {} } as never)) as Response;
  } catch (thrown) {
    return thrown as Response;
  }
};

beforeAll(async () => {
  org = await createOrg("billing-api");
  other = await createOrg("billing-api-other");
  const [mine, theirs] = await db.insert(schema.client).values([{ organizationId: org.id, name: "Client mine" }, { organizationId: org.id, name: "Client theirs" }]).returning();
  await db.insert(schema.clientMember).values({ memberId: org.people.client.memberId, clientId: mine.id });
  const [elsewhere] = await db.insert(schema.client).values({ organizationId: other.id, name: "Other org client" }).returning();
  const inv = (clientId: string, organizationId: string, state: "draft" | "open", number: number | null) => ({ organizationId, clientId, currency: "eur", total: 1000, state, number, issuedAt: state === "open" ? new Date() : null });
  const rows = await db.insert(schema.invoice).values([inv(mine.id, org.id, "open", 1), inv(mine.id, org.id, "draft", null), inv(theirs.id, org.id, "open", 2), inv(elsewhere.id, other.id, "open", 1)]).returning();
  [ids.mineOpen, ids.mineDraft, ids.theirsOpen, ids.elsewhere] = rows.map((r) => r.id);
  const [c] = await db.insert(schema.checkout).values({ organizationId: org.id, clientId: mine.id, purpose: "invoice", invoiceId: ids.mineOpen, amount: 1000, currency: "eur", state: "paid", stripeSessionId: `cs_api_${org.id}` }).returning();
  await db.insert(schema.payment).values({ organizationId: org.id, clientId: mine.id, checkoutId: c.id, purpose: "invoice", invoiceId: ids.mineOpen, stripePaymentIntentId: `pi_api_${org.id}`, amount: 1000, amountRefunded: 250, state: "partly_refunded", currency: "eur", paidAt: new Date("2026-11-02T10:00:00Z") });
});

describe("billing API", () => {
  it("gives billing and owner every invoice of their organisation, drafts included", async () => {
    for (const role of ["billing", "owner"] as const) {
      const res = await get(invoicesApi, "/api/v1/invoices", org.people[role].cookie);
      expect(res.status).toBe(200);
      const { invoices } = (await res.json()) as { invoices: { id: string }[] };
      expect(invoices.map((i) => i.id).sort()).toEqual([ids.mineOpen, ids.mineDraft, ids.theirsOpen].sort());
    }
  });

  it("gives a client member only its own client's issued invoices", async () => {
    const res = await get(invoicesApi, "/api/v1/invoices", org.people.client.cookie);
    const { invoices } = (await res.json()) as { invoices: { id: string; number: string; clientName: string }[] };
    expect(invoices).toHaveLength(1);
    expect(invoices[0]).toMatchObject({ id: ids.mineOpen, number: "INV-00001", clientName: "Client mine" });
  });

  it("refuses payments to clients and to staff outside billing, and invoices to engineers", async () => {
    for (const role of ["client", "engineer", "reviewer", "regulator"] as const) expect((await get(paymentsApi, "/api/v1/payments", org.people[role].cookie)).status).toBe(403);
    for (const role of ["engineer", "reviewer", "regulator"] as const) expect((await get(invoicesApi, "/api/v1/invoices", org.people[role].cookie)).status).toBe(403);
  });

  it("lists payments with filters, and as CSV", async () => {
    const res = await get(paymentsApi, "/api/v1/payments?state=partly_refunded&from=2026-11-01&to=2026-11-02", org.people.billing.cookie);
    const { payments } = (await res.json()) as { payments: Record<string, unknown>[] };
    expect(payments).toEqual([expect.objectContaining({ invoiceNumber: "INV-00001", amount: 1000, amountRefunded: 250, currency: "eur", state: "partly_refunded", paidAt: "2026-11-02T10:00:00.000Z" })]);
    expect((await (await get(paymentsApi, "/api/v1/payments?to=2026-11-01", org.people.billing.cookie)).json()).payments).toEqual([]);
    const foreign = await get(paymentsApi, "/api/v1/payments", other.people.billing.cookie);
    expect((await foreign.json()).payments).toEqual([]);
    const csv = await (await get(paymentsApi, "/api/v1/payments?format=csv", org.people.owner.cookie)).text();
    const [header, row] = csv.trim().split(/\r?\n/);
    expect(header).toBe("paid_at,client,purpose,invoice,currency,amount,refunded,state,payment_intent");
    expect(row).toBe(`2026-11-02T10:00:00.000Z,Client mine,invoice,INV-00001,EUR,10.00,2.50,partly_refunded,pi_api_${org.id}`);
  });
});
