// POST /api/v1/visits/:id/readings: a JSON body { readings: [...] } or a CSV file (text/csv),
// checked whole; 201 with the stored readings, or 400 with every problem and nothing stored.
// `?validOnly=true` stores the valid readings and returns the problems of the others.
import { z } from "zod";
import { apiError, zodFieldErrors } from "~/lib/api.server";
import { readBodyBytes } from "~/lib/body.server";
import { DomainError } from "~/lib/domain-error";
import { decodeTextFile } from "~/lib/text-file";
import { readingJson } from "./json";
import { READINGS_BODY_MAX_BYTES, READINGS_MAX_ROWS } from "./limits";
import { checkReadings } from "./readings-check";
import { readingsFromCsv } from "./readings-csv";
import { addReadings, ReadingsRefused } from "./readings.server";
import type { Scope } from "~/features/sites/scope.server";
import type { Actor } from "~/lib/audit.server";

const envelope = z.strictObject({
  readings: z.array(z.unknown(), { error: "Send { readings: [...] }." }).min(1, "Send at least one reading.").max(READINGS_MAX_ROWS, `Send at most ${READINGS_MAX_ROWS} readings at a time.`),
});

const tooLarge = `The body is larger than ${READINGS_BODY_MAX_BYTES / 1024 / 1024} MB. Send the readings in parts.`;

export async function postReadings(who: Actor & Scope, visitId: string, request: Request): Promise<Response> {
  const type = request.headers.get("content-type") ?? "";
  const validOnly = new URL(request.url).searchParams.get("validOnly") === "true";
  const isCsv = /^text\/csv\b/i.test(type);
  if (!isCsv && !/^application\/json\b/i.test(type)) throw new DomainError("Send readings as JSON (application/json) or as a CSV file (text/csv).", 415);
  const bytes = await readBodyBytes(request, READINGS_BODY_MAX_BYTES, tooLarge);
  try {
    if (isCsv) {
      const text = decodeTextFile(bytes).text;
      const stored = await addReadings(who, visitId, (surfaces) => {
        const checked = readingsFromCsv(text, surfaces);
        return { valid: checked.valid.map((v) => v.reading), problems: checked.problems };
      }, { validOnly });
      return Response.json({ readings: stored.readings.map((r) => readingJson(r)), ...(validOnly ? { skipped: stored.skipped } : {}) }, { status: 201 });
    }
    let body: unknown;
    try {
      body = JSON.parse(bytes.toString("utf8"));
    } catch {
      return apiError(400, "The body is not valid JSON.");
    }
    const parsed = envelope.safeParse(body);
    if (!parsed.success) return apiError(400, "Some fields are not valid.", zodFieldErrors(parsed.error));
    const stored = await addReadings(who, visitId, (surfaces) => {
      const checked = checkReadings(parsed.data.readings, surfaces);
      return { valid: checked.valid.map((v) => v.reading), problems: checked.problems };
    }, { validOnly });
    const skipped = stored.skipped.map((p) => ({ index: p.index, field: p.field, message: p.message }));
    return Response.json({ readings: stored.readings.map((r) => readingJson(r)), ...(validOnly ? { skipped } : {}) }, { status: 201 });
  } catch (error) {
    if (!(error instanceof ReadingsRefused)) throw error;
    const problems = error.problems as ({ index: number; field: string; message: string } | { row: number | null; column: string | null; message: string })[];
    const fields = Object.fromEntries(
      problems.map((p) => ("index" in p ? [`readings[${p.index}].${p.field}`, p.message] : [p.row === null ? "file" : `row ${p.row}${p.column ? `.${p.column}` : ""}`, p.message])),
    );
    return apiError(400, error.message, fields, { problems, validCount: error.validCount });
  }
}
