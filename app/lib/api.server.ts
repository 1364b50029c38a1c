// The JSON API's answers: one error shape, `{ "error": { "message", "fields"? } }`, with a
// fitting status; bodies read and validated in one place; DomainErrors become JSON.
import type { z } from "zod";
import { DomainError } from "./domain-error";

export type FieldErrors = Record<string, string>;

export function apiError(status: number, message: string, fields?: FieldErrors, extra?: Record<string, unknown>, headers?: Record<string, string>) {
  return Response.json({ error: { message, ...(fields ? { fields } : {}) }, ...extra }, { status, headers });
}

/** 405 with the methods the route answers. */
export function methodNotAllowed(allow: string) {
  return apiError(405, `This address answers ${allow}.`, undefined, undefined, { allow });
}

/** "emitters[2].frequencyMHz" from a Zod issue path. */
export function fieldPath(path: readonly PropertyKey[]) {
  return path.reduce<string>((out, key) => (typeof key === "number" ? `${out}[${key}]` : out ? `${out}.${String(key)}` : String(key)), "");
}

export function zodFieldErrors(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = fieldPath(issue.path) || "body";
    fields[key] ??= unknownKeyMessage(issue) ?? issue.message;
  }
  return fields;
}

function unknownKeyMessage(issue: z.core.$ZodIssue) {
  return issue.code === "unrecognized_keys" ? `Unknown field${issue.keys.length === 1 ? "" : "s"}: ${issue.keys.join(", ")}.` : null;
}

/** Reads a JSON body and validates it; throws the 415 / 400 answer when it is not what the schema wants. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.output<S>> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^application\/json\b/i.test(type)) throw apiError(415, "Send a JSON body (Content-Type: application/json).");
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw apiError(400, "The body is not valid JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw apiError(400, "Some fields are not valid.", zodFieldErrors(parsed.error));
  return parsed.data;
}

/** Runs an API handler, answering a DomainError as JSON with its status (its field named, a 409 with the current record). */
export async function api(handler: () => Promise<Response>): Promise<Response> {
  try {
    return await handler();
  } catch (error) {
    if (error instanceof DomainError) {
      return apiError(error.status, error.message, error.field ? { [error.field]: error.message } : undefined, error.details);
    }
    throw error;
  }
}
