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

/**
 * An edit of the plan (the API's PATCH and each of the page's small forms: one sign, one barrier, the
 * notes): signs named by id are changed or removed, barriers named are removed, what is left out stays.
 */
export const mitigationPatchSchema = z.strictObject({
  mitigationVersion: version,
  notes: text(4000).optional(),
  signs: z.array(signEditSchema.extend({ id: z.string({ error: "Name the sign by its id." }).max(20) })).max(500, "Keep at most 500 signs.").optional(),
  removeBarriers: z.array(z.string().max(20)).max(500).optional(),
});
export type MitigationEdit = z.output<typeof mitigationPatchSchema>;

/** One sign added to the plan, on one of the assessment's surfaces (none: the site's datum level). */
export const signAddSchema = z.strictObject({
  mitigationVersion: version,
  surfaceId: z.string().max(64).optional(),
  category: signEditSchema.shape.category,
  x: coordinate("x in metres"),
  y: coordinate("y in metres"),
  where: text(200).default(""),
  note: text(500).default(""),
});
export type SignAdd = z.output<typeof signAddSchema>;
