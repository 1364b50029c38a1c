// The layout as the JSON API and the editor send it (issue 7 §6): surfaces, and optionally
// obstructions, access points and the roof drawing's placement. Shape and lengths here (400);
// the geometry itself is checked by geometry.ts (422), so each refusal names its surface and point.
import { z } from "zod";
import { numberIn, oneOf, recordId, requiredText } from "~/lib/fields";

export const accessKinds = ["public", "workers", "none"] as const;
export type Access = (typeof accessKinds)[number];
export const accessLabels: Record<Access, string> = { public: "General public", workers: "Trained workers only", none: "No access" };

export const accessPointKinds = ["door", "hatch", "ladder", "stair", "gate"] as const;
export type AccessPointKind = (typeof accessPointKinds)[number];

/** Records per list, and points per outline, at most. */
export const LAYOUT_MAX_ITEMS = 500;
export const OUTLINE_MAX_POINTS = 500;
/** A layout body's largest size: 2 MiB (500 outlines of a few dozen points fit easily). */
export const LAYOUT_BODY_MAX_BYTES = 2 * 1024 * 1024;

const metres = (what: string) => z.number({ error: `Enter ${what} in metres, as a number.` });
const point = z.tuple([metres("x"), metres("y")], { error: "Give a point as [x, y] in metres." });
const outline = z.array(point, { error: "Give the outline as a list of [x, y] points." }).max(OUTLINE_MAX_POINTS, `Use at most ${OUTLINE_MAX_POINTS} points.`);
const name = (what: string) => requiredText(what, 100);

const area = z.strictObject({
  id: recordId.optional(),
  name: name("the surface's name"),
  kind: z.literal("area"),
  polygon: outline,
  elevationM: metres("the elevation"),
  access: oneOf("who may be there", accessKinds).default("public"),
});

const facade = z.strictObject({
  id: recordId.optional(),
  name: name("the surface's name"),
  kind: z.literal("facade"),
  line: z.array(point, { error: "Give the facade as two [x, y] points." }).max(2, "A facade is one segment: give 2 points."),
  bottomM: metres("the bottom"),
  topM: metres("the top"),
  access: oneOf("who may be there", accessKinds).default("public"),
});

export const surfaceInput = z.discriminatedUnion("kind", [area, facade], { error: "Choose the kind: area or facade." });

export const obstructionInput = z.strictObject({
  id: recordId.optional(),
  name: name("the obstruction's name"),
  polygon: outline,
  baseM: metres("the base").default(0),
  heightM: metres("the height"),
});

export const accessPointInput = z.strictObject({
  id: recordId.optional(),
  name: name("the access point's name"),
  kind: oneOf("a kind of access", accessPointKinds),
  x: metres("x"),
  y: metres("y"),
  z: metres("z").default(0),
  locked: z.boolean({ error: "Say true or false." }).default(false),
});

export const backdropPlacementInput = z.strictObject({
  p1: z.tuple([numberIn("a pixel position", { min: 0, max: 100_000 }), numberIn("a pixel position", { min: 0, max: 100_000 })]),
  p2: z.tuple([numberIn("a pixel position", { min: 0, max: 100_000 }), numberIn("a pixel position", { min: 0, max: 100_000 })]),
  distanceM: numberIn("the distance between the two points in metres", { min: 0.01, max: 20_000 }),
  originX: numberIn("the x of the first point", { min: -10_000, max: 10_000 }),
  originY: numberIn("the y of the first point", { min: -10_000, max: 10_000 }),
  rotationDeg: numberIn("a rotation in degrees", { min: -360, max: 360 }),
  opacity: numberIn("an opacity", { min: 0.05, max: 1 }),
}).refine((b) => Math.hypot(b.p2[0] - b.p1[0], b.p2[1] - b.p1[1]) >= 1, { error: "Pick two different points on the drawing.", path: ["p2"] });

const list = <T extends z.ZodType>(item: T) => z.array(item).max(LAYOUT_MAX_ITEMS, `Send at most ${LAYOUT_MAX_ITEMS}.`);

export const layoutInput = z.strictObject({
  version: numberIn("the version you read", { min: 1, integer: true }).optional(),
  surfaces: list(surfaceInput),
  obstructions: list(obstructionInput).optional(),
  accessPoints: list(accessPointInput).optional(),
  backdrop: backdropPlacementInput.optional(),
});

export type LayoutInput = z.output<typeof layoutInput>;
export type SurfaceInput = z.output<typeof surfaceInput>;
export type ObstructionInput = z.output<typeof obstructionInput>;
export type AccessPointInput = z.output<typeof accessPointInput>;
export type BackdropPlacement = z.output<typeof backdropPlacementInput>;

/** Ids must not repeat within a list: each kept row is sent once. */
export function duplicateIds(input: LayoutInput): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const key of ["surfaces", "obstructions", "accessPoints"] as const) {
    const seen = new Set<string>();
    (input[key] ?? []).forEach((row, i) => {
      if (!row.id) return;
      if (seen.has(row.id)) fields[`${key}[${i}].id`] = "This id is sent twice; send each kept record once.";
      seen.add(row.id);
    });
  }
  return fields;
}
