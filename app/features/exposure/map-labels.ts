// Labels on the exposure map placed so they overlap neither each other nor the marks: a greedy
// placer (common practice for map labels, no source). Labels go in priority order; each tries
// places around its anchor, nearest first (right, left, above, below, the diagonals), then the
// same further out with a leader line, and takes the first that touches no mark, no placed label
// and stays on the plan; when none is free, the place that overlaps least. Pure, in pixels.
export type Box = [number, number, number, number]; // x0, y0, x1, y1
export type LabelRequest = {
  key: string;
  at: [number, number];
  text: string;
  size?: number;
  bold?: boolean;
  gap?: number;
  /** Places to try instead of those around `at`: the label's left edge and top, in order. */
  places?: [number, number][];
};
export type PlacedLabel = { key: string; x: number; y: number; box: Box; leader: boolean; anchorX: number; anchorY: number };

/** A text's width estimate for the plan's font (Atkinson Hyperlegible: about 0.6 em a character). */
export const textWidth = (text: string, size = 10, bold = false) => text.length * size * (bold ? 0.64 : 0.6);

export const overlapArea = (a: Box, b: Box) => Math.max(0, Math.min(a[2], b[2]) - Math.max(a[0], b[0])) * Math.max(0, Math.min(a[3], b[3]) - Math.max(a[1], b[1]));

/** A square box of half-size `r` around a point. */
export const around = ([x, y]: [number, number], r: number): Box => [x - r, y - r, x + r, y + r];

/** Boxes along a segment (an emitter's azimuth arrow), every few pixels. */
export function segmentBoxes(from: [number, number], to: [number, number], r = 3): Box[] {
  const n = Math.max(1, Math.ceil(Math.hypot(to[0] - from[0], to[1] - from[1]) / 5));
  return Array.from({ length: n + 1 }, (_, k) => around([from[0] + ((to[0] - from[0]) * k) / n, from[1] + ((to[1] - from[1]) * k) / n], r));
}

export function placeLabels(requests: LabelRequest[], marks: Box[], frame: { width: number; height: number }): Map<string, PlacedLabel> {
  const placed = new Map<string, PlacedLabel>();
  const taken: Box[] = [];
  for (const r of requests) {
    const size = r.size ?? 10;
    const w = textWidth(r.text, size, r.bold);
    const h = size + 2;
    const gap = r.gap ?? 8;
    const [ax, ay] = r.at;
    let best: { score: number; label: PlacedLabel } | null = null;
    const rings = r.places ? ([[0, false]] as const) : ([[gap, false], [gap + 12, false], [gap + 26, true], [gap + 42, true]] as const);
    for (const [distance, leader] of rings) {
      const d = distance;
      // Left edge x and the box's top y of each place, nearest first.
      const places: [number, number][] = r.places ?? [
        [ax + d, ay - h / 2],
        [ax - d - w, ay - h / 2],
        [ax - w / 2, ay - d - h],
        [ax - w / 2, ay + d],
        [ax + d * 0.7, ay - d * 0.7 - h],
        [ax + d * 0.7, ay + d * 0.7],
        [ax - d * 0.7 - w, ay - d * 0.7 - h],
        [ax - d * 0.7 - w, ay + d * 0.7],
      ];
      for (const [x, top] of places) {
        const box: Box = [x - 2, top - 1, x + w + 2, top + h + 1];
        const outside = box[0] < 0 || box[1] < 0 || box[2] > frame.width || box[3] > frame.height;
        let score = outside ? 1e9 : 0;
        for (const b of marks) score += overlapArea(box, b);
        for (const b of taken) score += 2 * overlapArea(box, b);
        score += distance * 0.01; // nearer is better among equals
        const label: PlacedLabel = { key: r.key, x, y: top + h - 2.5, box, leader, anchorX: ax, anchorY: ay };
        if (!best || score < best.score) best = { score, label };
        if (score < 1) break;
      }
      if (best && best.score < 1) break;
    }
    placed.set(r.key, best!.label);
    taken.push(best!.label.box);
  }
  return placed;
}
