// The payments table's rows (with their client, invoice and refunds), filtered; the CSV export reads the same rows.
import { and, desc, eq, gte, lt, type SQL } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import type { PaymentFilter } from "./schemas";

const { payment, client, invoice, refund } = schema;

export async function listPayments(organizationId: string, filter: PaymentFilter = {}) {
  const conditions: (SQL | undefined)[] = [
    eq(payment.organizationId, organizationId),
    filter.state ? eq(payment.state, filter.state) : undefined,
    filter.purpose ? eq(payment.purpose, filter.purpose) : undefined,
    filter.clientId ? eq(payment.clientId, filter.clientId) : undefined,
    filter.from ? gte(payment.paidAt, new Date(`${filter.from}T00:00:00Z`)) : undefined,
    filter.to ? lt(payment.paidAt, new Date(new Date(`${filter.to}T00:00:00Z`).getTime() + 86_400_000)) : undefined,
  ];
  return db
    .select({ payment, clientName: client.name, invoiceNumber: invoice.number })
    .from(payment)
    .innerJoin(client, eq(client.id, payment.clientId))
    .leftJoin(invoice, eq(invoice.id, payment.invoiceId))
    .where(and(...conditions))
    .orderBy(desc(payment.paidAt))
    .limit(2000);
}
export type PaymentListRow = Awaited<ReturnType<typeof listPayments>>[number];

export function refundsOf(paymentId: string) {
  return db.select().from(refund).where(eq(refund.paymentId, paymentId)).orderBy(desc(refund.createdAt));
}

export async function paymentsOfInvoice(organizationId: string, invoiceId: string) {
  return db.select().from(payment).where(and(eq(payment.organizationId, organizationId), eq(payment.invoiceId, invoiceId))).orderBy(desc(payment.paidAt));
}
