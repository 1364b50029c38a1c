// The client form and JSON body (one set of rules), with its contacts.
import { z } from "zod";
import { emailAddress, numberIn, recordId, requiredText, text } from "~/lib/fields";

export const contactSchema = z.strictObject({
  id: recordId.optional(),
  name: requiredText("the contact's name", 100),
  email: z.union([z.literal(""), emailAddress("Enter the contact's e-mail address.")]).optional().default(""),
  phone: text(40).default(""),
  role: text(80).default(""),
});
export type ContactInput = z.output<typeof contactSchema>;

const fields = {
  name: requiredText("the client's name", 120),
  billingAddress: text(500),
  notes: text(4000),
  contacts: z.array(contactSchema).max(50, "Keep to at most 50 contacts per client."),
};

export const clientCreateSchema = z.strictObject({
  ...fields,
  billingAddress: fields.billingAddress.default(""),
  notes: fields.notes.default(""),
  contacts: fields.contacts.default([]),
});
export type ClientInput = z.output<typeof clientCreateSchema>;

export const clientPatchSchema = z.strictObject(fields).partial().extend({ version: numberIn("the version you read", { min: 1, integer: true }) });
export type ClientPatch = z.output<typeof clientPatchSchema>;

/** The page form: create, and edit with the version it read. */
export const clientFormSchema = clientCreateSchema.extend({ version: numberIn("the version you read", { min: 1, integer: true }).optional() });
