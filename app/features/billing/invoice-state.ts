// An invoice's state from its money: pure, so the webhook, the refund command and the tests agree.
// draft → open (issued) → paid → partly_refunded → refunded; void only from draft or open.
import type { InvoiceState } from "~/infra/db/schema/billing";

export function stateAfterPayment(total: number, paid: number, refunded: number): InvoiceState {
  if (paid <= 0 || paid < total) return "open";
  if (refunded <= 0) return "paid";
  return refunded >= paid ? "refunded" : "partly_refunded";
}

export const invoiceStateLabels: Record<InvoiceState, string> = {
  draft: "Draft",
  open: "Open",
  paid: "Paid",
  partly_refunded: "Partly refunded",
  refunded: "Refunded",
  void: "Void",
};

export const canVoid = (state: InvoiceState) => state === "draft" || state === "open";
export const canPay = (state: InvoiceState) => state === "open";
