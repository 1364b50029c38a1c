// The plan's frame: site metres (x east, y north) to SVG pixels (y down) and back, fitted to
// the geometry with a margin. Pure, so the plan, the click-to-draw tool and tests share it.
export type XY = [number, number];
export type Bounds = { minX: number; minY: number; maxX: number; maxY: number };

export type PlanFrame = {
  bounds: Bounds;
  /** Pixels per metre. */
  scale: number;
  width: number;
  height: number;
  toPx: (x: number, y: number) => XY;
  toSite: (px: number, py: number) => XY;
  /** The plan's own names already drawn (pixel boxes), for layers on top to keep clear of. */
  labels?: readonly { x0: number; y0: number; x1: number; y1: number }[];
};

/** The smallest box holding every point, or a 20 m square around the origin when there are none. */
export function boundsOf(points: Iterable<XY>): Bounds {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const [x, y] of points) {
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x);
    maxY = Math.max(maxY, y);
  }
  if (minX === Infinity) return { minX: -10, minY: -10, maxX: 10, maxY: 10 };
  return { minX, minY, maxX, maxY };
}

/** Fits the bounds (grown by `margin` metres, at least `minSpan` across) into `width` pixels. */
export function makeFrame(bounds: Bounds, options: { width?: number; margin?: number; minSpan?: number; maxAspect?: number } = {}): PlanFrame {
  const width = options.width ?? 960;
  const margin = options.margin ?? 3;
  const minSpan = options.minSpan ?? 10;
  const maxAspect = options.maxAspect ?? 1.2;
  let { minX, minY, maxX, maxY } = bounds;
  minX -= margin; minY -= margin; maxX += margin; maxY += margin;
  const grow = (lo: number, hi: number, want: number): [number, number] => {
    const extra = Math.max(0, want - (hi - lo)) / 2;
    return [lo - extra, hi + extra];
  };
  [minX, maxX] = grow(minX, maxX, minSpan);
  [minY, maxY] = grow(minY, maxY, minSpan);
  // Keep the drawing from becoming a tall strip: widen x so height ≤ maxAspect × width.
  [minX, maxX] = grow(minX, maxX, (maxY - minY) / maxAspect);
  const scale = width / (maxX - minX);
  const height = Math.round((maxY - minY) * scale);
  return {
    bounds: { minX, minY, maxX, maxY },
    scale,
    width,
    height,
    toPx: (x, y) => [(x - minX) * scale, (maxY - y) * scale],
    toSite: (px, py) => [minX + px / scale, maxY - py / scale],
  };
}

/** Rounds to the nearest multiple of step (0.1 m by default), without float noise like 1.2000000000000002. */
export function snap(value: number, step = 0.1) {
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  return Number((Math.round(value / step) * step).toFixed(decimals));
}

/** A "nice" scale-bar length in metres: 1, 2 or 5 × 10ⁿ, near a quarter of the plan's width. */
export function scaleBarMetres(frame: PlanFrame) {
  const target = (frame.bounds.maxX - frame.bounds.minX) / 4;
  const power = 10 ** Math.floor(Math.log10(target));
  const unit = [5, 2, 1].find((m) => m * power <= target) ?? 1;
  return unit * power;
}

/** A roof drawing's placement: two image pixels a known distance apart, where the first lands, and a clockwise turn. */
export type BackdropPlacementLike = { widthPx: number; heightPx: number; p1: XY; p2: XY; distanceM: number; originX: number; originY: number; rotationDeg: number };

/**
 * Where an image pixel (u right, v down) lies on the site: scaled by distanceM over the pixel
 * distance p1–p2, turned clockwise (as seen on the plan) by rotationDeg about p1, and moved so p1
 * lands on (originX, originY). A similarity transform; common practice, no source.
 */
export function backdropToSite(b: BackdropPlacementLike, u: number, v: number): XY {
  const metresPerPixel = b.distanceM / (Math.hypot(b.p2[0] - b.p1[0], b.p2[1] - b.p1[1]) || 1);
  const dx = (u - b.p1[0]) * metresPerPixel;
  const dy = (v - b.p1[1]) * metresPerPixel; // downwards on screen
  const turn = (b.rotationDeg * Math.PI) / 180;
  const rx = dx * Math.cos(turn) - dy * Math.sin(turn);
  const ry = dx * Math.sin(turn) + dy * Math.cos(turn);
  return [b.originX + rx, b.originY - ry];
}

/** The four corners of the placed drawing in site metres, so the plan's frame can hold it. */
export function backdropCorners(b: BackdropPlacementLike): XY[] {
  return [[0, 0], [b.widthPx, 0], [b.widthPx, b.heightPx], [0, b.heightPx]].map(([u, v]) => backdropToSite(b, u, v));
}
