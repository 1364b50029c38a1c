import { describe, expect, it } from "vitest";
import { changeRows, describeAction, recordLabel, showValue } from "./describe";

describe("history in words", () => {
  it("names the action and the record", () => {
    expect(describeAction("emitter.updated", "emitter", "A1")).toBe("changed emitter A1");
    expect(describeAction("site.created", "site")).toBe("added site");
  });

  it("shows values as people read them", () => {
    expect(showValue(0.10007052427754304)).toBe("0.100071");
    expect(showValue(12)).toBe("12");
    expect(showValue("uW/cm2")).toBe("µW/cm²");
    expect(showValue(null)).toBe("—");
    expect(showValue(true)).toBe("yes");
    expect(showValue([[0, 0], [1.5, 2]])).toBe("(0, 0) (1.5, 2)");
  });

  it("lists only the fields that changed, with their labels", () => {
    expect(changeRows({ id: "x", frequencyMHz: 1900, label: "A1" }, { id: "x", frequencyMHz: 2100, label: "A1" })).toEqual([
      { field: "Frequency (MHz)", before: "1900", after: "2100" },
    ]);
  });

  it("names the records a change points at, and hides internal links", () => {
    const rows = changeRows(null, { name: "Tower", clientId: "c1", patternId: "p-gone", fileId: "f1", visitId: "v1" }, { c1: "Larch & Co" });
    expect(rows).toEqual([
      { field: "Name", before: "", after: "Tower" },
      { field: "Client", before: "", after: "Larch & Co" },
      { field: "Pattern", before: "", after: "a removed record" },
    ]);
  });

  it("shows a document's step as a change of state only, named by its kind and version", () => {
    // The document commands record { state } before and { kind, version, state } after.
    const before = { state: "in_review" };
    const after = { kind: "report", state: "issued", version: 2 };
    expect(changeRows(before, after)).toEqual([{ field: "State", before: "in review", after: "issued" }]);
    expect(recordLabel(after)).toBe("report v2");
    expect(recordLabel({ kind: "letter", version: 1 })).toBe("landlord letter v1");
    expect(recordLabel({ name: "Tower", kind: "rooftop", version: 3 })).toBe("Tower");
  });

  it("words an assessment's options and hides other records' ids", () => {
    const rows = changeRows(null, { mode: "average", standard: "fcc", tier: "general", heights: { toM: 2, count: 11, fromM: 0 }, gridStepM: 0.5, assessmentId: "30ef3867-6f79-4644-93e0-6a9f2db31ebc", replaces: "3ce2ea1a" });
    expect(rows).toEqual([
      { field: "Evaluation", before: "", after: "spatial average" },
      { field: "Standard", before: "", after: "FCC 47 CFR §1.1310" },
      { field: "Tier", before: "", after: "general public / uncontrolled" },
      { field: "Heights above each surface", before: "", after: "0–2 m, 11 heights" },
      { field: "Grid step (m)", before: "", after: "0.5" },
    ]);
  });

  it("shows billing amounts as money, not as cents", () => {
    // payment.received and payment.refunded events (payment-events.server.ts, refunds.server.ts).
    expect(changeRows(null, { amount: 60000, currency: "eur", purpose: "invoice", invoiceId: "b061be14" })).toEqual([
      { field: "Amount", before: "", after: "€600.00" },
      { field: "Currency", before: "", after: "EUR" },
      { field: "For", before: "", after: "invoice" },
    ]);
    expect(changeRows({ amountRefunded: 0, currency: "gbp" }, { amountRefunded: 30000, refund: 30000, currency: "gbp" })).toEqual([
      { field: "Refunded in all", before: "£0.00", after: "£300.00" },
      { field: "Refunded now", before: "—", after: "£300.00" },
    ]);
    // An older event without its currency still reads as an amount, not as 30000.
    expect(changeRows({ amountRefunded: 0 }, { amountRefunded: 30000, reason: "" })).toEqual([{ field: "Refunded in all", before: "0.00", after: "300.00" }]);
  });
});
