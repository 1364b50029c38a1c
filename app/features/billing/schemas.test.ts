// The payments filter drops what is not a real day or a known value instead of failing (common practice, no source).
import { describe, expect, it } from "vitest";
import { paymentFilterSchema, refundSchema } from "./schemas";

describe("billing schemas", () => {
  it("keeps real days and known values, drops the rest", () => {
    expect(paymentFilterSchema.parse({ from: "2026-11-01", to: "2026-02-30", state: "refunded", purpose: "gift" })).toEqual({ from: "2026-11-01", to: undefined, state: "refunded", purpose: undefined, clientId: undefined });
    expect(paymentFilterSchema.parse({ from: "2026-13-45" }).from).toBeUndefined();
  });
  it("reads a refund amount in cents and refuses zero or three decimals", () => {
    expect(refundSchema.parse({ intent: "refund", paymentId: "p1", amount: "225.00" }).amount).toBe(22500);
    expect(refundSchema.safeParse({ intent: "refund", paymentId: "p1", amount: "0" }).success).toBe(false);
    expect(refundSchema.safeParse({ intent: "refund", paymentId: "p1", amount: "1.005" }).success).toBe(false);
  });
});
