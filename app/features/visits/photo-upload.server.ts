// Reads one photo from a multipart/form-data request as it streams in, never holding more
// than the limit: a larger file is cut off at PHOTO_MAX_BYTES with 413, whatever the
// request's total size (request.formData() would buffer it all first, so it is not used here).
import {
  FormDataParseError,
  MaxFileSizeExceededError,
  MaxFilesExceededError,
  MaxHeaderSizeExceededError,
  MaxPartsExceededError,
  MaxTotalSizeExceededError,
  parseFormData,
} from "@remix-run/form-data-parser";
import { DomainError } from "~/lib/domain-error";
import { PHOTO_MAX_BYTES, PHOTO_REQUEST_MAX_BYTES } from "./limits";

export type PhotoUpload = { bytes: Buffer; fileName: string; caption: string };

export const photoTooLarge = () => new DomainError(`The photo is larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB. Upload a smaller copy.`, 413, "photo");

function cleanFileName(name: string) {
  // Keep the name as a label only: no path, no control characters, a sensible length.
  const base = name.split(/[\\/]/).pop() ?? "";
  return base.replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(0, 200) || "photo";
}

export async function readPhotoUpload(request: Request): Promise<PhotoUpload> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\b/i.test(type)) throw new DomainError("Send the photo as multipart/form-data, in a field named “photo”.", 415);
  const declared = Number(request.headers.get("content-length") ?? Number.NaN);
  if (Number.isFinite(declared) && declared > PHOTO_REQUEST_MAX_BYTES) throw photoTooLarge();
  let photo: { bytes: Buffer; fileName: string } | null = null;
  let form: FormData;
  try {
    form = await parseFormData(request, { maxFiles: 1, maxFileSize: PHOTO_MAX_BYTES, maxTotalSize: PHOTO_REQUEST_MAX_BYTES, maxParts: 8, maxHeaderSize: 8 * 1024 }, async (file) => {
      if (file.fieldName === "photo") photo = { bytes: Buffer.from(await file.arrayBuffer()), fileName: cleanFileName(file.name) };
      return null;
    });
  } catch (error) {
    if (error instanceof MaxFileSizeExceededError || error instanceof MaxTotalSizeExceededError) throw photoTooLarge();
    if (error instanceof MaxFilesExceededError) throw new DomainError("Send one photo per request.", 400, "photo");
    if (error instanceof MaxPartsExceededError || error instanceof MaxHeaderSizeExceededError) throw new DomainError("The upload has more fields than a photo needs: send “photo” and, if you like, “caption”.", 400);
    if (error instanceof FormDataParseError) throw new DomainError("The upload could not be read as multipart form data.", 400);
    throw error;
  }
  const chosen = photo as { bytes: Buffer; fileName: string } | null;
  if (!chosen || chosen.bytes.length === 0) throw new DomainError("Choose a photo to upload (a JPEG, PNG or WebP file in the field “photo”).", 400, "photo");
  const caption = form.get("caption");
  return { ...chosen, caption: typeof caption === "string" ? caption : "" };
}
