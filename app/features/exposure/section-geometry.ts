// The geometry of an elevation view: a vertical cut along a line on the plan, its sampling grid
// (distance along the cut × height, one step both ways), and what the cut meets: the levels
// (walkable areas at their elevation), the obstructions, the emitters near it. Pure: the page,
// the benchmark and the tests share it.
import { pointInPolygon, type EmitterInput } from "~/engine";

export type XY = [number, number];
export type Cut = { a: XY; b: XY };
export type SectionGrid = { ns: number; nz: number; step: number; length: number; z0: number; ux: number; uy: number; a: XY };
export type LevelCrossing = { id: string; name: string; elevationM: number; access: "public" | "workers" | "none"; from: number; to: number };
export type SolidCrossing = { id: string; name: string; baseM: number; topM: number; from: number; to: number };
export type AreaLike = { id: string; name: string; kind: "area" | "facade"; polygon: XY[] | null; elevationM: number | null; access: "public" | "workers" | "none" };
export type ObstructionLike = { id: string; name: string; polygon: XY[]; baseM: number; heightM: number };

const round3 = (v: number) => Math.round(v * 1000) / 1000;

/** The emitter with the largest time-averaged EIRP (P·10^(−L/10)·10^(G/10)·δ, OET-65 eq. (2) with the duty factor). */
export function strongestEmitter(emitters: readonly EmitterInput[]): EmitterInput | null {
  let best: EmitterInput | null = null;
  let bestW = -Infinity;
  for (const e of emitters) {
    const w = (e.powerW ?? 0) * 10 ** (-(e.lossDb ?? 0) / 10) * 10 ** ((e.gainDbi ?? 0) / 10) * (e.dutyFactor ?? 1);
    if (w > bestW) {
      bestW = w;
      best = e;
    }
  }
  return best;
}

/** Unit vector of a bearing clockwise from north (+y): (sin az, cos az). */
export const bearingVector = (azimuthDeg: number): XY => [Math.sin((azimuthDeg * Math.PI) / 180), Math.cos((azimuthDeg * Math.PI) / 180)];

/**
 * The default cut through an emitter along its boresight: from `behindM` behind it to where the
 * boresight leaves the box (grown by `marginM`), at least `minAheadM` ahead.
 */
export function boresightCut(e: Pick<EmitterInput, "position" | "azimuthDeg">, box: { minX: number; minY: number; maxX: number; maxY: number }, { behindM = 5, marginM = 5, minAheadM = 15 } = {}): Cut {
  const [ux, uy] = bearingVector(e.azimuthDeg ?? 0);
  const { x, y } = e.position;
  // Ray–box exit distance (slab method).
  let ahead = Infinity;
  const lo = [box.minX - marginM, box.minY - marginM];
  const hi = [box.maxX + marginM, box.maxY + marginM];
  for (const [p, u, l, h] of [[x, ux, lo[0], hi[0]], [y, uy, lo[1], hi[1]]] as const) {
    if (Math.abs(u) < 1e-12) continue;
    ahead = Math.min(ahead, Math.max((l - p) / u, (h - p) / u));
  }
  if (!Number.isFinite(ahead)) ahead = minAheadM;
  ahead = Math.max(ahead, minAheadM);
  return { a: [round3(x - ux * behindM), round3(y - uy * behindM)], b: [round3(x + ux * ahead), round3(y + uy * ahead)] };
}

/**
 * The sampling grid of a cut: `ns` distances 0…length and `nz` heights z0…, one step both ways
 * (square cells, so contours keep their shape), the step the coarsest of `minStep` and what keeps
 * the grid within maxCols × maxRows.
 */
export function sectionGrid(cut: Cut, zMin: number, zMax: number, { minStep = 0.1, maxCols = 360, maxRows = 160 } = {}): SectionGrid {
  const dx = cut.b[0] - cut.a[0];
  const dy = cut.b[1] - cut.a[1];
  const length = Math.hypot(dx, dy);
  const step = Math.max(minStep, length / (maxCols - 1), (zMax - zMin) / (maxRows - 1));
  const ns = Math.floor(length / step + 1e-9) + 1;
  const nz = Math.floor((zMax - zMin) / step + 1e-9) + 1;
  return { ns, nz, step, length, z0: zMin, ux: length ? dx / length : 1, uy: length ? dy / length : 0, a: cut.a };
}

/** Site coordinates of sample (i along, k up). */
export function samplePoint(g: SectionGrid, i: number, k: number): [number, number, number] {
  const s = i * g.step;
  return [g.a[0] + g.ux * s, g.a[1] + g.uy * s, g.z0 + k * g.step];
}

/** Distances along the cut (0…length) where it is inside the polygon, as [from, to] intervals. */
export function intervalsInside(cut: Cut, polygon: readonly XY[]): [number, number][] {
  const [ax, ay] = cut.a;
  const dx = cut.b[0] - ax;
  const dy = cut.b[1] - ay;
  const length = Math.hypot(dx, dy);
  if (!length || polygon.length < 3) return [];
  const ts = [0, 1];
  for (let i = 0; i < polygon.length; i++) {
    const [px, py] = polygon[i];
    const [qx, qy] = polygon[(i + 1) % polygon.length];
    const ex = qx - px;
    const ey = qy - py;
    const den = dx * ey - dy * ex;
    if (Math.abs(den) < 1e-12) continue; // parallel edge: its ends are found by the neighbouring edges
    const t = ((px - ax) * ey - (py - ay) * ex) / den;
    const u = ((px - ax) * dy - (py - ay) * dx) / den;
    if (t > 0 && t < 1 && u >= -1e-12 && u <= 1 + 1e-12) ts.push(t);
  }
  ts.sort((p, q) => p - q);
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < ts.length; i++) {
    const t0 = ts[i];
    const t1 = ts[i + 1];
    if (t1 - t0 < 1e-9) continue;
    const tm = (t0 + t1) / 2;
    if (!pointInPolygon(ax + dx * tm, ay + dy * tm, polygon)) continue;
    const last = out[out.length - 1];
    if (last && Math.abs(last[1] - t0 * length) < 1e-9) last[1] = t1 * length;
    else out.push([t0 * length, t1 * length]);
  }
  return out.map(([a, b]) => [round3(a), round3(b)]);
}

/** The walkable areas the cut crosses, each interval at the area's elevation. */
export function levelsInSection(cut: Cut, surfaces: readonly AreaLike[]): LevelCrossing[] {
  return surfaces.flatMap((s) =>
    s.kind === "area" && s.polygon ? intervalsInside(cut, s.polygon).map(([from, to]) => ({ id: s.id, name: s.name, elevationM: s.elevationM ?? 0, access: s.access, from, to })) : [],
  );
}

/** The obstructions the cut crosses, as boxes from their base to their top. */
export function obstructionsInSection(cut: Cut, obstructions: readonly ObstructionLike[]): SolidCrossing[] {
  return obstructions.flatMap((o) => intervalsInside(cut, o.polygon).map(([from, to]) => ({ id: o.id, name: o.name, baseM: o.baseM, topM: o.baseM + o.heightM, from, to })));
}

/** Emitters within `withinM` of the cut (measured square to it, between its ends): their distance along it and height. */
export function emittersNearCut(cut: Cut, emitters: readonly EmitterInput[], withinM = 1.5) {
  const dx = cut.b[0] - cut.a[0];
  const dy = cut.b[1] - cut.a[1];
  const length = Math.hypot(dx, dy) || 1;
  const ux = dx / length;
  const uy = dy / length;
  return emitters.flatMap((e) => {
    const px = e.position.x - cut.a[0];
    const py = e.position.y - cut.a[1];
    const s = px * ux + py * uy;
    const off = Math.abs(-px * uy + py * ux);
    return s >= 0 && s <= length && off <= withinM ? [{ id: e.id, s: round3(s), z: e.position.z, offsetM: round3(off) }] : [];
  });
}

/** The height span of the view: from below the lowest level to above the highest antenna or obstruction top. */
export function heightSpan(levels: readonly { elevationM: number }[], tops: readonly number[], { below = 1, above = 3 } = {}): [number, number] {
  const lo = Math.min(0, ...levels.map((l) => l.elevationM)) - below;
  const hi = Math.max(lo + 6, ...tops) + above;
  return [round3(lo), round3(hi)];
}
