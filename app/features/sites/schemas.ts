// The site form and the site JSON body: one set of field rules for both (Conform coerces form text).
import { z } from "zod";
import { numberIn, oneOf, recordId, requiredText, text } from "~/lib/fields";
import { siteKinds } from "./kinds";

const version = numberIn("the version you read", { min: 1, integer: true });

// No defaults here: a PATCH must leave out what it does not change.
const fields = {
  name: requiredText("the site's name", 120),
  kind: oneOf("a kind of site", siteKinds),
  address: text(200),
  city: text(100),
  clientId: recordId.nullable(),
  latitude: numberIn("a latitude", { min: -90, max: 90 }).nullable(),
  longitude: numberIn("a longitude", { min: -180, max: 180 }).nullable(),
  datumNote: text(200),
  accessNotes: text(2000),
};

export const siteCreateSchema = z.strictObject({
  ...fields,
  address: fields.address.default(""),
  city: fields.city.default(""),
  clientId: fields.clientId.optional().default(null),
  latitude: fields.latitude.optional().default(null),
  longitude: fields.longitude.optional().default(null),
  datumNote: fields.datumNote.default(""),
  accessNotes: fields.accessNotes.default(""),
});
export type SiteInput = z.output<typeof siteCreateSchema>;

/** A partial update names the version it read; a stale version answers 409. */
export const sitePatchSchema = z.strictObject(fields).partial().extend({ version });
export type SitePatch = z.output<typeof sitePatchSchema>;

/** The page form: create, and edit with the version it read. */
export const siteFormSchema = siteCreateSchema.extend({ version: version.optional() });
