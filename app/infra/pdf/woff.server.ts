// WOFF 1.0 → plain SFNT (TrueType/OpenType) bytes, once per face: fontkit would otherwise inflate
// the WOFF tables again on every document. Layout from the W3C WOFF 1.0 recommendation, §3–§5:
// a 44-byte header, then per table a 20-byte entry (tag, offset, compLength, origLength,
// origChecksum); a table is zlib-compressed when compLength < origLength.
import { inflateSync } from "node:zlib";

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.readUInt32BE(0) !== 0x774f4646) return woff; // not "wOFF": already SFNT
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = 44 + i * 20;
    const tag = woff.readUInt32BE(at);
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const checksum = woff.readUInt32BE(at + 16);
    const raw = woff.subarray(offset, offset + compLength);
    return { tag, checksum, data: compLength < origLength ? inflateSync(raw) : Buffer.from(raw) };
  });
  let searchRange = 1;
  let entrySelector = 0;
  while (searchRange * 2 <= numTables) (searchRange *= 2), entrySelector++;
  const headerSize = 12 + 16 * numTables;
  const padded = (n: number) => (n + 3) & ~3;
  const out = Buffer.alloc(headerSize + tables.reduce((a, t) => a + padded(t.data.length), 0));
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange * 16, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange * 16, 10);
  let offset = headerSize;
  tables.forEach((t, i) => {
    const at = 12 + i * 16;
    out.writeUInt32BE(t.tag, at);
    out.writeUInt32BE(t.checksum, at + 4);
    out.writeUInt32BE(offset, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, offset);
    offset += padded(t.data.length);
  });
  return out;
}
