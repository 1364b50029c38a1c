// The filings' forms and queries: filing an issued assessment to a regulator, and the inbox's
// filters (site, authority, a date range), shared by the page and GET /api/v1/filings.
import { z } from "zod";
import { identifier, text } from "~/lib/fields";

export const AUTHORITY_MAX = 120;
export const NOTE_MAX = 1000;

export const fileSchema = z.strictObject({
  assessmentId: identifier("Choose the issued assessment to file."),
  regulatorMemberId: identifier("Choose the regulator to file it to."),
  /** Empty: taken from the regulator's name (authorityFromName). */
  authority: text(AUTHORITY_MAX).default(""),
  note: text(NOTE_MAX).default(""),
});

const isoDay = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date as YYYY-MM-DD.")
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)), "That is not a date.");

/** Empty values in a query string mean "any" (a form's untouched select sends ""). */
const optional = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (v === "" ? undefined : v), schema.optional());

export const filterSchema = z
  .strictObject({
    siteId: optional(identifier()),
    authority: optional(text(AUTHORITY_MAX)),
    from: optional(isoDay),
    to: optional(isoDay),
  })
  .refine((f) => !f.from || !f.to || f.from <= f.to, { path: ["to"], message: "The end date is before the start date." });

export type FilingFilter = z.output<typeof filterSchema>;
