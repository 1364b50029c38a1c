// One set of rules for an emitter, whichever door it comes through: the JSON API (the issue's
// contract), the table's inline form (Conform coerces its text) and the CSV import. Pure, so the
// browser checks a row as the person types with the same messages the server answers.
import { z } from "zod";
import { numberIn, oneOf, recordId, requiredText, text } from "~/lib/fields";

export const POWER_UNITS = ["W", "dBm"] as const;
export const GAIN_UNITS = ["dBi", "dBd"] as const;
export const MODELS = ["spherical", "cylindrical", "auto", "aperture"] as const;
export const PARAMETRIC_KINDS = ["3gpp-38.901", "itu-r-f.1336-sectoral"] as const;
export type PowerUnit = (typeof POWER_UNITS)[number];
export type GainUnit = (typeof GAIN_UNITS)[number];
export type ModelName = (typeof MODELS)[number];
export type ParametricKind = (typeof PARAMETRIC_KINDS)[number];

export const modelLabels: Record<ModelName, string> = { spherical: "Spherical (far field)", cylindrical: "Cylindrical (near field)", auto: "Auto (by distance)", aperture: "Aperture (dish)" };
export const parametricLabels: Record<ParametricKind, string> = { "3gpp-38.901": "3GPP TR 38.901 element", "itu-r-f.1336-sectoral": "ITU-R F.1336 sectoral" };

export const EMITTER_LIMITS = { label: 40, operator: 100, band: 60, notes: 1000 } as const;

const hBeam = numberIn("the horizontal beamwidth in degrees", { min: 0, exclusiveMin: true, max: 360 });
const vBeam = numberIn("the vertical beamwidth in degrees", { min: 0, exclusiveMin: true, max: 180 });
const db = (what: string) => numberIn(what, { min: 0, max: 200 });

/** The engine's parametric pattern objects (app/engine/schema.ts), with our messages. */
export const parametricPatternSchema = z.discriminatedUnion(
  "type",
  [
    z.strictObject({ type: z.literal("isotropic") }),
    z.strictObject({ type: z.literal("3gpp-38.901"), hBeamwidthDeg: hBeam, vBeamwidthDeg: vBeam, maxAttenuationDb: db("the maximum attenuation in dB").default(30), sideLobeDb: db("the side-lobe level in dB").default(30) }),
    z.strictObject({
      type: z.literal("itu-r-f.1336-sectoral"),
      hBeamwidthDeg: numberIn("the horizontal beamwidth in degrees", { min: 0, exclusiveMin: true, max: 180 }),
      vBeamwidthDeg: numberIn("the vertical beamwidth in degrees", { min: 0, exclusiveMin: true, max: 90 }),
      kH: numberIn("k_h", { min: 0, max: 1 }).optional(),
      kV: numberIn("k_v", { min: 0, max: 1 }).optional(),
      kP: numberIn("k_p", { min: 0, max: 1 }).optional(),
    }),
  ],
  { error: `Give the pattern as { type: "${PARAMETRIC_KINDS.join('" | "')}", hBeamwidthDeg, vBeamwidthDeg }.` },
);
export type ParametricPattern = z.output<typeof parametricPatternSchema>;

const factor = (what: string) => numberIn(what, { min: 0, max: 1 }).default(1);
const coordinate = (axis: string) => numberIn(`${axis} in metres`, { min: -10_000, max: 10_000 });
const tilt = (what: string) => numberIn(what, { min: -90, max: 90 }).default(0);
const size = (what: string) => numberIn(what, { min: 0, exclusiveMin: true, max: 1000 }).nullable().optional().default(null);

const emitterFields = {
  label: requiredText("a label (e.g. A1)", EMITTER_LIMITS.label),
  operator: text(EMITTER_LIMITS.operator).default(""),
  band: text(EMITTER_LIMITS.band).default(""),
  frequencyMHz: numberIn("the frequency in MHz", { min: 0, exclusiveMin: true, max: 300_000 }),
  carriers: numberIn("the number of carriers", { min: 1, max: 1000, integer: true }).default(1),
  lossDb: numberIn("the loss in dB", { min: 0, max: 100 }).default(0),
  gain: numberIn("the gain", { min: -50, max: 80 }),
  gainUnit: oneOf("the gain's unit", GAIN_UNITS).default("dBi"),
  patternId: recordId.nullable().optional().default(null),
  pattern: parametricPatternSchema.nullable().optional().default(null),
  hBeamwidthDeg: hBeam.nullable().optional().default(null),
  vBeamwidthDeg: vBeam.nullable().optional().default(null),
  azimuthDeg: numberIn("the azimuth in degrees", { min: -360, max: 360 }).default(0),
  mechanicalTiltDeg: tilt("the mechanical downtilt in degrees"),
  electricalTiltDeg: tilt("the electrical downtilt in degrees"),
  model: oneOf("a model", MODELS).default("spherical"),
  apertureM: size("the aperture height in metres"),
  dishDiameterM: size("the dish diameter in metres"),
  dutyFactor: factor("the duty factor"),
  actualMaxFactor: factor("F_PR (the actual-maximum power factor)"),
  tddFactor: factor("the TDD downlink factor"),
  active: z.boolean({ error: "Send active as true or false." }).default(true),
  notes: text(EMITTER_LIMITS.notes).default(""),
};

type Checkable = { model: ModelName; apertureM: number | null; dishDiameterM: number | null; patternId: string | null; pattern: unknown; mechanicalTiltDeg: number; electricalTiltDeg: number };

/** Rules between fields: the model's size, one pattern, a total tilt the engine takes. */
function crossCheck(e: Checkable, ctx: z.RefinementCtx) {
  if ((e.model === "cylindrical" || e.model === "auto") && e.apertureM === null) ctx.addIssue({ code: "custom", path: ["apertureM"], message: `Enter the aperture height in metres for the ${e.model} model.` });
  if (e.model === "aperture" && e.dishDiameterM === null) ctx.addIssue({ code: "custom", path: ["dishDiameterM"], message: "Enter the dish diameter in metres for the aperture model." });
  if (e.patternId && e.pattern) ctx.addIssue({ code: "custom", path: ["pattern"], message: "Choose a library pattern or a parametric one, not both." });
  const total = e.mechanicalTiltDeg + e.electricalTiltDeg;
  if (Math.abs(total) > 90) ctx.addIssue({ code: "custom", path: ["electricalTiltDeg"], message: `The total tilt (${total}°) must lie between −90° and 90°.` });
}

/** An emitter in the JSON API (the issue's contract): power in W, the gain in its unit, position { x, y, z }. */
export const emitterInputSchema = z
  .strictObject({
    id: recordId.optional(),
    ...emitterFields,
    powerPerCarrierW: numberIn("the power per carrier in W", { min: 0, max: 1e6 }),
    powerUnit: oneOf("the power's unit", POWER_UNITS).default("W"),
    position: z.strictObject({ x: coordinate("x"), y: coordinate("y"), z: coordinate("z") }, { error: "Give the position as { x, y, z } in metres." }),
    /** The version read, when the caller wants its edit refused if the row changed since (PUT only checks it when given). */
    version: numberIn("the version you read", { min: 1, integer: true }).optional(),
  })
  .superRefine(crossCheck);
export type EmitterInput = z.output<typeof emitterInputSchema>;

/**
 * The table's row form: the power as typed in W or dBm, the pattern as one choice ("" none,
 * "lib:<id>" a library pattern, or a parametric kind drawn from the beamwidths), x/y/z flat.
 */
export const emitterFormSchema = z
  .object({
    id: recordId.optional(),
    version: numberIn("the version you read", { min: 1, integer: true }).optional(),
    ...emitterFields,
    pattern: z.undefined().optional(),
    patternChoice: z.string().max(80).optional().default(""),
    power: numberIn("the power per carrier", { min: -100, max: 1e6 }),
    powerUnit: oneOf("the power's unit", POWER_UNITS).default("W"),
    x: coordinate("x"),
    y: coordinate("y"),
    z: coordinate("z"),
    active: z.preprocess((v) => v === "on" || v === "true" || v === true, z.boolean()),
  })
  .superRefine((e, ctx) => {
    if (e.powerUnit === "W" && e.power < 0) ctx.addIssue({ code: "custom", path: ["power"], message: "Enter the power per carrier in W of at least 0." });
    if (e.powerUnit === "dBm" && e.power > 90) ctx.addIssue({ code: "custom", path: ["power"], message: "Enter the power per carrier in dBm of at most 90 (1 MW)." });
    const kind = e.patternChoice;
    if ((PARAMETRIC_KINDS as readonly string[]).includes(kind)) {
      if (e.hBeamwidthDeg === null) ctx.addIssue({ code: "custom", path: ["hBeamwidthDeg"], message: "Enter the horizontal beamwidth for a parametric pattern." });
      if (e.vBeamwidthDeg === null) ctx.addIssue({ code: "custom", path: ["vBeamwidthDeg"], message: "Enter the vertical beamwidth for a parametric pattern." });
      if (kind === "itu-r-f.1336-sectoral" && (e.hBeamwidthDeg ?? 0) > 180) ctx.addIssue({ code: "custom", path: ["hBeamwidthDeg"], message: "ITU-R F.1336 takes a horizontal beamwidth up to 180°." });
      if (kind === "itu-r-f.1336-sectoral" && (e.vBeamwidthDeg ?? 0) > 90) ctx.addIssue({ code: "custom", path: ["vBeamwidthDeg"], message: "ITU-R F.1336 takes a vertical beamwidth up to 90°." });
    } else if (kind !== "" && !/^lib:[A-Za-z0-9_-]{1,64}$/.test(kind)) ctx.addIssue({ code: "custom", path: ["patternChoice"], message: "Choose a pattern from the list." });
    crossCheck({ ...e, patternId: null, pattern: null }, ctx);
  });
export type EmitterFormInput = z.output<typeof emitterFormSchema>;
