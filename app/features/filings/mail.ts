// The e-mail a regulator gets when something is filed to it (text and HTML), pure.
import type { DocumentMail } from "~/features/documents/mails";

const escape = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

export function filingMail(to: string, f: { siteName: string; assessmentName: string; authority: string; filerName: string; organizationName: string; url: string }): DocumentMail {
  const body = [
    `${f.filerName} of ${f.organizationName} has filed the RF exposure assessment “${f.assessmentName}” of ${f.siteName} to ${f.authority}.`,
    "Its bundle holds the engine's runs (they re-run to the same bytes), the inventory, the method and the issued report.",
  ];
  return {
    to,
    subject: `Filed to you: ${f.siteName}, ${f.assessmentName}`,
    text: [...body, "", `Open your filings: ${f.url}`, "", "— Isotrope"].join("\n"),
    html: body.map((l) => `<p>${escape(l)}</p>`).join("") + `<p><a href="${escape(f.url)}">Open your filings</a></p><p>— Isotrope</p>`,
  };
}
