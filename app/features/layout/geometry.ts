// Geometry checks for a site's layout, shared by the editor (as you type) and the server (before
// anything is written). Site-local metres: x east, y north, z up from the site's datum. Every
// refusal names the record ("Area “Main roof”") and, where it can, the point or edge (1-based,
// as people count), and is keyed by the JSON path of the field it concerns ("surfaces[2].polygon").
export type XY = [number, number];

/** How far from the site's origin a plan coordinate may lie: 10 km is far beyond any site. */
export const PLAN_LIMIT_M = 10_000;
/** How far above or below the datum an elevation may lie. */
export const HEIGHT_LIMIT_M = 1_000;
/** Below this (m²) an outline encloses no area worth the name: it is degenerate. */
export const MIN_AREA_M2 = 1e-4;
/** Below this (m) a facade's segment or an edge has no length. */
export const MIN_LENGTH_M = 1e-3;

export type GeometryIssue = { path: string; message: string };

export type LayoutGeometry = {
  surfaces: (
    | { name: string; kind: "area"; polygon: XY[]; elevationM: number }
    | { name: string; kind: "facade"; line: XY[]; bottomM: number; topM: number }
  )[];
  obstructions?: { name: string; polygon: XY[]; baseM: number; heightM: number }[];
  accessPoints?: { name: string; x: number; y: number; z: number }[];
};

const fmt = (v: number) => (Number.isFinite(v) ? String(Number(v.toFixed(3))) : String(v));
const at = (p: XY) => `(${fmt(p[0])}, ${fmt(p[1])})`;
const named = (kind: string, name: string, index: number) => `${kind} “${name.trim() || `${index + 1}`}”`;

/** Twice the signed area of a simple polygon: the shoelace formula (Gauss's area formula; common practice, e.g. O'Rourke, Computational Geometry in C, 2nd ed., §1.3, from memory). Positive when the points run anticlockwise. */
export function signedArea(points: readonly XY[]) {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i];
    const [x2, y2] = points[(i + 1) % points.length];
    twice += x1 * y2 - x2 * y1;
  }
  return twice / 2;
}

/**
 * Which side of the line a→b the point c lies on: +1 left, −1 right, 0 on the line. The sign of
 * the cross product (b − a) × (c − a) (Cormen et al., Introduction to Algorithms, 3rd ed., §33.1,
 * from memory), with a tolerance relative to the lengths so points rounded to 0.1 m that lie on
 * one line count as on it.
 */
export function orientation(a: XY, b: XY, c: XY) {
  const abx = b[0] - a[0], aby = b[1] - a[1], acx = c[0] - a[0], acy = c[1] - a[1];
  const cross = abx * acy - aby * acx;
  const tolerance = 1e-12 * Math.max(1, Math.hypot(abx, aby) * Math.hypot(acx, acy));
  return Math.abs(cross) <= tolerance ? 0 : Math.sign(cross);
}

/** c lies within the bounding box of a–b (used once a, b, c are known to be collinear). */
function onSegment(a: XY, b: XY, c: XY) {
  return Math.min(a[0], b[0]) <= c[0] && c[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= c[1] && c[1] <= Math.max(a[1], b[1]);
}

/**
 * Whether segments p1–p2 and p3–p4 share any point: crossing, touching at an end, or overlapping
 * along one line. SEGMENTS-INTERSECT of Cormen et al., Introduction to Algorithms, 3rd ed., §33.1
 * (from memory): the segments straddle each other's lines, or an end lies on the other segment.
 */
export function segmentsIntersect(p1: XY, p2: XY, p3: XY, p4: XY) {
  // Boxes apart: no shared point. Cheap, exact, and it settles most pairs of a large outline.
  if (Math.max(p1[0], p2[0]) < Math.min(p3[0], p4[0]) || Math.max(p3[0], p4[0]) < Math.min(p1[0], p2[0])) return false;
  if (Math.max(p1[1], p2[1]) < Math.min(p3[1], p4[1]) || Math.max(p3[1], p4[1]) < Math.min(p1[1], p2[1])) return false;
  const d1 = orientation(p3, p4, p1);
  const d2 = orientation(p3, p4, p2);
  const d3 = orientation(p1, p2, p3);
  const d4 = orientation(p1, p2, p4);
  if (d1 * d2 < 0 && d3 * d4 < 0) return true;
  if (d1 === 0 && onSegment(p3, p4, p1)) return true;
  if (d2 === 0 && onSegment(p3, p4, p2)) return true;
  if (d3 === 0 && onSegment(p1, p2, p3)) return true;
  if (d4 === 0 && onSegment(p1, p2, p4)) return true;
  return false;
}

/** Where two segments meet (their lines' crossing, or for collinear ones a shared point), for the message. */
function meetingPoint(p1: XY, p2: XY, p3: XY, p4: XY): XY {
  const d = (p2[0] - p1[0]) * (p4[1] - p3[1]) - (p2[1] - p1[1]) * (p4[0] - p3[0]);
  if (Math.abs(d) > 1e-12) {
    const t = ((p3[0] - p1[0]) * (p4[1] - p3[1]) - (p3[1] - p1[1]) * (p4[0] - p3[0])) / d;
    return [p1[0] + t * (p2[0] - p1[0]), p1[1] + t * (p2[1] - p1[1])];
  }
  for (const c of [p3, p4, p1, p2]) if (onSegment(p1, p2, c) && onSegment(p3, p4, c)) return c;
  return p1;
}

/**
 * The first place a closed outline meets itself, or null when it is simple. Every pair of edges is
 * tried (O(n²); outlines have tens of points, so a sweep line would buy nothing). Neighbouring edges
 * share their corner by design, so for them only a fold back along the same line counts.
 * Common practice, no source beyond the segment test above.
 */
export function selfIntersection(points: readonly XY[]): { edgeA: number; edgeB: number; point: XY } | null {
  const n = points.length;
  const edge = (i: number): [XY, XY] => [points[i], points[(i + 1) % n]];
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const [a1, a2] = edge(i);
      const [b1, b2] = edge(j);
      const adjacent = j === i + 1 || (i === 0 && j === n - 1);
      if (adjacent) {
        // The shared corner, and the two far ends: a fold back when all three lie on one line and
        // the far ends lie on the same side of the corner.
        const corner = j === i + 1 ? a2 : a1;
        const before = j === i + 1 ? a1 : b1;
        const after = j === i + 1 ? b2 : a2;
        const folds = orientation(before, corner, after) === 0 && (before[0] - corner[0]) * (after[0] - corner[0]) + (before[1] - corner[1]) * (after[1] - corner[1]) > 0;
        if (folds && n > 2) return { edgeA: i, edgeB: j, point: corner };
        continue;
      }
      if (segmentsIntersect(a1, a2, b1, b2)) return { edgeA: i, edgeB: j, point: meetingPoint(a1, a2, b1, b2) };
    }
  }
  return null;
}

/** Checks that a number is finite and within ±limit; the refusal text, or null. */
function boundIssue(value: number, what: string, limit: number) {
  if (typeof value !== "number" || !Number.isFinite(value)) return `${what} is not a number.`;
  if (Math.abs(value) > limit) return `${what} = ${fmt(value)} m lies beyond ±${limit.toLocaleString("en-GB").replace(/,/g, " ")} m of the site's origin.`;
  return null;
}

function pointIssues(points: readonly XY[], label: string) {
  for (const [i, p] of points.entries()) {
    for (const [axis, value] of [["x", p?.[0]], ["y", p?.[1]]] as const) {
      const issue = boundIssue(value as number, `${axis}`, PLAN_LIMIT_M);
      if (issue) return `${label}, point ${i + 1}: ${issue}`;
    }
  }
  return null;
}

/** Why an outline (area or obstruction footprint) cannot be stored, or null when it can. */
export function polygonIssue(points: readonly XY[], label: string): string | null {
  if (points.length < 3) return `${label}: the outline has ${points.length} point${points.length === 1 ? "" : "s"}; it needs at least 3.`;
  const bad = pointIssues(points, label);
  if (bad) return bad;
  for (let i = 0; i < points.length; i++) {
    const a = points[i];
    const b = points[(i + 1) % points.length];
    if (Math.hypot(b[0] - a[0], b[1] - a[1]) < MIN_LENGTH_M) {
      const j = (i + 1) % points.length;
      return `${label}: points ${i + 1} and ${j + 1} are the same place ${at(a)}; remove one.`;
    }
  }
  const flat = `${label}: the outline encloses no area (its points lie on one line).`;
  if (points.every((p) => orientation(points[0], points[1], p) === 0)) return flat;
  // Crossing before area: a symmetric bow tie's two lobes cancel to zero signed area.
  const crossing = selfIntersection(points);
  if (crossing) {
    const n = points.length;
    const edgeName = (e: number) => `${e + 1}–${((e + 1) % n) + 1}`;
    return `${label}: edge ${edgeName(crossing.edgeA)} meets edge ${edgeName(crossing.edgeB)} at ${at(crossing.point)}; an outline must not cross or touch itself.`;
  }
  if (Math.abs(signedArea(points)) < MIN_AREA_M2) return flat.replace(" (its points lie on one line)", ` (less than ${MIN_AREA_M2} m²)`);
  return null;
}

function heightIssue(value: number, label: string, what: string) {
  const issue = boundIssue(value, what, HEIGHT_LIMIT_M);
  return issue ? `${label}: ${issue.replace("of the site's origin", "of the site's datum")}` : null;
}

/** Every reason the layout cannot be stored, keyed by field path. Empty when it is sound. */
export function validateLayout(layout: LayoutGeometry): GeometryIssue[] {
  const issues: GeometryIssue[] = [];
  const add = (path: string, message: string | null) => {
    if (message) issues.push({ path, message });
  };
  layout.surfaces.forEach((s, i) => {
    const base = `surfaces[${i}]`;
    if (s.kind === "area") {
      const label = named("Area", s.name, i);
      add(`${base}.polygon`, polygonIssue(s.polygon, label));
      add(`${base}.elevationM`, heightIssue(s.elevationM, label, "the elevation"));
      return;
    }
    const label = named("Facade", s.name, i);
    if (s.line.length !== 2) add(`${base}.line`, `${label}: a facade is one segment on the plan, 2 points; it has ${s.line.length}.`);
    else {
      const bad = pointIssues(s.line, label);
      if (bad) add(`${base}.line`, bad);
      else if (Math.hypot(s.line[1][0] - s.line[0][0], s.line[1][1] - s.line[0][1]) < MIN_LENGTH_M) add(`${base}.line`, `${label}: both ends are at ${at(s.line[0])}; the segment has no length.`);
    }
    const bottom = heightIssue(s.bottomM, label, "the bottom");
    const top = heightIssue(s.topM, label, "the top");
    add(`${base}.bottomM`, bottom);
    add(`${base}.topM`, top);
    if (!bottom && !top && s.topM <= s.bottomM) add(`${base}.topM`, `${label}: the top (${fmt(s.topM)} m) must be above the bottom (${fmt(s.bottomM)} m).`);
  });
  (layout.obstructions ?? []).forEach((o, i) => {
    const base = `obstructions[${i}]`;
    const label = named("Obstruction", o.name, i);
    add(`${base}.polygon`, polygonIssue(o.polygon, label));
    add(`${base}.baseM`, heightIssue(o.baseM, label, "the base"));
    const height = heightIssue(o.heightM, label, "the height");
    add(`${base}.heightM`, height ?? (o.heightM <= 0 ? `${label}: the height must be above 0 m.` : null));
  });
  (layout.accessPoints ?? []).forEach((a, i) => {
    const base = `accessPoints[${i}]`;
    const label = named("Access point", a.name, i);
    for (const axis of ["x", "y"] as const) {
      const issue = boundIssue(a[axis], axis, PLAN_LIMIT_M);
      add(`${base}.${axis}`, issue ? `${label}: ${issue}` : null);
    }
    add(`${base}.z`, heightIssue(a.z, label, "z"));
  });
  return issues;
}

/** The issues as the API's `fields` object (the first issue of each path). */
export function issuesByPath(issues: readonly GeometryIssue[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) out[issue.path] ??= issue.message;
  return out;
}
