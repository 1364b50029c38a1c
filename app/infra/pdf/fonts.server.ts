// The PDF's type: Atkinson Hyperlegible Next (the portal's face) first, then Noto Sans for what
// Atkinson's latin subset lacks (µ), Noto Sans Greek for π and the Greek letters, and Noto Sans
// Math for ≤, ≥, →, √, ≈ and the other operators. All shipped by @fontsource as WOFF, which
// pdfkit (fontkit) reads and embeds as subsets. Text is split into runs, each set in the first
// face of the chain that has its glyphs.
import { createRequire } from "node:module";
import { readFileSync } from "node:fs";
import * as fontkit from "fontkit";
import { woffToSfnt } from "./woff.server";

const require = createRequire(import.meta.url);
const file = (pkg: string, name: string) => require.resolve(`@fontsource/${pkg}/files/${name}`);

export type Weight = "regular" | "bold";
type Face = { name: string; bytes: Buffer; has: (cp: number) => boolean };

function face(name: string, path: string): Face {
  const bytes = woffToSfnt(readFileSync(path));
  const font = fontkit.create(bytes) as unknown as { hasGlyphForCodePoint(cp: number): boolean };
  return { name, bytes, has: (cp) => font.hasGlyphForCodePoint(cp) };
}

let chains: Record<Weight, Face[]> | null = null;
function load(): Record<Weight, Face[]> {
  chains ??= {
    regular: [
      face("body", file("atkinson-hyperlegible-next", "atkinson-hyperlegible-next-latin-400-normal.woff")),
      face("body-ext", file("atkinson-hyperlegible-next", "atkinson-hyperlegible-next-latin-ext-400-normal.woff")),
      face("noto", file("noto-sans", "noto-sans-latin-400-normal.woff")),
      face("noto-greek", file("noto-sans", "noto-sans-greek-400-normal.woff")),
      face("math", file("noto-sans-math", "noto-sans-math-latin-400-normal.woff")),
    ],
    bold: [
      face("body-bold", file("atkinson-hyperlegible-next", "atkinson-hyperlegible-next-latin-700-normal.woff")),
      face("body-ext-bold", file("atkinson-hyperlegible-next", "atkinson-hyperlegible-next-latin-ext-700-normal.woff")),
      face("noto-bold", file("noto-sans", "noto-sans-latin-700-normal.woff")),
      face("noto-greek-bold", file("noto-sans", "noto-sans-greek-700-normal.woff")),
      face("math", file("noto-sans-math", "noto-sans-math-latin-400-normal.woff")),
    ],
  };
  return chains;
}

/** Registers every face with the document under its name. */
export function registerFonts(doc: PDFKit.PDFDocument) {
  const all = load();
  for (const f of [...all.regular, ...all.bold]) doc.registerFont(f.name, f.bytes);
}

/** The first face of the chain, for pdfkit's constructor. */
export const primaryFont = () => load().regular[0].bytes;
export const fontName = (weight: Weight) => load()[weight][0].name;

/** The text cut into runs of one face each (spaces stay with the run before them). */
export function fontRuns(text: string, weight: Weight = "regular"): { font: string; text: string }[] {
  const chain = load()[weight];
  const runs: { font: string; text: string }[] = [];
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    const found = cp <= 0x20 ? null : (chain.find((f) => f.has(cp)) ?? chain[0]);
    const last = runs[runs.length - 1];
    if (last && (found === null || last.font === found.name)) last.text += ch;
    else runs.push({ font: (found ?? chain[0]).name, text: ch });
  }
  return runs;
}

/** Which characters no face of the chain can draw (empty when every glyph renders). */
export function missingGlyphs(text: string, weight: Weight = "regular"): string[] {
  const chain = load()[weight];
  return [...new Set([...text].filter((ch) => ch.codePointAt(0)! > 0x20 && !chain.some((f) => f.has(ch.codePointAt(0)!))))];
}
