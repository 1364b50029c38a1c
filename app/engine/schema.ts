/**
 * Request and response schemas (zod) of the evaluation — the one JSON shape
 * shared by the web app, the command line and the filed assessment bundles.
 * See README.md in this folder for the field reference.
 */
import { z } from "zod";
import { STANDARD_IDS, TIERS } from "./limits";

/** Size bounds (see README): samples = grid points × heights (+ points); evaluations = samples × emitters. */
export const MAX_SAMPLES = 8_000_000;
export const MAX_EVALUATIONS = 400_000_000;
export const MAX_EMITTERS = 1000;
export const MAX_POINTS = 100_000;
export const MAX_HEIGHTS = 101;

const finite = z.number();
const cutPoint = z.strictObject({ angleDeg: finite, attenuationDb: z.number().min(0).max(200) });

export const patternSchema = z.union([
  z.literal("isotropic"),
  z.strictObject({ type: z.literal("isotropic") }),
  z.strictObject({
    type: z.literal("3gpp-38.901"),
    hBeamwidthDeg: z.number().gt(0).max(360),
    vBeamwidthDeg: z.number().gt(0).max(180),
    maxAttenuationDb: z.number().min(0).max(200).default(30),
    sideLobeDb: z.number().min(0).max(200).default(30),
  }),
  z.strictObject({
    type: z.literal("itu-r-f.1336-sectoral"),
    hBeamwidthDeg: z.number().gt(0).max(180),
    vBeamwidthDeg: z.number().gt(0).max(90),
    k: z.number().min(0).max(1).default(0.7),
  }),
  z.strictObject({
    type: z.literal("tabulated"),
    horizontal: z.array(cutPoint).min(1).max(3600),
    vertical: z.array(cutPoint).min(1).max(3600),
    maxAttenuationDb: z.number().min(0).max(200).optional(),
  }),
]);

const xyz = z.strictObject({ x: finite, y: finite, z: finite });

export const emitterSchema = z
  .strictObject({
    id: z.string().min(1).max(200),
    frequencyMHz: z.number().gt(0).max(300_000),
    powerW: z.number().min(0).max(1e9),
    lossDb: z.number().min(0).max(100).default(0),
    gainDbi: z.number().min(-50).max(80),
    position: xyz,
    azimuthDeg: finite.default(0),
    tiltDeg: z.number().min(-90).max(90).default(0),
    pattern: patternSchema.default("isotropic"),
    model: z.enum(["spherical", "cylindrical", "auto", "aperture"]).default("spherical"),
    apertureM: z.number().gt(0).max(1000).optional(),
    hBeamwidthDeg: z.number().gt(0).max(360).optional(),
    reflectionFactor: z.number().min(1).max(4).default(1),
    dutyFactor: z.number().min(0).max(1).default(1),
  })
  .superRefine((e, ctx) => {
    if (e.model !== "spherical" && e.apertureM === undefined) {
      ctx.addIssue({
        code: "custom",
        path: ["apertureM"],
        message: `required for model "${e.model}" (aperture height, or dish diameter for "aperture")`,
      });
    }
  });

const polygonSchema = z.array(z.tuple([finite, finite])).min(3).max(10_000);

export const gridSchema = z
  .strictObject({
    x0: finite,
    y0: finite,
    x1: finite,
    y1: finite,
    step: z.number().gt(0),
    z0: finite.default(0),
    z1: finite.optional(),
    zCount: z.number().int().min(1).max(MAX_HEIGHTS).default(1),
    mode: z.enum(["average", "max"]).default("average"),
    /** Evaluate only cells inside any of these polygons ([x, y] vertices). */
    polygons: z.array(polygonSchema).max(1000).optional(),
    /** Contour polylines at these percentages of the limit. */
    contours: z.array(z.number().gt(0)).max(50).optional(),
    /** Also classify each cell against both tiers (0 under general, 1 general–occupational, 2 over occupational). */
    classify: z.boolean().default(false),
  })
  .superRefine((g, ctx) => {
    if (g.x1 < g.x0) ctx.addIssue({ code: "custom", path: ["x1"], message: "must be ≥ x0" });
    if (g.y1 < g.y0) ctx.addIssue({ code: "custom", path: ["y1"], message: "must be ≥ y0" });
    if (g.zCount > 1 && g.z1 === undefined) ctx.addIssue({ code: "custom", path: ["z1"], message: "required when zCount > 1" });
  });

export const workAreaSchema = z.strictObject({
  polygon: polygonSchema,
  tier: z.enum(TIERS).optional(),
  /** Ids of the emitters the plan may change (default: all). */
  adjustable: z.array(z.string()).optional(),
  /** Target maximum, percent of limit (default 100). */
  targetPercent: z.number().gt(0).max(100).default(100),
});

export const pointSchema = z.strictObject({ x: finite, y: finite, z: finite, label: z.string().max(200).optional() });

/** Grid axis length: x0 + i·step for i = 0… while ≤ x1 (1e-9 slack, as numpy.arange(x0, x1 + 1e-9, step)). */
export const axisCount = (a0: number, a1: number, step: number): number => Math.ceil((a1 - a0 + 1e-9) / step);

export const requestSchema = z
  .strictObject({
    standard: z.enum(STANDARD_IDS),
    tier: z.enum(TIERS),
    emitters: z.array(emitterSchema).min(1).max(MAX_EMITTERS),
    points: z.array(pointSchema).max(MAX_POINTS).optional(),
    grid: gridSchema.optional(),
    workArea: workAreaSchema.optional(),
  })
  .superRefine((r, ctx) => {
    if (!r.points && !r.grid) ctx.addIssue({ code: "custom", path: ["grid"], message: "give points[] and/or grid" });
    if (r.workArea && !r.grid) ctx.addIssue({ code: "custom", path: ["workArea"], message: "needs a grid" });
    const ids = new Set<string>();
    r.emitters.forEach((e, i) => {
      if (ids.has(e.id)) ctx.addIssue({ code: "custom", path: ["emitters", i, "id"], message: `duplicate id "${e.id}"` });
      ids.add(e.id);
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
  });

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
  eVm: z.number().nullable(),
  hAm: z.number().nullable(),
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
    }),
  ),
  points: z
    .array(
      z.object({
        x: z.number(),
        y: z.number(),
        z: z.number(),
        label: z.string().optional(),
        totalPercent: z.number(),
        contributions: z.array(contribution),
      }),
    )
    .optional(),
  grid: z
    .object({
      nx: z.number().int(),
      ny: z.number().int(),
      nz: z.number().int(),
      x0: z.number(),
      y0: z.number(),
      step: z.number(),
      heights: z.array(z.number()),
      mode: z.enum(["average", "max"]),
      maxPercent: z.number(),
      maxAt: z.object({ x: z.number(), y: z.number() }).nullable(),
      percent: z.array(z.number()),
      mask: z.array(z.number().int()).optional(),
      classes: z.array(z.number().int()).optional(),
      contours: z
        .array(z.object({ percent: z.number(), lines: z.array(z.array(z.tuple([z.number(), z.number()]))) }))
        .optional(),
    })
    .optional(),
  workArea: z
    .object({
      tier: z.enum(TIERS),
      targetPercent: z.number(),
      maxPercentBefore: z.number(),
      maxPercentAfter: z.number(),
      feasible: z.boolean(),
      changes: z.array(
        z.object({ id: z.string(), powerFactor: z.number(), reductionDb: z.number().nullable(), switchOff: z.boolean() }),
      ),
    })
    .optional(),
});

export type EvaluationResponse = z.output<typeof responseSchema>;
