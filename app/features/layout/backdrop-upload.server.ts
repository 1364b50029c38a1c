// Reads one roof drawing from a multipart/form-data request as it streams in, never holding more
// than the limit (a larger file is cut off at BACKDROP_MAX_BYTES with 413), then proves from its
// bytes that it is a PNG, JPEG or WebP image and reads its size.
import sharp from "sharp";
import { DomainError } from "~/lib/domain-error";
import { readFileUpload } from "~/lib/file-upload.server";
import { imageTypeLabels, sniffImageType, type ImageType } from "~/lib/image-type";
import { BACKDROP_MAX_BYTES, BACKDROP_MAX_PIXELS, BACKDROP_REQUEST_MAX_BYTES } from "./limits";

export type BackdropUpload = { bytes: Buffer; fileName: string; mediaType: ImageType; widthPx: number; heightPx: number };

export async function readBackdropUpload(request: Request): Promise<BackdropUpload> {
  const { bytes, fileName } = await readFileUpload(request, {
    field: "image",
    what: "drawing",
    otherFields: "only “image”",
    fallbackName: "roof-drawing",
    maxFileBytes: BACKDROP_MAX_BYTES,
    maxRequestBytes: BACKDROP_REQUEST_MAX_BYTES,
    maxParts: 4,
  });
  const chosen = { bytes, fileName };
  const mediaType = sniffImageType(chosen.bytes);
  if (!mediaType) throw new DomainError("Upload a PNG, JPEG or WebP image. This file is not one of those, whatever its name says.", 415, "image");
  try {
    const meta = await sharp(chosen.bytes, { limitInputPixels: BACKDROP_MAX_PIXELS, failOn: "error" }).metadata();
    if (!meta.width || !meta.height) throw new Error("no size");
    const upright = meta.autoOrient ?? { width: meta.width, height: meta.height };
    return { ...chosen, mediaType, widthPx: upright.width, heightPx: upright.height };
  } catch (error) {
    const huge = error instanceof Error && /pixel limit/i.test(error.message);
    throw new DomainError(huge ? `This drawing has more than ${BACKDROP_MAX_PIXELS / 1_000_000} megapixels. Resize it and upload it again.` : `This ${imageTypeLabels[mediaType]} file could not be read: it may be damaged or cut short.`, 422, "image");
  }
}
