import { describe, expect, it } from "vitest";
import { pageSizeOptions, pageWindow, readPaging } from "./paging";

describe("paged lists", () => {
  it("says which rows a page shows", () => {
    expect(pageWindow(3, 1, 25)).toEqual({ pages: 1, pastEnd: false, from: 1, to: 3, text: "1–3 of 3" });
    expect(pageWindow(30, 2, 25)).toEqual({ pages: 2, pastEnd: false, from: 26, to: 30, text: "26–30 of 30" });
    expect(pageWindow(0, 1, 25)).toMatchObject({ pages: 1, pastEnd: false, text: "Nothing to show" });
  });

  it("knows a page past the last one instead of claiming rows 2451–3 of 3", () => {
    expect(pageWindow(3, 99, 25)).toEqual({ pages: 1, pastEnd: true, from: 0, to: 0, text: "3 in all" });
    expect(pageWindow(3, 4, 1)).toMatchObject({ pages: 3, pastEnd: true });
  });

  it("offers the page size from the address when it is not a usual one", () => {
    expect(pageSizeOptions(25)).toEqual([10, 25, 50, 100]);
    expect(pageSizeOptions(readPaging(new URLSearchParams("pageSize=1")).pageSize)).toEqual([1, 10, 25, 50, 100]);
  });
});
