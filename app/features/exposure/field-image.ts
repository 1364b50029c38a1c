// The map's colour field as one small image instead of a filled SVG path per colour band: each
// grid node becomes one pixel of an indexed PNG whose 255 colours step along the map's scale (log
// axis, 1 % to 1000 %, reversed viridis, as the legend; below 1 % the 1 % colour, for the map clips
// the image to the smoothed 1 % contour, so the unfilled area has the contour's edge, not the
// cells' staircase), placed so that
// pixel centres sit on the grid's nodes, and scaled up smoothly by the browser, so the colour runs
// on continuously between nodes. Drawing 25 band outlines through marching squares took most of a
// what-if redraw; this takes a few milliseconds. Pure and deterministic (uncompressed deflate, our
// own base64), so the server's markup and the browser's first render are the same string.
import { colourOf, scalePosition, SCALE_MAX_PERCENT, SCALE_MIN_PERCENT } from "./colour-scale";
import type { GridGeometry } from "./contours";

/** Colour steps along the scale (an indexed PNG holds 256 colours; index 0 is "below the scale", drawn as the first step and clipped away). */
export const LEVELS = 255;
const STEPS: [number, number, number][] = Array.from({ length: LEVELS }, (_, k) => rgb(colourOf(SCALE_MIN_PERCENT * (SCALE_MAX_PERCENT / SCALE_MIN_PERCENT) ** ((k + 0.5) / LEVELS))!));
const PALETTE: [number, number, number][] = [STEPS[0], ...STEPS];

function rgb(colour: string): [number, number, number] {
  const hex = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(colour);
  if (hex) return [parseInt(hex[1], 16), parseInt(hex[2], 16), parseInt(hex[3], 16)];
  const m = /rgb\((\d+),\s*(\d+),\s*(\d+)\)/.exec(colour);
  if (!m) throw new Error(`Unexpected colour ${colour}`);
  return [Number(m[1]), Number(m[2]), Number(m[3])];
}

/** Palette index of a value: 0 below the scale (transparent), else 1 … LEVELS along the log axis (the last holds everything from 1000 % up). */
export function levelIndex(percent: number): number {
  if (!(percent >= SCALE_MIN_PERCENT)) return 0;
  return Math.min(LEVELS, 1 + Math.floor(scalePosition(percent) * LEVELS));
}

/** The colour (r, g, b) of a palette index, for tests and the legend. */
export const paletteColour = (index: number) => PALETTE[index];

export type FieldImage = { href: string; x: number; y: number; width: number; height: number };

/** The image of a grid's values (row-major, j·nx + i, y north) and where it goes in site metres (x, y: its south-west corner). */
export function fieldImage(g: GridGeometry, values: ArrayLike<number>): FieldImage {
  const { nx, ny } = g;
  const raw = new Uint8Array((nx + 1) * ny);
  for (let row = 0; row < ny; row++) {
    const j = ny - 1 - row; // PNG rows run top (north) to bottom
    const o = row * (nx + 1); // filter byte 0, then the row
    for (let i = 0; i < nx; i++) raw[o + 1 + i] = levelIndex(values[j * nx + i]);
  }
  const png = encodePng(nx, ny, raw);
  return { href: `data:image/png;base64,${base64(png)}`, x: g.x0 - g.step / 2, y: g.y0 - g.step / 2, width: nx * g.step, height: ny * g.step };
}

function encodePng(width: number, height: number, raw: Uint8Array): Uint8Array {
  const ihdr = new Uint8Array(13);
  const dv = new DataView(ihdr.buffer);
  dv.setUint32(0, width);
  dv.setUint32(4, height);
  ihdr.set([8, 3, 0, 0, 0], 8); // 8-bit, indexed colour
  const plte = Uint8Array.from(PALETTE.flat());
  const chunks = [chunk("IHDR", ihdr), chunk("PLTE", plte), chunk("IDAT", zlibStored(raw)), chunk("IEND", new Uint8Array(0))];
  const out = new Uint8Array(8 + chunks.reduce((s, c) => s + c.length, 0));
  out.set([137, 80, 78, 71, 13, 10, 26, 10]);
  let at = 8;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}

/** A zlib stream of stored (uncompressed) deflate blocks: the page's transfer is compressed anyway. */
function zlibStored(data: Uint8Array): Uint8Array {
  const blocks = Math.max(1, Math.ceil(data.length / 65535));
  const out = new Uint8Array(2 + blocks * 5 + data.length + 4);
  out[0] = 0x78;
  out[1] = 0x01;
  let at = 2;
  for (let b = 0; b < blocks; b++) {
    const part = data.subarray(b * 65535, Math.min(data.length, (b + 1) * 65535));
    out[at] = b === blocks - 1 ? 1 : 0;
    out[at + 1] = part.length & 0xff;
    out[at + 2] = part.length >> 8;
    out[at + 3] = ~part.length & 0xff;
    out[at + 4] = (~part.length >> 8) & 0xff;
    out.set(part, at + 5);
    at += 5 + part.length;
  }
  let a = 1;
  let b = 0;
  for (let k = 0; k < data.length; k++) {
    a = (a + data[k]) % 65521;
    b = (b + a) % 65521;
  }
  new DataView(out.buffer).setUint32(at, ((b << 16) | a) >>> 0);
  return out;
}

const CRC_TABLE = (() => {
  const t = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    t[n] = c >>> 0;
  }
  return t;
})();

function chunk(type: string, data: Uint8Array): Uint8Array {
  const out = new Uint8Array(12 + data.length);
  const dv = new DataView(out.buffer);
  dv.setUint32(0, data.length);
  for (let k = 0; k < 4; k++) out[4 + k] = type.charCodeAt(k);
  out.set(data, 8);
  let crc = 0xffffffff;
  for (let k = 4; k < 8 + data.length; k++) crc = CRC_TABLE[(crc ^ out[k]) & 0xff] ^ (crc >>> 8);
  dv.setUint32(8 + data.length, (crc ^ 0xffffffff) >>> 0);
  return out;
}

const B64 = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/";
function base64(bytes: Uint8Array): string {
  const parts: string[] = [];
  for (let k = 0; k < bytes.length; k += 3) {
    const n = (bytes[k] << 16) | ((bytes[k + 1] ?? 0) << 8) | (bytes[k + 2] ?? 0);
    const left = bytes.length - k;
    parts.push(B64[(n >> 18) & 63] + B64[(n >> 12) & 63] + (left > 1 ? B64[(n >> 6) & 63] : "=") + (left > 2 ? B64[n & 63] : "="));
  }
  return parts.join("");
}
