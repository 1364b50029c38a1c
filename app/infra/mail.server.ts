// Outgoing e-mail through nodemailer; locally the SMTP server is maildev on loopback.
import nodemailer from "nodemailer";
import { env } from "~/infra/env.server";

const transport = nodemailer.createTransport(env.SMTP_URL);

export type Mail = { to: string; subject: string; text: string; html?: string; attachments?: { filename: string; content: Buffer; contentType: string }[] };

export async function sendMail(mail: Mail) {
  await transport.sendMail({ from: env.MAIL_FROM, ...mail });
}

/**
 * Sends without keeping the request waiting: for answers that must not depend on whether a
 * mail went out (sign-up with a taken address, password reset). A failure is logged, not thrown.
 */
export function sendLater(mail: Mail) {
  sendMail(mail).catch((error: unknown) => {
    console.error(`[mail] sending "${mail.subject}" failed:`, error instanceof Error ? error.message : error);
  });
}

type Action = { label: string; url: string };

/** A plain message with one or more calls to action, as text and as simple HTML. */
export function linkMail(to: string, subject: string, lines: string[], actions: Action | Action[]): Mail {
  const list = Array.isArray(actions) ? actions : [actions];
  const text = [...lines, "", ...list.map((a) => `${a.label}: ${a.url}`), "", "— Isotrope"].join("\n");
  const escape = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
  const html =
    lines.map((l) => `<p>${escape(l)}</p>`).join("") +
    list.map((a) => `<p><a href="${escape(a.url)}">${escape(a.label)}</a></p>`).join("") +
    "<p>— Isotrope</p>";
  return { to, subject, text, html };
}
