// Reads a form post for an action: only the fields the form's Zod schema names reach Conform, so
// a reply never echoes fields the form does not have, and a plain field (`email`) takes no
// list or object paths (`email[3]`, `email.x`). Echoed values are cut at MAX_ECHOED_VALUE
// characters. Size, field count and index limits are enforced earlier by the server's body gate.
import type { SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import type { $ZodType } from "zod/v4/core";
import { fieldsOf, topLevelName } from "~/lib/form-fields";

/** No field of ours is longer; a longer value is refused by its schema and echoed cut. */
export const MAX_ECHOED_VALUE = 10_000;

/** Conform's reserved names (intent buttons, list state). */
const RESERVED = new Set(["__intent__", "__state__"]);

/** The post's form data; an empty form when there is no body or it is not a form. */
export async function readFormData(request: Request) {
  try {
    return await request.formData();
  } catch {
    return new FormData(); // no body, or one that is not a form: the schema's messages answer
  }
}

function keep(formData: FormData, accepts: (name: string) => boolean) {
  const kept = new FormData();
  for (const [name, value] of formData) if (accepts(name)) kept.append(name, value);
  return kept;
}

function cut(value: unknown): unknown {
  if (typeof value === "string") return value.length > MAX_ECHOED_VALUE ? value.slice(0, MAX_ECHOED_VALUE) : value;
  if (Array.isArray(value)) return value.map(cut);
  if (value && typeof value === "object") return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, cut(v)]));
  return value;
}

/** Parses a post (or form data already read, for actions that branch on an intent first) with the form's schema. */
export async function parseForm<Schema extends $ZodType>(source: Request | FormData, schema: Schema) {
  const fields = fieldsOf(schema);
  const formData = source instanceof FormData ? source : await readFormData(source);
  const known = keep(formData, (name) => {
    if (RESERVED.has(name)) return true;
    const kind = fields.get(topLevelName(name));
    return kind === "nested" || (kind === "plain" && fields.has(name));
  });
  let submission;
  try {
    submission = parseWithZod(known, { schema });
  } catch {
    // Conform throws on a malformed intent or path: parse the plain fields alone.
    submission = parseWithZod(keep(known, (name) => fields.has(name)), { schema });
  }
  const reply = submission.reply;
  submission.reply = (options) => {
    const result = reply(options) as SubmissionResult<string[]>;
    return { ...result, initialValue: cut(result.initialValue) as SubmissionResult<string[]>["initialValue"] };
  };
  return submission;
}
