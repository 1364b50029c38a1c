// The rules for freezing an assessment (the API body and the page form) and for editing its
// mitigation plan. The options are the Exposure options' own schema, so the two never disagree.
import { z } from "zod";
import { SIGN_CATEGORIES } from "~/features/exposure/mitigation";
import { heightsSchema, optionsSchema } from "~/features/exposure/options";
import { numberIn, requiredText, text } from "~/lib/fields";

export const ASSESSMENT_NAME_MAX = 120;
const name = requiredText("a name for the assessment", ASSESSMENT_NAME_MAX);

/** POST /api/v1/sites/:id/assessments: `{ name, standard, tier, gridStepM, heights, mode, reflectionFactor, defaultModel? }`. */
export const freezeApiSchema = optionsSchema.extend({ name });
/** What freezing takes: a name and the options, any left out taking their defaults. */
export type FreezeInput = z.input<typeof freezeApiSchema>;

/** The page form sends text: the numbers are coerced, the reflection factor is one of three choices. */
export const freezeFormSchema = z.strictObject({
  name,
  standard: optionsSchema.shape.standard,
  tier: optionsSchema.shape.tier,
  gridStepM: optionsSchema.shape.gridStepM,
  heights: heightsSchema.default({ fromM: 0, toM: 2, count: 11 }),
  mode: optionsSchema.shape.mode,
  reflectionFactor: z.enum(["1", "2.56", "4"], { error: "Choose a reflection factor of 1, 2.56 or 4." }).default("1").transform((v) => Number(v) as 1 | 2.56 | 4),
});

const coordinate = (what: string) => numberIn(what, { min: -10_000, max: 10_000 });
const version = numberIn("the version you read", { min: 1, integer: true });

export const signEditSchema = z.strictObject({
  id: z.string().max(20).optional(),
  category: z.enum(SIGN_CATEGORIES, { error: `Choose a sign: ${SIGN_CATEGORIES.join(", ")}.` }),
  x: coordinate("x in metres"),
  y: coordinate("y in metres"),
  where: text(200).default(""),
  note: text(500).default(""),
  remove: z.boolean().optional().default(false),
});

/** The plan as edited on the page: every sign (moved, re-categorised, removed), the barriers kept, the notes. */
export const mitigationEditSchema = z.strictObject({
  mitigationVersion: version,
  notes: text(4000).default(""),
  signs: z.array(signEditSchema).max(500, "Keep at most 500 signs.").default([]),
  keepBarriers: z.array(z.string().max(20)).max(500).default([]),
});
export type MitigationEdit = z.output<typeof mitigationEditSchema>;

/** One sign added to the plan. */
export const signAddSchema = z.strictObject({
  mitigationVersion: version,
  category: signEditSchema.shape.category,
  x: coordinate("x in metres"),
  y: coordinate("y in metres"),
  where: text(200).default(""),
  note: text(500).default(""),
});
export type SignAdd = z.output<typeof signAddSchema>;
