/**
 * Request and response schemas (zod, the tree-shakable "zod/mini" build so the
 * command line starts fast) of the evaluation — the one JSON shape shared by
 * the web app, the command line and the filed assessment bundles. See
 * README.md in this folder for the field reference.
 */
import * as z from "zod/mini";
import en from "zod/v4/locales/en.js";
import { axisCount } from "./axes";
import { STANDARD_IDS, TIERS } from "./limits";

// zod/mini ships without messages; the English ones say what was expected ("Too small: expected number to be >=0").
z.config(en());

/** Size bounds (see README): samples = grid points × heights (+ points); evaluations = samples × emitters. */
export const MAX_SAMPLES = 8_000_000;
export const MAX_EVALUATIONS = 400_000_000;
export const MAX_EMITTERS = 1000;
export const MAX_POINTS = 100_000;
export const MAX_HEIGHTS = 101;

const range = (lo: number, hi: number) => z.number().check(z.gte(lo), z.lte(hi));
const openRange = (lo: number, hi: number) => z.number().check(z.gt(lo), z.lte(hi));
const cutPoint = z.strictObject({ angleDeg: z.number(), attenuationDb: range(0, 200) });

export const patternSchema = z.union([
  z.literal("isotropic"),
  z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("isotropic") }),
  z.strictObject({
    type: z.literal("3gpp-38.901"),
    hBeamwidthDeg: openRange(0, 360),
    vBeamwidthDeg: openRange(0, 180),
    maxAttenuationDb: z._default(range(0, 200), 30),
    sideLobeDb: z._default(range(0, 200), 30),
  }),
  z.strictObject({
    type: z.literal("itu-r-f.1336-sectoral"),
    hBeamwidthDeg: openRange(0, 180),
    vBeamwidthDeg: openRange(0, 90),
    kH: z.optional(range(0, 1)),
    kV: z.optional(range(0, 1)),
    kP: z.optional(range(0, 1)),
  }),
  z.strictObject({
    type: z.literal("tabulated"),
    horizontal: z.array(cutPoint).check(z.minLength(1), z.maxLength(3600)),
    vertical: z.array(cutPoint).check(z.minLength(1), z.maxLength(3600)),
    maxAttenuationDb: z.optional(range(0, 200)),
  }),
  ]),
]);

const xyz = z.strictObject({ x: z.number(), y: z.number(), z: z.number() });

export const emitterSchema = z
  .strictObject({
    id: z.string().check(z.minLength(1), z.maxLength(200)),
    frequencyMHz: openRange(0, 300_000),
    powerW: range(0, 1e9),
    lossDb: z._default(range(0, 100), 0),
    gainDbi: range(-50, 80),
    position: xyz,
    azimuthDeg: z._default(z.number(), 0),
    tiltDeg: z._default(range(-90, 90), 0),
    pattern: z._default(patternSchema, "isotropic"),
    model: z._default(z.enum(["spherical", "cylindrical", "auto", "aperture"]), "spherical"),
    apertureM: z.optional(openRange(0, 1000)),
    hBeamwidthDeg: z.optional(openRange(0, 360)),
    reflectionFactor: z._default(range(1, 4), 1),
    dutyFactor: z._default(range(0, 1), 1),
  })
  .check(
    z.superRefine((e, ctx) => {
      if (e.model !== "spherical" && e.apertureM === undefined) {
        ctx.addIssue({
          code: "custom",
          path: ["apertureM"],
          message: `required for model "${e.model}" (aperture height, or dish diameter for "aperture")`,
        });
      }
    }),
  );

const polygonSchema = z.array(z.tuple([z.number(), z.number()])).check(z.minLength(3), z.maxLength(10_000));

export const gridSchema = z
  .strictObject({
    x0: z.number(),
    y0: z.number(),
    x1: z.number(),
    y1: z.number(),
    step: z.number().check(z.gt(0)),
    z0: z._default(z.number(), 0),
    z1: z.optional(z.number()),
    zCount: z._default(z.int().check(z.gte(1), z.lte(MAX_HEIGHTS)), 1),
    mode: z._default(z.enum(["average", "max"]), "average"),
    /** Evaluate only cells inside any of these polygons ([x, y] vertices). */
    polygons: z.optional(z.array(polygonSchema).check(z.maxLength(1000))),
    /** Contour polylines at these percentages of the limit. */
    contours: z.optional(z.array(z.number().check(z.gt(0))).check(z.maxLength(50))),
    /** Also classify each cell against both tiers (0 under general, 1 general–occupational, 2 over occupational). */
    classify: z._default(z.boolean(), false),
  })
  .check(
    z.superRefine((g, ctx) => {
      if (g.x1 < g.x0) ctx.addIssue({ code: "custom", path: ["x1"], message: "must be ≥ x0" });
      if (g.y1 < g.y0) ctx.addIssue({ code: "custom", path: ["y1"], message: "must be ≥ y0" });
      if (g.zCount > 1 && g.z1 === undefined) ctx.addIssue({ code: "custom", path: ["z1"], message: "required when zCount > 1" });
    }),
  );

export const workAreaSchema = z.strictObject({
  polygon: polygonSchema,
  tier: z.optional(z.enum(TIERS)),
  /** Ids of the emitters the plan may change (default: all). */
  adjustable: z.optional(z.array(z.string())),
  /** Target maximum, percent of limit (default 100). */
  targetPercent: z._default(openRange(0, 100), 100),
});

export const pointSchema = z.strictObject({
  x: z.number(),
  y: z.number(),
  z: z.number(),
  label: z.optional(z.string().check(z.maxLength(200))),
});

export const requestSchema = z
  .strictObject({
    standard: z.enum(STANDARD_IDS),
    tier: z.enum(TIERS),
    emitters: z.array(emitterSchema).check(z.minLength(1), z.maxLength(MAX_EMITTERS)),
    points: z.optional(z.array(pointSchema).check(z.maxLength(MAX_POINTS))),
    grid: z.optional(gridSchema),
    workArea: z.optional(workAreaSchema),
    /** FCC §1.1307(b)(3)(i)(C) screening of each emitter alone at this separation distance (m). */
    screening: z.optional(z.strictObject({ distanceM: z.number().check(z.gt(0)) })),
  })
  .check(
    z.superRefine((r, ctx) => {
      if (!r.points && !r.grid) ctx.addIssue({ code: "custom", path: ["grid"], message: "give points[] and/or grid" });
      if (r.workArea && !r.grid) ctx.addIssue({ code: "custom", path: ["workArea"], message: "needs a grid" });
      const ids = new Set<string>();
      r.emitters.forEach((e, i) => {
        if (ids.has(e.id)) ctx.addIssue({ code: "custom", path: ["emitters", i, "id"], message: `duplicate id "${e.id}"` });
        ids.add(e.id);
      });
      r.workArea?.adjustable?.forEach((id, k) => {
        if (!ids.has(id)) ctx.addIssue({ code: "custom", path: ["workArea", "adjustable", k], message: `"${id}" is not the id of any emitter` });
      });
      let samples = r.points?.length ?? 0;
      if (r.grid) {
        const g = r.grid;
        const n = axisCount(g.x0, g.x1, g.step) * axisCount(g.y0, g.y1, g.step) * g.zCount;
        samples += (g.classify ? 2 : 1) * n;
      }
      if (samples > MAX_SAMPLES) {
        ctx.addIssue({
          code: "custom",
          path: ["grid"],
          message: `request too large: ${samples} samples (grid points × heights, ×2 with classify, + points) exceeds the bound of ${MAX_SAMPLES}`,
        });
      } else if (samples * r.emitters.length > MAX_EVALUATIONS) {
        ctx.addIssue({
          code: "custom",
          path: ["emitters"],
          message: `request too large: ${samples * r.emitters.length} emitter-sample evaluations exceeds the bound of ${MAX_EVALUATIONS}`,
        });
      }
    }),
  );

/** A request as written (defaults optional). */
export type EvaluationRequestInput = z.input<typeof requestSchema>;
/** A validated request (defaults filled in). */
export type EvaluationRequest = z.output<typeof requestSchema>;
export type EmitterInput = z.output<typeof emitterSchema>;
export type GridInput = z.output<typeof gridSchema>;
export type WorkAreaInput = z.output<typeof workAreaSchema>;

const limitOut = z.object({
  sWm2: z.number(),
  sFromTable: z.boolean(),
  eVm: z.nullable(z.number()),
  hAm: z.nullable(z.number()),
  averagingMinutes: z.number(),
  rangeMHz: z.tuple([z.number(), z.number()]),
  source: z.string(),
});

const contribution = z.object({ id: z.string(), powerDensityWm2: z.number(), percent: z.number() });

export const responseSchema = z.object({
  engine: z.string(),
  standard: z.enum(STANDARD_IDS),
  tier: z.enum(TIERS),
  emitters: z.array(
    z.object({
      id: z.string(),
      inputPowerW: z.number(),
      eirpW: z.number(),
      erpW: z.number(),
      limitWm2: z.number(),
      limit: limitOut,
      model: z.string(),
      complianceDistanceM: z.number(),
      exemption: z.optional(
        z.object({
          frequencyMHz: z.number(),
          distanceM: z.number(),
          erpW: z.number(),
          thresholdErpW: z.nullable(z.number()),
          minDistanceM: z.number(),
          applicable: z.boolean(),
          exempt: z.boolean(),
          reason: z.string(),
        }),
      ),
    }),
  ),
  points: z.optional(
    z.array(
      z.object({
        x: z.number(),
        y: z.number(),
        z: z.number(),
        label: z.optional(z.string()),
        totalPercent: z.number(),
        contributions: z.array(contribution),
      }),
    ),
  ),
  grid: z.optional(
    z.object({
      nx: z.int(),
      ny: z.int(),
      nz: z.int(),
      x0: z.number(),
      y0: z.number(),
      step: z.number(),
      heights: z.array(z.number()),
      mode: z.enum(["average", "max"]),
      maxPercent: z.number(),
      maxAt: z.nullable(z.object({ x: z.number(), y: z.number() })),
      percent: z.array(z.number()),
      mask: z.optional(z.array(z.int())),
      classes: z.optional(z.array(z.int())),
      contours: z.optional(
        z.array(z.object({ percent: z.number(), lines: z.array(z.array(z.tuple([z.number(), z.number()]))) })),
      ),
    }),
  ),
  workArea: z.optional(
    z.object({
      tier: z.enum(TIERS),
      targetPercent: z.number(),
      maxPercentBefore: z.number(),
      maxPercentAfter: z.number(),
      feasible: z.boolean(),
      changes: z.array(
        z.object({ id: z.string(), powerFactor: z.number(), reductionDb: z.nullable(z.number()), switchOff: z.boolean() }),
      ),
    }),
  ),
});

export type EvaluationResponse = z.output<typeof responseSchema>;
