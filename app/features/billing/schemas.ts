// The billing forms' rules (Conform + Zod): prices, invoices, refunds, voiding, the payments filter.
import { z } from "zod";
import { priceKinds } from "~/infra/db/schema/billing";
import { identifier, oneOf, recordId, requiredText, text } from "~/lib/fields";
import { currencies, MAX_AMOUNT, parseAmount } from "./money";

/** An amount typed as a decimal ("120", "120.50"), kept as minor units. */
export const amountField = (what: string) =>
  z
    .string({ error: `Enter ${what}.` })
    .trim()
    .min(1, `Enter ${what}.`)
    .max(20, `Enter ${what} as a number such as 120.00.`)
    .transform((s, ctx) => {
      const cents = parseAmount(s);
      if (cents === null || cents <= 0 || cents > MAX_AMOUNT) {
        ctx.addIssue({ code: "custom", message: `Enter ${what} as a number from 0.01 to 1,000,000.00, with at most two decimals.` });
        return z.NEVER;
      }
      return cents;
    });

export const priceSchema = z.object({
  intent: z.literal("save-price"),
  kind: oneOf("a price", priceKinds),
  name: requiredText("the price's name", 120),
  amount: amountField("the amount"),
  active: z.preprocess((v) => v === "on" || v === "true", z.boolean()).default(false),
});
export type PriceInput = z.output<typeof priceSchema>;

export const currencySchema = z.object({
  intent: z.literal("currency"),
  currency: oneOf("a currency", currencies),
});

export const invoiceCreateSchema = z.object({
  clientId: recordId,
  assessmentIds: z.array(recordId).max(50, "Choose at most 50 assessments.").default([]),
  certificates: z.array(recordId).max(50, "Choose at most 50 certificates.").default([]),
  rush: z.preprocess((v) => v === "on" || v === "true", z.boolean()).default(false),
  notes: text(2000).default(""),
});
export type InvoiceCreateInput = z.output<typeof invoiceCreateSchema>;

export const invoiceActionSchema = z.object({ intent: oneOf("an action", ["issue", "void", "resend", "discard"] as const) });

export const refundSchema = z.object({
  intent: z.literal("refund"),
  paymentId: identifier(),
  amount: amountField("the amount to refund"),
  reason: text(300).default(""),
});

/** A calendar day (YYYY-MM-DD) that exists: "2026-13-45" is dropped rather than reaching the query. */
const isoDay = z.string().regex(/^\d{4}-\d{2}-\d{2}$/).refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s));

export const paymentFilterSchema = z.object({
  state: z.enum(["succeeded", "partly_refunded", "refunded"]).optional().catch(undefined),
  purpose: z.enum(["invoice", "certificate"]).optional().catch(undefined),
  clientId: recordId.optional().catch(undefined),
  from: isoDay.optional().catch(undefined),
  to: isoDay.optional().catch(undefined),
});
export type PaymentFilter = z.output<typeof paymentFilterSchema>;
