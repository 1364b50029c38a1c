// Invoices and payments as the JSON API returns them (GET /api/v1/invoices, /api/v1/payments), and
// the payments CSV's columns (the same fields). Amounts are integer minor units with their currency.
import Papa from "papaparse";
import type { InvoiceState, PaymentState, CheckoutPurpose } from "~/infra/db/schema/billing";
import { decimalOf } from "./money";

type InvoiceLike = { id: string; number: number | null; clientId: string; state: InvoiceState; currency: string; total: number; amountPaid: number; amountRefunded: number; issuedAt: Date | null; paidAt: Date | null; voidedAt: Date | null; createdAt: Date };
type PaymentLike = { id: string; clientId: string; purpose: CheckoutPurpose; invoiceId: string | null; amount: number; amountRefunded: number; currency: string; state: PaymentState; paidAt: Date; stripePaymentIntentId: string };

const iso = (d: Date | null) => (d ? d.toISOString() : null);
export const invoiceNumberOf = (n: number | null) => (n === null ? null : `INV-${String(n).padStart(5, "0")}`);
/** "INV-00012", or "draft" before the invoice is issued. */
export const invoiceNumberText = (n: number | null) => invoiceNumberOf(n) ?? "draft";

export function invoiceJson(i: InvoiceLike, clientName: string) {
  return { id: i.id, number: invoiceNumberOf(i.number), clientId: i.clientId, clientName, state: i.state, currency: i.currency, total: i.total, amountPaid: i.amountPaid, amountRefunded: i.amountRefunded, issuedAt: iso(i.issuedAt), paidAt: iso(i.paidAt), voidedAt: iso(i.voidedAt), createdAt: iso(i.createdAt) };
}

export function paymentJson(p: PaymentLike, clientName: string, invoiceNumber: number | null) {
  return { id: p.id, clientId: p.clientId, clientName, purpose: p.purpose, invoiceId: p.invoiceId, invoiceNumber: invoiceNumberOf(invoiceNumber), amount: p.amount, amountRefunded: p.amountRefunded, currency: p.currency, state: p.state, paidAt: iso(p.paidAt), stripePaymentIntentId: p.stripePaymentIntentId };
}

export const paymentCsvColumns = ["paid_at", "client", "purpose", "invoice", "currency", "amount", "refunded", "state", "payment_intent"] as const;

/** The payments CSV (README "Payments CSV"): one row per payment, amounts as decimals. */
export function paymentsCsv(rows: ReturnType<typeof paymentJson>[]) {
  return Papa.unparse({
    fields: [...paymentCsvColumns],
    data: rows.map((r) => [r.paidAt, r.clientName, r.purpose, r.invoiceNumber ?? "", r.currency.toUpperCase(), decimalOf(r.amount), decimalOf(r.amountRefunded), r.state, r.stripePaymentIntentId]),
  }, { escapeFormulae: true });
}
