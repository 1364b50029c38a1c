// One set of field rules for the visit and reading forms and their JSON bodies (Conform coerces form text).
import { z } from "zod";
import { numberIn, recordId, requiredText, text } from "~/lib/fields";
import { parseReadingUnit, READING_UNITS, readingUnitLabels, toPowerDensity } from "./reading-units";
import { parseStandard, parseTier, STANDARD_IDS, TIERS } from "./standards";

const version = numberIn("the version you read", { min: 1, integer: true });

function isCalendarDate(value: string) {
  const d = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === value;
}

/** A calendar date written YYYY-MM-DD, 1980 to 2100. */
export function dateField(what: string) {
  const message = `Enter ${what} as a date (YYYY-MM-DD).`;
  return z
    .string({ error: message })
    .trim()
    .regex(/^\d{4}-\d{2}-\d{2}$/, message)
    .refine(isCalendarDate, message)
    .refine((v) => v >= "1980-01-01" && v <= "2100-12-31", `Enter ${what} between 1980 and 2100.`);
}

export const instrumentSchema = z.strictObject({
  probe: requiredText("the probe or meter (make and model)", 100),
  serial: text(60).default(""),
  calibrationDate: dateField("the calibration date").nullable().optional().default(null),
});

export const visitCreateSchema = z.strictObject({
  visitedOn: dateField("the date of the visit"),
  people: text(500).default(""),
  conditions: text(500).default(""),
  instruments: z.array(instrumentSchema).max(20, "List at most 20 instruments.").default([]),
  notes: text(4000).default(""),
});
export type VisitInput = z.output<typeof visitCreateSchema>;

/** The page form: create, and edit with the version it read. */
export const visitFormSchema = visitCreateSchema.extend({ version: version.optional() });

const unitMessage = `Choose a unit: ${READING_UNITS.map((u) => readingUnitLabels[u]).join(", ")}.`;
const standardMessage = `Choose a standard: ${STANDARD_IDS.join(", ")}.`;
const tierMessage = `Choose a tier: ${TIERS.join(" or ")}.`;

/** Text mapped through a parser, refused with the message when the parser finds nothing. */
function parsed<T>(parse: (raw: string) => T | null, message: string) {
  return z.string({ error: message }).transform((raw, ctx) => {
    const value = parse(raw);
    if (value === null) {
      ctx.addIssue({ code: "custom", message });
      return z.NEVER;
    }
    return value;
  });
}

const optionalParsed = <T>(parse: (raw: string) => T | null, message: string) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? null : v), parsed(parse, message).nullable().optional().default(null));

export const readingFields = {
  /** The surface's id; or `surface`, its name or id (the CSV's column). */
  surfaceId: recordId.nullable().optional().default(null),
  surface: text(120).optional(),
  label: text(60).default(""),
  x: numberIn("x in metres", { min: -10_000, max: 10_000 }),
  y: numberIn("y in metres", { min: -10_000, max: 10_000 }),
  heightM: numberIn("the height above the surface in metres", { min: 0, max: 500 }),
  value: numberIn("the reading", { min: 0, max: 1e9 }),
  unit: parsed(parseReadingUnit, unitMessage),
  standard: optionalParsed(parseStandard, standardMessage),
  tier: optionalParsed(parseTier, tierMessage),
  frequencyMHz: numberIn("the frequency in MHz (leave it empty for a broadband reading)", { min: 0.01, max: 300_000 }).nullable().optional().default(null),
  notes: text(500).default(""),
};

type ConvertibleReading = { value: number; unit: (typeof READING_UNITS)[number]; frequencyMHz: number | null; standard: (typeof STANDARD_IDS)[number] | null; tier: (typeof TIERS)[number] | null };

/** Adds the unit rules (a % needs standard and tier; its frequency must be in the standard's table). */
function withConversion<T extends z.ZodType<ConvertibleReading>>(schema: T) {
  return schema.superRefine((r, ctx) => {
    const c = toPowerDensity(r);
    if (!c.ok) ctx.addIssue({ code: "custom", path: [c.field], message: c.message });
  });
}

export const readingInputSchema = withConversion(z.strictObject(readingFields));
export type ReadingInput = z.output<typeof readingInputSchema>;

/** A row of the readings table on the page: add, or edit with the version it read. */
export const readingFormSchema = withConversion(z.strictObject({ ...readingFields, id: recordId.optional(), version: version.optional() }));

export const captionSchema = z.strictObject({ caption: text(300).default(""), version: version.optional() });
