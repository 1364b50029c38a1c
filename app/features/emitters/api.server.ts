// What the emitter and pattern API routes share: a JSON body read under the route's own cap, and
// the refusal of a list or a file with every problem.
import type { z } from "zod";
import { apiError, zodFieldErrors } from "~/lib/api.server";
import { readBodyBytes } from "~/lib/body.server";
import { EmittersRefused } from "./bulk.server";

/** Reads a JSON body of at most `maxBytes` (413 past it, read as it streams) and validates it. */
export async function readJsonCapped<S extends z.ZodType>(request: Request, schema: S, maxBytes: number): Promise<z.output<S>> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^application\/json\b/i.test(type)) throw apiError(415, "Send a JSON body (Content-Type: application/json).");
  const bytes = await readBodyBytes(request, maxBytes, `The body is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`);
  let body: unknown;
  try {
    body = JSON.parse(new TextDecoder().decode(bytes));
  } catch {
    throw apiError(400, "The body is not valid JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw apiError(400, "Some fields are not valid; nothing was changed.", zodFieldErrors(parsed.error));
  return parsed.data;
}

/** An EmittersRefused as the API's 400, with every field (JSON) or every problem (CSV). */
export function refusedAnswer(error: unknown): Response {
  if (!(error instanceof EmittersRefused)) throw error;
  const fields = Object.keys(error.fields).length
    ? error.fields
    : Object.fromEntries(error.problems.map((p) => [p.row === null ? "file" : `row ${p.row}${p.column ? `.${p.column}` : ""}`, p.message]));
  return apiError(400, error.message, fields, error.problems.length ? { problems: error.problems, validCount: error.validCount } : undefined);
}
