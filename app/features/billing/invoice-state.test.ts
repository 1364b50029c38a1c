// Invoice states from amounts: our own rules (issue 10 §4), common practice, no source.
import { describe, expect, it } from "vitest";
import { canPay, canVoid, stateAfterPayment } from "./invoice-state";

describe("invoice state", () => {
  it("follows payments and refunds", () => {
    expect(stateAfterPayment(10000, 0, 0)).toBe("open");
    expect(stateAfterPayment(10000, 10000, 0)).toBe("paid");
    expect(stateAfterPayment(10000, 10000, 5000)).toBe("partly_refunded");
    expect(stateAfterPayment(10000, 10000, 10000)).toBe("refunded");
  });
  it("voids and pays only open invoices (void also drafts)", () => {
    expect(canVoid("open")).toBe(true);
    expect(canVoid("draft")).toBe(true);
    expect(canVoid("paid")).toBe(false);
    expect(canPay("open")).toBe(true);
    expect(canPay("void")).toBe(false);
  });
});
