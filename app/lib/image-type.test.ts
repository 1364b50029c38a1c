import { describe, expect, it } from "vitest";
import { isHeifFamily, sniffImageType } from "./image-type";

const bytes = (...parts: (number[] | string)[]) =>
  Uint8Array.from(parts.flatMap((p) => (typeof p === "string" ? [...p].map((c) => c.charCodeAt(0)) : p)));

describe("sniffImageType", () => {
  it("knows a JPEG by FF D8 FF, whatever follows (JFIF or Exif)", () => {
    expect(sniffImageType(bytes([0xff, 0xd8, 0xff, 0xe0], "JFIF"))).toBe("image/jpeg");
    expect(sniffImageType(bytes([0xff, 0xd8, 0xff, 0xe1], "Exif"))).toBe("image/jpeg");
  });

  it("knows a PNG by its eight-byte signature", () => {
    expect(sniffImageType(bytes([0x89], "PNG", [0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13], "IHDR"))).toBe("image/png");
  });

  it("knows a WebP by RIFF….WEBP, and refuses other RIFF files (WAV, AVI)", () => {
    expect(sniffImageType(bytes("RIFF", [0x24, 0, 0, 0], "WEBPVP8 "))).toBe("image/webp");
    expect(sniffImageType(bytes("RIFF", [0x24, 0, 0, 0], "WAVEfmt "))).toBeNull();
    expect(sniffImageType(bytes("RIFF", [0x24, 0, 0, 0], "AVI LIST"))).toBeNull();
  });

  it("refuses HEIC and AVIF (ISO base-media files), and can tell them apart to say so", () => {
    const heic = bytes([0, 0, 0, 0x18], "ftypheic", [0, 0, 0, 0], "mif1heic");
    expect(sniffImageType(heic)).toBeNull();
    expect(isHeifFamily(heic)).toBe(true);
    expect(isHeifFamily(bytes([0, 0, 0, 0x1c], "ftypavif"))).toBe(true);
    expect(isHeifFamily(bytes([0xff, 0xd8, 0xff, 0xe0], "JFIF"))).toBe(false);
  });

  it("refuses text, PDFs, GIFs, SVG, HTML and truncated signatures", () => {
    expect(sniffImageType(bytes("hello, this is a text file named photo.jpg"))).toBeNull();
    expect(sniffImageType(bytes("%PDF-1.7"))).toBeNull();
    expect(sniffImageType(bytes("GIF89a"))).toBeNull();
    expect(sniffImageType(bytes('<svg xmlns="http://www.w3.org/2000/svg">'))).toBeNull();
    expect(sniffImageType(bytes("<script>alert(1)</script>"))).toBeNull();
    expect(sniffImageType(bytes([0xff, 0xd8]))).toBeNull();
    expect(sniffImageType(bytes([0x89], "PNG", [0x0d, 0x0a]))).toBeNull();
    expect(sniffImageType(bytes("RIFF", [0, 0]))).toBeNull();
    expect(sniffImageType(new Uint8Array())).toBeNull();
  });
});
