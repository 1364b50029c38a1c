// The attention list's items as the overview shows them: a title, a line saying why, and the record
// it links to. Pure: attention.server.ts reads the rows, this words them.
import { kindLabels } from "~/features/documents/labels";
import type { DocumentKind } from "~/infra/db/schema/documents";
import { formatDate } from "~/lib/dates";

export type AttentionRow = {
  reason: "review" | "inventory-changed" | "certificate-expiring" | "filing-received";
  /** The document (in review, expiring, or the latest issued one of a changed site), or the filing. */
  id: string;
  siteId: string;
  siteName: string;
  kind: string;
  version: number;
  /** Submitted (review), last inventory change (inventory-changed), expiry (certificate-expiring), filed (filing-received). */
  at: Date | string | null;
  /** The document's author (review), the authority a filing is addressed to (filing-received). */
  who?: string | null;
};

export type AttentionItem = { key: string; reason: AttentionRow["reason"]; to: string; title: string; detail: string; at: string | null };
export type AttentionList = { reason: AttentionRow["reason"]; total: number; items: AttentionItem[] };

const DAY = 86_400_000;
const kindLabel = (kind: string) => kindLabels[kind as DocumentKind] ?? kind;
const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export function attentionItem(row: AttentionRow, now: Date): AttentionItem {
  const at = row.at ? new Date(row.at) : null;
  const iso = at ? at.toISOString() : null;
  const documentPath = `/sites/${row.siteId}/documents/${row.id}`;
  const named = `${kindLabel(row.kind)} v${row.version}`;
  switch (row.reason) {
    case "review":
      return {
        key: `review:${row.id}`,
        reason: row.reason,
        to: documentPath,
        title: `${named}, ${row.siteName}`,
        detail: `Waiting for review${row.who ? `, written by ${row.who}` : ""}${at ? `; submitted ${formatDate(at)}` : ""}.`,
        at: iso,
      };
    case "inventory-changed":
      return {
        key: `changed:${row.siteId}`,
        reason: row.reason,
        to: `/sites/${row.siteId}/history`,
        title: row.siteName,
        detail: `Inventory changed${at ? ` on ${formatDate(at)}` : ""}, after the one its issued ${named.toLowerCase()} describes.`,
        at: iso,
      };
    case "certificate-expiring": {
      const days = at ? Math.ceil((at.getTime() - now.getTime()) / DAY) : null;
      const when = !at || days === null ? "Expiry date unknown." : days <= 0 ? `Expired on ${formatDate(at)}; not reissued.` : `Expires on ${formatDate(at)}, in ${plural(days, "day", "days")}.`;
      return { key: `certificate:${row.id}`, reason: row.reason, to: documentPath, title: `${named}, ${row.siteName}`, detail: when, at: iso };
    }
    case "filing-received":
      return {
        key: `filing:${row.id}`,
        reason: row.reason,
        to: `/filings?siteId=${encodeURIComponent(row.siteId)}`,
        title: `${row.siteName}: assessment with its ${named.toLowerCase()}`,
        detail: `Filed${row.who ? ` to ${row.who}` : ""}${at ? ` on ${formatDate(at)}` : ""}; its bundle is in your filings.`,
        at: iso,
      };
  }
}

/** The card's heading line and the empty message, per reason. */
export const attentionWords: Record<AttentionRow["reason"], { title: string; empty: string }> = {
  review: { title: "Waiting for your review", empty: "No document written by someone else waits for review." },
  "inventory-changed": { title: "Sites changed since their issued documents", empty: "No site's inventory has changed since its latest issued document." },
  "certificate-expiring": { title: "Certificates expiring within 60 days", empty: "No issued certificate expires within 60 days." },
  "filing-received": { title: "Filings received in the last 30 days", empty: "Nothing has been filed to you in the last 30 days." },
};
