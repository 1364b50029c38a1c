// The billing pages' own tabs (invoices, payments, prices) and the invoice state tag.
import { NavLink } from "react-router";
import type { InvoiceState } from "~/infra/db/schema/billing";
import { invoiceStateLabels } from "./invoice-state";

const tabs = [
  { to: "/billing", label: "Invoices" },
  { to: "/billing/payments", label: "Payments" },
  { to: "/billing/prices", label: "Prices" },
];

export function BillingTabs() {
  return (
    <nav aria-label="Billing" className="mb-6 flex gap-1 border-b border-rule">
      {tabs.map((t) => (
        <NavLink key={t.to} to={t.to} end className={({ isActive }) => `px-3 py-2 text-sm ${isActive ? "font-bold text-ink-900 shadow-[inset_0_-3px_0_var(--color-flag-600)]" : "text-graphite-600 hover:text-ink-900"}`}>
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}

const tone: Record<InvoiceState, string> = {
  draft: "border-rule-strong text-graphite-600",
  open: "border-ink-900 text-ink-900",
  paid: "border-ok-700 bg-ok-100 text-ok-700",
  partly_refunded: "border-caution-700 bg-caution-100 text-caution-700",
  refunded: "border-caution-700 bg-caution-100 text-caution-700",
  void: "border-rule-strong bg-paper-deep text-graphite-600",
};

export function InvoiceStateTag({ state }: { state: InvoiceState }) {
  return <span className={`inline-block rounded-control border px-2 py-0.5 text-xs font-medium ${tone[state]}`}>{invoiceStateLabels[state]}</span>;
}

/** A form reply's messages (Conform's submission result), for the plain forms of these pages. */
export function replyErrors(reply: unknown): { form: string[]; fields: Record<string, string[]> } {
  const r = reply as { error?: Record<string, string[] | null> } | undefined;
  const fields: Record<string, string[]> = {};
  let form: string[] = [];
  for (const [k, v] of Object.entries(r?.error ?? {})) {
    if (!v) continue;
    if (k === "") form = v;
    else fields[k] = v;
  }
  return { form, fields };
}
