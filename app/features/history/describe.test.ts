import { describe, expect, it } from "vitest";
import { changeRows, describeAction, showValue } from "./describe";

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
});
