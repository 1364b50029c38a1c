import { describe, expect, it } from "vitest";
import { attentionItem } from "./attention";

const now = new Date("2026-12-05T12:00:00Z");
const base = { id: "d1", siteId: "s1", siteName: "Harbour <b>Roof</b>", kind: "certificate", version: 2 };

describe("attentionItem", () => {
  it("links a document in review to the document, naming its author", () => {
    const item = attentionItem({ ...base, kind: "report", reason: "review", at: "2026-12-01T09:00:00Z", who: "Ana Engineer" }, now);
    expect(item.to).toBe("/sites/s1/documents/d1");
    expect(item.title).toBe("Report v2, Harbour <b>Roof</b>");
    expect(item.detail).toBe("Waiting for review, written by Ana Engineer; submitted 1 Dec 2026.");
  });

  it("links a changed site to its history", () => {
    const item = attentionItem({ ...base, kind: "letter", reason: "inventory-changed", at: new Date("2026-12-04T10:00:00Z") }, now);
    expect(item).toMatchObject({ key: "changed:s1", to: "/sites/s1/history", title: "Harbour <b>Roof</b>", at: "2026-12-04T10:00:00.000Z" });
    expect(item.detail).toContain("4 Dec 2026");
    expect(item.detail).toContain("landlord letter v2");
  });

  it("counts a certificate's days to expiry, and says when it has already expired", () => {
    expect(attentionItem({ ...base, reason: "certificate-expiring", at: "2027-01-04T12:00:00Z" }, now).detail).toBe("Expires on 4 Jan 2027, in 30 days.");
    expect(attentionItem({ ...base, reason: "certificate-expiring", at: "2026-12-06T11:00:00Z" }, now).detail).toBe("Expires on 6 Dec 2026, in 1 day.");
    expect(attentionItem({ ...base, reason: "certificate-expiring", at: "2026-11-30T00:00:00Z" }, now).detail).toBe("Expired on 30 Nov 2026; not reissued.");
  });

  it("links a filing received to the regulator's inbox for that site, naming the authority", () => {
    const item = attentionItem({ ...base, id: "f1", kind: "report", reason: "filing-received", at: "2026-12-03T08:00:00Z", who: "Spectrum Safety Office" }, now);
    expect(item).toMatchObject({ key: "filing:f1", to: "/filings?siteId=s1", title: "Harbour <b>Roof</b>: assessment with its report v2" });
    expect(item.detail).toBe("Filed to Spectrum Safety Office on 3 Dec 2026; its bundle is in your filings.");
  });
});
