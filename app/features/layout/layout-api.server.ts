// The layout API's reading and answers: a JSON body read as a bounded stream (the gate lets it
// past its default limit), shape errors as 400 with each field named, geometry as 422, a stale
// version as 409 with the current layout, all in the API's one error shape.
import { apiError, zodFieldErrors } from "~/lib/api.server";
import { readBodyBytes } from "~/lib/body.server";
import { DomainError } from "~/lib/domain-error";
import { LAYOUT_BODY_MAX_BYTES, layoutInput, type LayoutInput } from "./schemas";

export async function readLayoutBody(request: Request): Promise<LayoutInput> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^application\/json\b/i.test(type)) throw new DomainError("Send a JSON body (Content-Type: application/json).", 415);
  const bytes = await readBodyBytes(request, LAYOUT_BODY_MAX_BYTES, `The layout is larger than ${LAYOUT_BODY_MAX_BYTES / 1024 / 1024} MB.`);
  let body: unknown;
  try {
    body = JSON.parse(bytes.toString("utf8"));
  } catch {
    throw new DomainError("The body is not valid JSON.", 400);
  }
  const parsed = layoutInput.safeParse(body);
  if (!parsed.success) throw new DomainError("Some fields are not valid.", 400, undefined, { fields: zodFieldErrors(parsed.error) });
  return parsed.data;
}

/** Runs a layout handler; a DomainError becomes `{ error: { message, fields } }` (plus `current` on a 409). */
export async function layoutApi(handler: () => Promise<Response>): Promise<Response> {
  try {
    return await handler();
  } catch (error) {
    if (!(error instanceof DomainError)) throw error;
    const { fields, ...extra } = (error.details ?? {}) as { fields?: Record<string, string> } & Record<string, unknown>;
    return apiError(error.status, error.message, fields ?? (error.field ? { [error.field]: error.message } : undefined), extra);
  }
}
