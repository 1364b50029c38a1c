// A request body read into memory only up to a limit: the stream is read chunk by chunk and
// abandoned with 413 as soon as it passes the limit, whatever the request claims its size is.
import { DomainError } from "./domain-error";

export async function readBodyBytes(request: Request, maxBytes: number, tooLarge: string): Promise<Buffer> {
  const declared = Number(request.headers.get("content-length") ?? Number.NaN);
  if (Number.isFinite(declared) && declared > maxBytes) throw new DomainError(tooLarge, 413);
  if (!request.body) return Buffer.alloc(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      size += value.byteLength;
      if (size > maxBytes) throw new DomainError(tooLarge, 413);
      chunks.push(value);
    }
  } finally {
    reader.releaseLock();
  }
  return Buffer.concat(chunks, size);
}
