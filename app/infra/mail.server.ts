// Outgoing e-mail through nodemailer; locally the SMTP server is maildev on loopback.
import nodemailer from "nodemailer";
import { env } from "~/infra/env.server";

const transport = nodemailer.createTransport(env.SMTP_URL);

export type Mail = { to: string; subject: string; text: string; html?: string };

export async function sendMail(mail: Mail) {
  await transport.sendMail({ from: env.MAIL_FROM, ...mail });
}

/** A plain message with one call to action, as text and as simple HTML. */
export function linkMail(to: string, subject: string, lines: string[], action: { label: string; url: string }): Mail {
  const text = [...lines, "", `${action.label}: ${action.url}`, "", "— Isotrope"].join("\n");
  const escape = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");
  const html =
    lines.map((l) => `<p>${escape(l)}</p>`).join("") +
    `<p><a href="${escape(action.url)}">${escape(action.label)}</a></p><p>— Isotrope</p>`;
  return { to, subject, text, html };
}
