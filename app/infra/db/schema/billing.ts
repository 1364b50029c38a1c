// Billing (issue 10): the price list (synced to Stripe Products and Prices), invoices numbered
// without gaps per organisation, the Checkout Sessions we open, the payments and refunds that the
// webhook mirrors from Stripe, and every Stripe event stored once by its id. Money is integer minor
// units (cents) in the organisation's currency (billing_settings.currency, "eur" unless changed).
import { boolean, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";
import { organization, user } from "./auth";
import { assessment } from "./assessments";
import { client } from "./clients";
import { createdAt, id, updatedAt } from "./columns";
import { document } from "./documents";
import { site } from "./sites";

/** One row per organisation: its currency and the invoice number counter (locked FOR UPDATE when an invoice is issued). */
export const billingSettings = pgTable("billing_settings", {
  organizationId: text("organization_id").primaryKey().references(() => organization.id, { onDelete: "cascade" }),
  currency: text("currency").notNull().default("eur"),
  /** The last invoice number issued; the next is this + 1, taken in the issuing transaction. */
  lastInvoiceNumber: integer("last_invoice_number").notNull().default(0),
  updatedAt: updatedAt(),
});

export const priceKinds = ["assessment_fee", "certificate_fee", "rush_surcharge"] as const;
export type PriceKind = (typeof priceKinds)[number];

export const price = pgTable(
  "price",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    kind: text("kind").$type<PriceKind>().notNull(),
    name: text("name").notNull(),
    /** Minor units (cents). */
    amount: integer("amount").notNull(),
    currency: text("currency").notNull(),
    active: boolean("active").notNull().default(true),
    stripeProductId: text("stripe_product_id"),
    stripePriceId: text("stripe_price_id"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("price_org_kind_idx").on(t.organizationId, t.kind)],
);

export const invoiceStates = ["draft", "open", "paid", "partly_refunded", "refunded", "void"] as const;
export type InvoiceState = (typeof invoiceStates)[number];

export const invoice = pgTable(
  "invoice",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    clientId: text("client_id").notNull().references(() => client.id, { onDelete: "cascade" }),
    /** Given when issued, from billing_settings.last_invoice_number + 1: no gaps per organisation. */
    number: integer("number"),
    state: text("state").$type<InvoiceState>().notNull().default("draft"),
    currency: text("currency").notNull(),
    total: integer("total").notNull().default(0),
    amountPaid: integer("amount_paid").notNull().default(0),
    amountRefunded: integer("amount_refunded").notNull().default(0),
    notes: text("notes").notNull().default(""),
    createdByUserId: text("created_by_user_id").references(() => user.id, { onDelete: "set null" }),
    issuedAt: timestamp("issued_at", { withTimezone: true }),
    paidAt: timestamp("paid_at", { withTimezone: true }),
    voidedAt: timestamp("voided_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("invoice_org_number_idx").on(t.organizationId, t.number), index("invoice_client_idx").on(t.clientId, t.createdAt)],
);

export const invoiceLine = pgTable(
  "invoice_line",
  {
    id: id(),
    invoiceId: text("invoice_id").notNull().references(() => invoice.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    description: text("description").notNull(),
    priceId: text("price_id").references(() => price.id, { onDelete: "set null" }),
    assessmentId: text("assessment_id").references(() => assessment.id, { onDelete: "set null" }),
    quantity: integer("quantity").notNull().default(1),
    unitAmount: integer("unit_amount").notNull(),
    amount: integer("amount").notNull(),
  },
  (t) => [index("invoice_line_invoice_idx").on(t.invoiceId, t.position)],
);

export const checkoutPurposes = ["invoice", "certificate"] as const;
export type CheckoutPurpose = (typeof checkoutPurposes)[number];
export const checkoutStates = ["open", "paid", "expired", "failed"] as const;
export type CheckoutState = (typeof checkoutStates)[number];

/** A Checkout Session we opened: what it pays for and how it ended (from the webhook). */
export const checkout = pgTable(
  "checkout",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    clientId: text("client_id").notNull().references(() => client.id, { onDelete: "cascade" }),
    purpose: text("purpose").$type<CheckoutPurpose>().notNull(),
    invoiceId: text("invoice_id").references(() => invoice.id, { onDelete: "cascade" }),
    siteId: text("site_id").references(() => site.id, { onDelete: "cascade" }),
    assessmentId: text("assessment_id").references(() => assessment.id, { onDelete: "cascade" }),
    /** The certificate issued on payment. */
    documentId: text("document_id").references(() => document.id, { onDelete: "set null" }),
    amount: integer("amount").notNull(),
    currency: text("currency").notNull(),
    stripeSessionId: text("stripe_session_id"),
    state: text("state").$type<CheckoutState>().notNull().default("open"),
    failureMessage: text("failure_message"),
    createdByUserId: text("created_by_user_id").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("checkout_session_idx").on(t.stripeSessionId), index("checkout_org_idx").on(t.organizationId, t.createdAt)],
);

export const paymentStates = ["succeeded", "partly_refunded", "refunded"] as const;
export type PaymentState = (typeof paymentStates)[number];

export const payment = pgTable(
  "payment",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    clientId: text("client_id").notNull().references(() => client.id, { onDelete: "cascade" }),
    checkoutId: text("checkout_id").notNull().references(() => checkout.id, { onDelete: "cascade" }),
    purpose: text("purpose").$type<CheckoutPurpose>().notNull(),
    invoiceId: text("invoice_id").references(() => invoice.id, { onDelete: "set null" }),
    stripePaymentIntentId: text("stripe_payment_intent_id").notNull(),
    amount: integer("amount").notNull(),
    amountRefunded: integer("amount_refunded").notNull().default(0),
    currency: text("currency").notNull(),
    state: text("state").$type<PaymentState>().notNull().default("succeeded"),
    paidAt: timestamp("paid_at", { withTimezone: true }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("payment_intent_idx").on(t.stripePaymentIntentId), uniqueIndex("payment_checkout_idx").on(t.checkoutId), index("payment_org_idx").on(t.organizationId, t.paidAt)],
);

export const refund = pgTable(
  "refund",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    paymentId: text("payment_id").notNull().references(() => payment.id, { onDelete: "cascade" }),
    stripeRefundId: text("stripe_refund_id").notNull(),
    amount: integer("amount").notNull(),
    reason: text("reason").notNull().default(""),
    createdByUserId: text("created_by_user_id").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("refund_stripe_idx").on(t.stripeRefundId), index("refund_payment_idx").on(t.paymentId)],
);

export const stripeEventOutcomes = ["applied", "ignored", "waiting"] as const;
export type StripeEventOutcome = (typeof stripeEventOutcomes)[number];

/** Every verified Stripe event, once (its id is the key): a replay finds it and changes nothing. */
export const stripeEvent = pgTable(
  "stripe_event",
  {
    id: text("id").primaryKey(),
    type: text("type").notNull(),
    /** applied; ignored (a type we do not handle, or not ours); waiting (for a record that has not arrived yet). */
    outcome: text("outcome").$type<StripeEventOutcome>().notNull(),
    note: text("note").notNull().default(""),
    /** The payment intent it concerns (for events waiting on their payment). */
    paymentIntentId: text("payment_intent_id"),
    payload: jsonb("payload").$type<Record<string, unknown>>().notNull(),
    receivedAt: createdAt(),
    appliedAt: timestamp("applied_at", { withTimezone: true }),
  },
  (t) => [index("stripe_event_waiting_idx").on(t.paymentIntentId, t.outcome)],
);
