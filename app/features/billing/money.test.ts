// Minor-unit arithmetic: common practice, no source (amounts are integers, two decimals).
import { describe, expect, it } from "vitest";
import { decimalOf, formatMoney, parseAmount } from "./money";

describe("money", () => {
  it("reads amounts with up to two decimals into cents", () => {
    expect(parseAmount("12")).toBe(1200);
    expect(parseAmount("12.5")).toBe(1250);
    expect(parseAmount(" 1,234.05 ")).toBe(123405);
    expect(parseAmount("0.01")).toBe(1);
  });
  it("refuses what is not an amount", () => {
    for (const bad of ["", "-1", "1.234", "abc", "1e3", "12.", ".5"]) expect(parseAmount(bad)).toBeNull();
  });
  it("writes cents back as a decimal and as money", () => {
    expect(decimalOf(123405)).toBe("1234.05");
    expect(decimalOf(7)).toBe("0.07");
    expect(formatMoney(123405, "eur")).toBe("€1,234.05");
    expect(formatMoney(50, "usd")).toBe("US$0.50");
  });
});
