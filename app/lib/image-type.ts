// What an uploaded image really is, from its first bytes (its "magic number"), never from the
// file name or the type the browser declared. Shared by photo uploads and roof drawings.
export type ImageType = "image/jpeg" | "image/png" | "image/webp";

const startsWith = (bytes: Uint8Array, signature: readonly number[], at = 0) =>
  bytes.length >= at + signature.length && signature.every((b, i) => bytes[at + i] === b);

// JPEG: SOI marker FF D8 then the next marker's FF (ISO/IEC 10918-1 Annex B; JFIF and Exif files alike).
const JPEG = [0xff, 0xd8, 0xff];
// PNG: the eight-byte signature of ISO/IEC 15948 §5.2.
const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
// WebP: a RIFF container (bytes 0–3 "RIFF", 4–7 the size) whose form type at 8–11 is "WEBP" (RFC 9649 §2).
const RIFF = [0x52, 0x49, 0x46, 0x46];
const WEBP = [0x57, 0x45, 0x42, 0x50];

/** The image type the bytes begin with, or null for anything that is not a JPEG, PNG or WebP. */
export function sniffImageType(bytes: Uint8Array): ImageType | null {
  if (startsWith(bytes, JPEG)) return "image/jpeg";
  if (startsWith(bytes, PNG)) return "image/png";
  if (startsWith(bytes, RIFF) && startsWith(bytes, WEBP, 8)) return "image/webp";
  return null;
}

/** An ISO base-media file ("ftyp" box at byte 4): HEIC/HEIF or AVIF from phones, which browsers do not all show. */
export function isHeifFamily(bytes: Uint8Array): boolean {
  return startsWith(bytes, [0x66, 0x74, 0x79, 0x70], 4);
}

export const imageTypeLabels: Record<ImageType, string> = { "image/jpeg": "JPEG", "image/png": "PNG", "image/webp": "WebP" };
