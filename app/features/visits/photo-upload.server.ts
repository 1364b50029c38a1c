// Reads one photo from a multipart/form-data request as it streams in (app/lib/file-upload.server.ts):
// a larger file is cut off at PHOTO_MAX_BYTES with 413, whatever the request's total size.
import { readFileUpload } from "~/lib/file-upload.server";
import { PHOTO_MAX_BYTES, PHOTO_REQUEST_MAX_BYTES } from "./limits";

export type PhotoUpload = { bytes: Buffer; fileName: string; caption: string };

const rules = {
  field: "photo",
  what: "photo",
  otherFields: "“photo” and, if you like, “caption”",
  fallbackName: "photo",
  maxFileBytes: PHOTO_MAX_BYTES,
  maxRequestBytes: PHOTO_REQUEST_MAX_BYTES,
  maxParts: 8,
};

export async function readPhotoUpload(request: Request): Promise<PhotoUpload> {
  const { bytes, fileName, form } = await readFileUpload(request, rules);
  const caption = form.get("caption");
  return { bytes, fileName, caption: typeof caption === "string" ? caption : "" };
}
