// Text files as people save them: UTF-8 with or without a byte-order mark, UTF-16 from
// spreadsheet programs ("Unicode text"), or a legacy 8-bit code page. Decoded to a string
// with the mark removed, and the encoding named so a report can say what was read.
export type TextEncodingName = "utf-8" | "utf-16le" | "utf-16be" | "windows-1252";

function looksLikeUtf16(bytes: Uint8Array, zeroAt: 0 | 1) {
  // ASCII text in UTF-16 without a mark: every other byte of the first characters is zero.
  const n = Math.min(bytes.length - (bytes.length % 2), 64);
  if (n < 4) return false;
  let zeros = 0;
  for (let i = zeroAt; i < n; i += 2) if (bytes[i] === 0) zeros++;
  return zeros >= (n / 2) * 0.9;
}

/** Decodes a text file's bytes; a file that is not valid UTF-8 (nor UTF-16) is read as Windows-1252 (a superset of Latin-1). */
export function decodeTextFile(bytes: Uint8Array): { text: string; encoding: TextEncodingName } {
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) return { text: new TextDecoder("utf-8").decode(bytes.subarray(3)), encoding: "utf-8" };
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return { text: new TextDecoder("utf-16le").decode(bytes.subarray(2)), encoding: "utf-16le" };
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return { text: new TextDecoder("utf-16be").decode(bytes.subarray(2)), encoding: "utf-16be" };
  if (looksLikeUtf16(bytes, 1)) return { text: new TextDecoder("utf-16le").decode(bytes), encoding: "utf-16le" };
  if (looksLikeUtf16(bytes, 0)) return { text: new TextDecoder("utf-16be").decode(bytes), encoding: "utf-16be" };
  try {
    return { text: new TextDecoder("utf-8", { fatal: true }).decode(bytes), encoding: "utf-8" };
  } catch {
    return { text: new TextDecoder("windows-1252").decode(bytes), encoding: "windows-1252" };
  }
}
