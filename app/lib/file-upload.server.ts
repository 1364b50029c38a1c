// Reads one file from a multipart/form-data request as it streams in, never holding more than the
// limit: a larger file is cut off at `maxFileBytes` with 413, whatever the request's total size
// (request.formData() would buffer it all first, so it is not used). Shared by the photo and
// roof-drawing uploads; each names its own field and words.
import {
  FormDataParseError,
  MaxFileSizeExceededError,
  MaxFilesExceededError,
  MaxHeaderSizeExceededError,
  MaxPartsExceededError,
  MaxTotalSizeExceededError,
  parseFormData,
} from "@remix-run/form-data-parser";
import { DomainError } from "./domain-error";

export type FileUploadRules = {
  /** The form field that holds the file. */
  field: string;
  /** "photo", "drawing": what the messages call the file. */
  what: string;
  /** The other fields the form may carry, for the message when there are too many. */
  otherFields: string;
  fallbackName: string;
  maxFileBytes: number;
  maxRequestBytes: number;
  maxParts: number;
};

export type FileUpload = { bytes: Buffer; fileName: string; form: FormData };

/** A file name kept as a label only: no path, no control characters, a sensible length. */
export function cleanFileName(name: string, fallback: string) {
  const base = name.split(/[\\/]/).pop() ?? "";
  return base.replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(0, 200) || fallback;
}

export const fileTooLarge = (rules: Pick<FileUploadRules, "what" | "field" | "maxFileBytes">) =>
  new DomainError(`The ${rules.what} is larger than ${rules.maxFileBytes / 1024 / 1024} MB. Upload a smaller copy.`, 413, rules.field);

export async function readFileUpload(request: Request, rules: FileUploadRules): Promise<FileUpload> {
  const { field, what } = rules;
  const type = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\b/i.test(type)) throw new DomainError(`Send the ${what} as multipart/form-data, in a field named “${field}”.`, 415);
  const declared = Number(request.headers.get("content-length") ?? Number.NaN);
  if (Number.isFinite(declared) && declared > rules.maxRequestBytes) throw fileTooLarge(rules);
  let file: { bytes: Buffer; fileName: string } | null = null;
  let form: FormData;
  try {
    form = await parseFormData(request, { maxFiles: 1, maxFileSize: rules.maxFileBytes, maxTotalSize: rules.maxRequestBytes, maxParts: rules.maxParts, maxHeaderSize: 8 * 1024 }, async (upload) => {
      if (upload.fieldName === field) file = { bytes: Buffer.from(await upload.arrayBuffer()), fileName: cleanFileName(upload.name, rules.fallbackName) };
      return null;
    });
  } catch (error) {
    if (error instanceof MaxFileSizeExceededError || error instanceof MaxTotalSizeExceededError) throw fileTooLarge(rules);
    if (error instanceof MaxFilesExceededError) throw new DomainError(`Send one ${what} per request.`, 400, field);
    if (error instanceof MaxPartsExceededError || error instanceof MaxHeaderSizeExceededError) throw new DomainError(`The upload has more fields than a ${what} needs: send ${rules.otherFields}.`, 400);
    if (error instanceof FormDataParseError) throw new DomainError("The upload could not be read as multipart form data.", 400);
    throw error;
  }
  const chosen = file as { bytes: Buffer; fileName: string } | null;
  if (!chosen || chosen.bytes.length === 0) throw new DomainError(`Choose a ${what} to upload (a JPEG, PNG or WebP file in the field “${field}”).`, 400, field);
  return { ...chosen, form };
}
