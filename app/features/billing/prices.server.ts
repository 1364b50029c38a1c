// The price list: one price per kind (assessment fee, certificate fee, rush surcharge), each a
// Stripe Product with one active Price. A changed amount (or currency) makes a new Stripe Price and
// deactivates the old one (Stripe Prices cannot change their amount).
import { and, asc, eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import type { PriceKind } from "~/infra/db/schema/billing";
import { stripe } from "~/infra/stripe.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import type { PriceInput } from "./schemas";
import { billingSettingsOf } from "./settings.server";

const { price } = schema;
export type PriceRow = typeof price.$inferSelect;

export const priceKindLabels: Record<PriceKind, string> = {
  assessment_fee: "Assessment fee",
  certificate_fee: "Certificate fee",
  rush_surcharge: "Rush surcharge",
};

export function listPrices(organizationId: string) {
  return db.select().from(price).where(eq(price.organizationId, organizationId)).orderBy(asc(price.kind));
}

export async function activePrice(organizationId: string, kind: PriceKind) {
  const [row] = await db.select().from(price).where(and(eq(price.organizationId, organizationId), eq(price.kind, kind), eq(price.active, true)));
  return row ?? null;
}

/** Creates or changes the organisation's price of a kind, in Stripe first, then here with its audit row. */
export async function savePrice(actor: Actor, input: Omit<PriceInput, "intent">) {
  const settings = await billingSettingsOf(actor.organizationId);
  const currency = settings.currency;
  const [existing] = await db.select().from(price).where(and(eq(price.organizationId, actor.organizationId), eq(price.kind, input.kind)));
  let productId = existing?.stripeProductId ?? null;
  let priceId = existing?.stripePriceId ?? null;
  try {
    if (!productId) {
      const product = await stripe.products.create({ name: input.name, active: input.active, metadata: { organizationId: actor.organizationId, kind: input.kind } });
      productId = product.id;
    } else if (existing && (existing.name !== input.name || existing.active !== input.active)) {
      await stripe.products.update(productId, { name: input.name, active: input.active });
    }
    if (!priceId || !existing || existing.amount !== input.amount || existing.currency !== currency) {
      const created = await stripe.prices.create({ product: productId, unit_amount: input.amount, currency, metadata: { organizationId: actor.organizationId, kind: input.kind } });
      if (priceId) await stripe.prices.update(priceId, { active: false });
      priceId = created.id;
    }
  } catch (error) {
    console.error("[billing] Stripe price sync failed:", error instanceof Error ? error.message : error);
    throw new DomainError("The payment service did not accept the price; nothing was changed. Try again in a moment.", 502);
  }
  const values = { name: input.name, amount: input.amount, currency, active: input.active, stripeProductId: productId, stripePriceId: priceId, updatedAt: new Date() };
  return db.transaction(async (tx) => {
    const [row] = existing
      ? await tx.update(price).set(values).where(eq(price.id, existing.id)).returning()
      : await tx.insert(price).values({ organizationId: actor.organizationId, kind: input.kind, ...values }).returning();
    const shape = (p: PriceRow | undefined) => (p ? { kind: p.kind, name: p.name, amount: p.amount, currency: p.currency, active: p.active } : null);
    await auditChange(tx, actor, { action: existing ? "price.updated" : "price.created", entity: "price", entityId: row.id, before: shape(existing), after: shape(row) });
    return row;
  });
}

/** Changes the organisation's currency; refused once any invoice or payment exists in the old one. */
export async function setCurrency(actor: Actor, currency: string) {
  const settings = await billingSettingsOf(actor.organizationId);
  if (settings.currency === currency) return;
  const [used] = await db.select({ id: schema.invoice.id }).from(schema.invoice).where(eq(schema.invoice.organizationId, actor.organizationId)).limit(1);
  if (used) throw new DomainError("The currency cannot change once invoices exist.", 409, "currency");
  await db.transaction(async (tx) => {
    await tx.update(schema.billingSettings).set({ currency, updatedAt: new Date() }).where(eq(schema.billingSettings.organizationId, actor.organizationId));
    await auditChange(tx, actor, { action: "billing.currency", entity: "organization", entityId: actor.organizationId, before: { currency: settings.currency }, after: { currency } });
  });
}
