// Reads one roof drawing from a multipart/form-data request as it streams in, never holding more
// than the limit (a larger file is cut off at BACKDROP_MAX_BYTES with 413), then proves from its
// bytes that it is a PNG, JPEG or WebP image and reads its size.
import {
  FormDataParseError,
  MaxFileSizeExceededError,
  MaxFilesExceededError,
  MaxHeaderSizeExceededError,
  MaxPartsExceededError,
  MaxTotalSizeExceededError,
  parseFormData,
} from "@remix-run/form-data-parser";
import sharp from "sharp";
import { DomainError } from "~/lib/domain-error";
import { imageTypeLabels, sniffImageType, type ImageType } from "~/lib/image-type";
import { BACKDROP_MAX_BYTES, BACKDROP_MAX_PIXELS, BACKDROP_REQUEST_MAX_BYTES } from "./limits";

export type BackdropUpload = { bytes: Buffer; fileName: string; mediaType: ImageType; widthPx: number; heightPx: number };

const tooLarge = () => new DomainError(`The drawing is larger than ${BACKDROP_MAX_BYTES / 1024 / 1024} MB. Upload a smaller copy.`, 413, "image");

function cleanFileName(name: string) {
  const base = name.split(/[\\/]/).pop() ?? "";
  return base.replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(0, 200) || "roof-drawing";
}

export async function readBackdropUpload(request: Request): Promise<BackdropUpload> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\b/i.test(type)) throw new DomainError("Send the drawing as multipart/form-data, in a field named “image”.", 415);
  const declared = Number(request.headers.get("content-length") ?? Number.NaN);
  if (Number.isFinite(declared) && declared > BACKDROP_REQUEST_MAX_BYTES) throw tooLarge();
  let file: { bytes: Buffer; fileName: string } | null = null;
  try {
    await parseFormData(request, { maxFiles: 1, maxFileSize: BACKDROP_MAX_BYTES, maxTotalSize: BACKDROP_REQUEST_MAX_BYTES, maxParts: 4, maxHeaderSize: 8 * 1024 }, async (upload) => {
      if (upload.fieldName === "image") file = { bytes: Buffer.from(await upload.arrayBuffer()), fileName: cleanFileName(upload.name) };
      return null;
    });
  } catch (error) {
    if (error instanceof MaxFileSizeExceededError || error instanceof MaxTotalSizeExceededError) throw tooLarge();
    if (error instanceof MaxFilesExceededError) throw new DomainError("Send one drawing per request.", 400, "image");
    if (error instanceof MaxPartsExceededError || error instanceof MaxHeaderSizeExceededError) throw new DomainError("The upload has more fields than a drawing needs: send only “image”.", 400);
    if (error instanceof FormDataParseError) throw new DomainError("The upload could not be read as multipart form data.", 400);
    throw error;
  }
  const chosen = file as { bytes: Buffer; fileName: string } | null;
  if (!chosen || chosen.bytes.length === 0) throw new DomainError("Choose a drawing to upload (a PNG, JPEG or WebP file in the field “image”).", 400, "image");
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
