import { describe, expect, it } from "vitest";
import { formatDate, isoDate } from "./dates";

describe("formatDate", () => {
  it("writes day, short month and year, with no leading zero", () => {
    expect(formatDate(new Date(Date.UTC(2026, 11, 2, 9, 30)))).toBe("2 Dec 2026");
    expect(formatDate(new Date(Date.UTC(2027, 1, 12)))).toBe("12 Feb 2027");
  });

  it("spells every month the same way on every machine", () => {
    const names = Array.from({ length: 12 }, (_, m) => formatDate(new Date(Date.UTC(2026, m, 15))).split(" ")[1]);
    expect(names).toEqual(["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"]);
  });

  it("reads the day in UTC, so server and browser agree near midnight", () => {
    expect(formatDate("2026-12-02T23:59:59Z")).toBe("2 Dec 2026");
    expect(formatDate("2026-12-03T00:00:00+01:00")).toBe("2 Dec 2026");
  });

  it("accepts what loaders send: ISO strings and epoch milliseconds", () => {
    expect(formatDate("2026-02-28T12:00:00.000Z")).toBe("28 Feb 2026");
    expect(formatDate(Date.UTC(2024, 1, 29))).toBe("29 Feb 2024");
  });

  it("refuses a value that is not a date rather than printing 'NaN'", () => {
    expect(() => formatDate("not a date")).toThrow(RangeError);
  });
});

describe("isoDate", () => {
  it("gives the calendar date in UTC", () => {
    expect(isoDate(new Date(Date.UTC(2026, 11, 2, 23, 30)))).toBe("2026-12-02");
    expect(isoDate("2026-12-03T00:30:00+02:00")).toBe("2026-12-02");
  });
});
