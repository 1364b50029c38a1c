// The billing e-mails' words (queued on the documents' mail queue, which retries).
import type { DocumentMail } from "~/features/documents/mails";
import { linkMail } from "~/infra/mail.server";
import { formatMoney } from "./money";

export function invoiceMail(to: string, f: { number: string; clientName: string; total: number; currency: string; payUrl: string; pdfUrl: string; organizationName: string }): DocumentMail {
  const mail = linkMail(
    to,
    `Invoice ${f.number} from ${f.organizationName}: ${formatMoney(f.total, f.currency)}`,
    [`${f.organizationName} has sent ${f.clientName} invoice ${f.number} for ${formatMoney(f.total, f.currency)}.`, "No tax has been computed on this invoice.", "Pay it online by card through the link below (you sign in to your portal first)."],
    [{ label: "Pay the invoice", url: f.payUrl }, { label: "The invoice (PDF)", url: f.pdfUrl }],
  );
  return { ...mail, html: mail.html ?? "" };
}
