// The map's colour field image: a valid PNG (decoded here with Node's zlib, not our encoder), one
// pixel per grid node, north row first, each pixel the band of its value. PNG layout: ISO/IEC
// 15948:2004 (PNG), §11.2 (IHDR, PLTE, tRNS, IDAT); zlib stream: RFC 1950, stored blocks RFC 1951 §3.2.4.
import { inflateSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { colourOf } from "./colour-scale";
import { fieldImage, LEVELS, levelIndex, paletteColour } from "./field-image";

const decode = (href: string) => {
  const png = Buffer.from(href.replace(/^data:image\/png;base64,/, ""), "base64");
  expect([...png.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  const chunks: Record<string, Buffer> = {};
  for (let at = 8; at < png.length; ) {
    const len = png.readUInt32BE(at);
    chunks[png.subarray(at + 4, at + 8).toString("latin1")] = png.subarray(at + 8, at + 8 + len);
    at += 12 + len;
  }
  return { width: chunks.IHDR.readUInt32BE(0), height: chunks.IHDR.readUInt32BE(4), type: chunks.IHDR[9], pixels: inflateSync(chunks.IDAT), plte: chunks.PLTE };
};

describe("levelIndex", () => {
  it("is 0 below 1 %, rises along the log axis, and holds the last level from 1000 % up", () => {
    expect(levelIndex(0)).toBe(0);
    expect(levelIndex(0.99)).toBe(0);
    expect(levelIndex(Number.NaN)).toBe(0);
    expect(levelIndex(1)).toBe(1);
    // 10 % is a third of the way along 1 %–1000 % on a log axis.
    expect(levelIndex(10)).toBe(1 + Math.floor(LEVELS / 3));
    expect(levelIndex(999)).toBe(LEVELS);
    expect(levelIndex(1e6)).toBe(LEVELS);
    for (let v = 1; v < 1000; v *= 1.1) expect(levelIndex(v * 1.1)).toBeGreaterThanOrEqual(levelIndex(v));
  });

  it("colours each level as the map's scale does at the level's middle", () => {
    const hex = (c: [number, number, number]) => `#${c.map((v) => v.toString(16).padStart(2, "0")).join("")}`;
    expect(hex(paletteColour(levelIndex(10)))).toBe(colourOf(10 ** ((Math.floor(LEVELS / 3) + 0.5) * (3 / LEVELS))));
  });
});

describe("fieldImage", () => {
  it("encodes one indexed pixel per node, north row first, placed with pixel centres on the nodes", () => {
    const g = { nx: 3, ny: 2, x0: 10, y0: 20, step: 0.5 };
    // Row j = 0 (south): 0.5 %, 1 %, 2000 %; row j = 1 (north): 5 %, 50 %, 500 %.
    const values = [0.5, 1, 2000, 5, 50, 500];
    const img = fieldImage(g, values);
    expect(img).toMatchObject({ x: 9.75, y: 19.75, width: 1.5, height: 1 });
    const { width, height, type, pixels, plte } = decode(img.href);
    expect([width, height, type]).toEqual([3, 2, 3]);
    expect(plte.length).toBe(3 * (LEVELS + 1));
    expect([...plte.subarray(0, 3)]).toEqual([...plte.subarray(3, 6)]); // below the scale: the first step's colour (the map clips it away at the 1 % contour)
    expect([...pixels]).toEqual([0, levelIndex(5), levelIndex(50), levelIndex(500), 0, levelIndex(0.5), levelIndex(1), levelIndex(2000)]);
  });

  it("splits large grids into stored blocks that zlib reads back whole", () => {
    const g = { nx: 400, ny: 300, x0: 0, y0: 0, step: 0.1 };
    const values = Array.from({ length: 400 * 300 }, (_, k) => (k % 997) + 0.5);
    const { pixels } = decode(fieldImage(g, values).href);
    expect(pixels.length).toBe(401 * 300);
    expect(pixels[1 + 5]).toBe(levelIndex(values[299 * 400 + 5]));
  });

  it("gives the same string every time (the server's markup equals the browser's)", () => {
    const g = { nx: 4, ny: 4, x0: 0, y0: 0, step: 1 };
    const v = Array.from({ length: 16 }, (_, k) => k * 10);
    expect(fieldImage(g, v).href).toBe(fieldImage(g, v).href);
  });
});
