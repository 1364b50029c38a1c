// The price list against the local Stripe fake (started by the test command; STRIPE_API_BASE):
// a new price makes a Product and a Price; a changed amount makes a new Price and deactivates the
// old one; a changed name renames the Product; the currency cannot change once invoices exist.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { savePrice, setCurrency } from "~/features/billing/prices.server";
import { db, schema } from "~/infra/db.server";
import { stripe } from "~/infra/stripe.server";
import { createOrg, type Org } from "./fixtures";

let org: Org;
const actor = () => ({ organizationId: org.id, userId: org.people.billing.userId });

beforeAll(async () => {
  org = await createOrg("billing-prices");
});

describe("price list", () => {
  it("creates a Product and Price, and a new Price when the amount changes", async () => {
    await setCurrency(actor(), "usd");
    const first = await savePrice(actor(), { kind: "certificate_fee", name: "Certificate", amount: 9500, active: true });
    expect(first).toMatchObject({ amount: 9500, currency: "usd", active: true });
    const price1 = await stripe.prices.retrieve(first.stripePriceId!);
    expect(price1).toMatchObject({ unit_amount: 9500, currency: "usd", active: true, product: first.stripeProductId });

    const second = await savePrice(actor(), { kind: "certificate_fee", name: "Compliance certificate", amount: 12000, active: true });
    expect(second.id).toBe(first.id);
    expect(second.stripeProductId).toBe(first.stripeProductId);
    expect(second.stripePriceId).not.toBe(first.stripePriceId);
    expect(await stripe.prices.retrieve(second.stripePriceId!)).toMatchObject({ unit_amount: 12000, active: true });
    expect((await stripe.prices.retrieve(first.stripePriceId!)).active).toBe(false);
    expect((await stripe.products.retrieve(first.stripeProductId!)).name).toBe("Compliance certificate");

    // The same amount again: no new Price.
    const third = await savePrice(actor(), { kind: "certificate_fee", name: "Compliance certificate", amount: 12000, active: true });
    expect(third.stripePriceId).toBe(second.stripePriceId);
    const audits = await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.subjectId, first.id));
    expect(audits.map((a) => a.action)).toEqual(["price.created", "price.updated", "price.updated"]);
  });

  it("keeps the currency once invoices exist", async () => {
    const [client] = await db.insert(schema.client).values({ organizationId: org.id, name: "Prices client" }).returning();
    await db.insert(schema.invoice).values({ organizationId: org.id, clientId: client.id, currency: "usd", total: 100 });
    await expect(setCurrency(actor(), "eur")).rejects.toMatchObject({ status: 409 });
  });
});
