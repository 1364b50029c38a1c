// A library pattern as the API and the page send it: its names and the engine's pattern object
// (tabulated cuts or a parametric model). Pure.
import { z } from "zod";
import { numberIn, requiredText, text } from "~/lib/fields";
import { parametricPatternSchema } from "./schemas";

const cutPoint = z.strictObject({
  angleDeg: numberIn("the angle in degrees", { min: -180, max: 360 }),
  attenuationDb: numberIn("the attenuation in dB", { min: 0, max: 200 }),
});
const cut = (what: string) => z.array(cutPoint, { error: `Give the ${what} cut as [{ angleDeg, attenuationDb }, …].` }).min(1, `Give at least one point of the ${what} cut.`).max(3600, `Give at most 3600 points of the ${what} cut.`);

export const tabulatedPatternSchema = z.strictObject({ type: z.literal("tabulated"), horizontal: cut("horizontal"), vertical: cut("vertical"), maxAttenuationDb: numberIn("the maximum attenuation in dB", { min: 0, max: 200 }).optional() });

export const patternInputSchema = z.strictObject({
  name: requiredText("the pattern's name", 120),
  maker: text(100).default(""),
  model: text(100).default(""),
  gainDbi: numberIn("the gain in dBi", { min: -50, max: 80 }).nullable().optional().default(null),
  frequencyMHz: numberIn("the frequency in MHz", { min: 0, exclusiveMin: true, max: 300_000 }).nullable().optional().default(null),
  notes: text(1000).default(""),
  pattern: z.union([tabulatedPatternSchema, parametricPatternSchema], { error: 'Give the pattern as { type: "tabulated", horizontal, vertical } or a parametric model.' }),
});
export type PatternInput = z.output<typeof patternInputSchema>;
