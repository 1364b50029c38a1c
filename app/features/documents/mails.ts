// The e-mails each lifecycle step sends (text and HTML), pure. Issued letters and certificates
// travel as attachments; reports are linked (they are larger and staff-only).
import { documentTitles } from "./pdf/source";
import type { DocumentKind } from "~/infra/db/schema/documents";

export type DocumentMail = { to: string; subject: string; text: string; html: string; attachDocumentId?: string; attachName?: string };
export type MailEvent = "submitted" | "returned" | "issued" | "withdrawn";
type Facts = { kind: DocumentKind; version: number; siteName: string; url: string; actorName: string; reason?: string; forClient?: boolean; portalUrl?: string };

const escape = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

export function documentMail(event: MailEvent, to: string, f: Facts): Omit<DocumentMail, "attachDocumentId" | "attachName"> {
  const title = `${documentTitles[f.kind]} for ${f.siteName}, version ${f.version}`;
  const lines: Record<MailEvent, string[]> = {
    submitted: [`${f.actorName} has sent the ${title} for review.`, "Review it and issue it, or return it with your comments. You cannot issue a document you wrote yourself."],
    returned: [`${f.actorName} has returned the ${title} to draft for changes.`],
    issued: f.forClient
      ? [`${f.actorName} has issued the ${title}.`, f.kind === "report" ? "Open it with the link below." : "It is attached to this e-mail, and you can download it with the link below."]
      : [`${f.actorName} has issued the ${title}. Its PDF is now fixed; a change needs a reissue.`],
    withdrawn: [`${f.actorName} has withdrawn the ${title}.`, `Reason: ${f.reason ?? ""}`, "Do not rely on it any more."],
  };
  const subjects: Record<MailEvent, string> = { submitted: "Ready for review", returned: "Returned to draft", issued: "Issued", withdrawn: "Withdrawn" };
  const body = lines[event];
  const portal = f.portalUrl ? { text: ["", `The site's status and every issued document: ${f.portalUrl}`], html: `<p><a href="${escape(f.portalUrl)}">The site's status and every issued document</a></p>` } : { text: [], html: "" };
  const text = [...body, "", `Open it: ${f.url}`, ...portal.text, "", "— Isotrope"].join("\n");
  const html = body.map((l) => `<p>${escape(l)}</p>`).join("") + `<p><a href="${escape(f.url)}">Open the document</a></p>${portal.html}<p>— Isotrope</p>`;
  return { to, subject: `${subjects[event]}: ${title}`, text, html };
}
