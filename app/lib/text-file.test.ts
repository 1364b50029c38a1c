import { describe, expect, it } from "vitest";
import { decodeTextFile } from "./text-file";

const text = "unit,value\nµW/cm²,12.5\n";
const utf16le = (s: string, bom = true) => {
  const body = Buffer.from(s, "utf16le");
  return bom ? Buffer.concat([Buffer.from([0xff, 0xfe]), body]) : body;
};
const utf16be = (s: string) => {
  const le = Buffer.from(s, "utf16le");
  const be = Buffer.alloc(le.length);
  for (let i = 0; i < le.length; i += 2) [be[i], be[i + 1]] = [le[i + 1], le[i]];
  return Buffer.concat([Buffer.from([0xfe, 0xff]), be]);
};

describe("decodeTextFile", () => {
  it("reads UTF-8, with and without a byte-order mark (the mark is dropped)", () => {
    expect(decodeTextFile(Buffer.from(text, "utf8"))).toEqual({ text, encoding: "utf-8" });
    expect(decodeTextFile(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(text, "utf8")]))).toEqual({ text, encoding: "utf-8" });
  });

  it("reads UTF-16 in either byte order by its mark, and little-endian without one", () => {
    expect(decodeTextFile(utf16le(text))).toEqual({ text, encoding: "utf-16le" });
    expect(decodeTextFile(utf16be(text))).toEqual({ text, encoding: "utf-16be" });
    expect(decodeTextFile(utf16le(text, false))).toEqual({ text, encoding: "utf-16le" });
  });

  it("reads a Latin-1 file (µ = B5, ² = B2) as Windows-1252 instead of garbling it", () => {
    const latin1 = Buffer.from(text, "latin1");
    expect(latin1.includes(0xb5)).toBe(true);
    expect(decodeTextFile(latin1)).toEqual({ text, encoding: "windows-1252" });
  });

  it("reads an empty file as empty text", () => {
    expect(decodeTextFile(new Uint8Array())).toEqual({ text: "", encoding: "utf-8" });
  });
});
