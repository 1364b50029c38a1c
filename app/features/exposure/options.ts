// How a site is evaluated: the standard and tier, the heights above each surface and how they
// combine, the grid step, the reflection factor and the model for emitters that set none.
// One Zod schema for the Exposure options form, the URL and the assessments API.
import { z } from "zod";
import { STANDARD_IDS, TIERS, type StandardId, type Tier } from "~/engine/limits";
import type { ModelName } from "./engine-inputs";

export const standardLabels: Record<StandardId, string> = {
  fcc: "US FCC 47 CFR §1.1310",
  "icnirp-2020": "ICNIRP 2020",
  "icnirp-1998": "ICNIRP 1998",
  "ieee-c95.1-2019": "IEEE C95.1-2019",
  "sc6-2015": "Health Canada Safety Code 6 (2015)",
};

/** Each standard's own words for the two tiers. */
export const tierLabels: Record<StandardId, Record<Tier, string>> = {
  fcc: { general: "general population / uncontrolled", occupational: "occupational / controlled" },
  "icnirp-2020": { general: "general public", occupational: "occupational" },
  "icnirp-1998": { general: "general public", occupational: "occupational" },
  "ieee-c95.1-2019": { general: "unrestricted environment", occupational: "restricted environment" },
  "sc6-2015": { general: "uncontrolled environment", occupational: "controlled environment" },
};

export const reflectionFactors = [1, 2.56, 4] as const;
export const modelNames = ["spherical", "cylindrical", "auto", "aperture"] as const satisfies readonly ModelName[];

export const heightsSchema = z
  .strictObject({
    fromM: z.number({ error: "Enter the lowest height in metres." }).min(-5, "Use a height from −5 to 10 m.").max(10, "Use a height from −5 to 10 m.").default(0),
    toM: z.number({ error: "Enter the highest height in metres." }).min(-5, "Use a height from −5 to 10 m.").max(10, "Use a height from −5 to 10 m.").default(2),
    count: z.number({ error: "Enter how many heights." }).int("Use a whole number of heights.").min(1, "Use 1 to 41 heights.").max(41, "Use 1 to 41 heights.").default(11),
  })
  .refine((h) => h.toM >= h.fromM, { message: "The highest height must not be below the lowest.", path: ["toM"] })
  .refine((h) => h.count === 1 || h.toM > h.fromM, { message: "With more than one height, the span needs a top above its bottom.", path: ["toM"] });

export const optionsSchema = z.strictObject({
  standard: z.enum(STANDARD_IDS, { error: `Choose a standard: ${STANDARD_IDS.join(", ")}.` }),
  tier: z.enum(TIERS, { error: "Choose the tier: general or occupational." }),
  gridStepM: z.number({ error: "Enter the grid step in metres." }).min(0.1, "Use a grid step from 0.1 to 5 m.").max(5, "Use a grid step from 0.1 to 5 m.").default(0.25),
  heights: heightsSchema.default({ fromM: 0, toM: 2, count: 11 }),
  mode: z.enum(["average", "max"], { error: "Choose average or max." }).default("average"),
  reflectionFactor: z.union([z.literal(1), z.literal(2.56), z.literal(4)], { error: "Choose a reflection factor of 1, 2.56 or 4." }).default(1),
  defaultModel: z.enum(modelNames, { error: `Choose a model: ${modelNames.join(", ")}.` }).default("spherical"),
});

export type ExposureOptions = z.output<typeof optionsSchema>;

export const defaultOptions: ExposureOptions = optionsSchema.parse({ standard: "fcc", tier: "general" });

/** The other tier, for classes and compliance distances. */
export const otherTier = (tier: Tier): Tier => (tier === "general" ? "occupational" : "general");

/** "spatial average over 0–2 m (11 heights)", "maximum over …", "at 1.5 m". */
export function describeHeights(o: Pick<ExposureOptions, "heights" | "mode">) {
  const { fromM, toM, count } = o.heights;
  if (count === 1) return `at ${fromM} m above each surface`;
  return `${o.mode === "average" ? "spatial average" : "maximum"} over ${fromM}–${toM} m above each surface (${count} heights)`;
}

/** URL search parameter names of the options, shared by the Exposure pages (map, section, solid, planner). */
const searchKeys = { standard: "standard", tier: "tier", gridStepM: "step", fromM: "from", toM: "to", count: "heights", mode: "mode", reflectionFactor: "reflection", defaultModel: "model" } as const;

/** Options from a URL: absent or invalid values fall back to the defaults, field by field, with the messages for the ones refused. */
export function optionsFromSearch(search: URLSearchParams, base: ExposureOptions = defaultOptions): { options: ExposureOptions; errors: Record<string, string> } {
  const num = (key: string) => {
    const raw = search.get(key);
    return raw === null || raw.trim() === "" ? undefined : Number(raw);
  };
  const candidate = {
    standard: search.get(searchKeys.standard) ?? base.standard,
    tier: search.get(searchKeys.tier) ?? base.tier,
    gridStepM: num(searchKeys.gridStepM) ?? base.gridStepM,
    heights: { fromM: num(searchKeys.fromM) ?? base.heights.fromM, toM: num(searchKeys.toM) ?? base.heights.toM, count: num(searchKeys.count) ?? base.heights.count },
    mode: search.get(searchKeys.mode) ?? base.mode,
    reflectionFactor: num(searchKeys.reflectionFactor) ?? base.reflectionFactor,
    defaultModel: search.get(searchKeys.defaultModel) ?? base.defaultModel,
  };
  const parsed = optionsSchema.safeParse(candidate);
  if (parsed.success) return { options: parsed.data, errors: {} };
  const errors: Record<string, string> = {};
  const fallback = structuredClone(candidate) as Record<string, unknown>;
  for (const issue of parsed.error.issues) {
    const [top, inner] = issue.path as string[];
    errors[inner ? `${top}.${inner}` : top] ??= issue.message;
    fallback[top] = (base as Record<string, unknown>)[top];
  }
  const again = optionsSchema.safeParse(fallback);
  return { options: again.success ? again.data : base, errors };
}

/** The options as URL search parameters (only those that differ from the defaults). */
export function optionsToSearch(o: ExposureOptions): URLSearchParams {
  const d = defaultOptions;
  const out = new URLSearchParams();
  const put = (key: string, value: string | number, fallback: string | number) => {
    if (value !== fallback) out.set(key, String(value));
  };
  put(searchKeys.standard, o.standard, d.standard);
  put(searchKeys.tier, o.tier, d.tier);
  put(searchKeys.gridStepM, o.gridStepM, d.gridStepM);
  put(searchKeys.fromM, o.heights.fromM, d.heights.fromM);
  put(searchKeys.toM, o.heights.toM, d.heights.toM);
  put(searchKeys.count, o.heights.count, d.heights.count);
  put(searchKeys.mode, o.mode, d.mode);
  put(searchKeys.reflectionFactor, o.reflectionFactor, d.reflectionFactor);
  put(searchKeys.defaultModel, o.defaultModel, d.defaultModel);
  return out;
}
