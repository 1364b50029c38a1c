// The report's figures as vector graphics: a level's exposure map (cells coloured by total % of
// limit, contour lines with their values, the outline, obstructions, emitters with their azimuth,
// the worst point), an elevation cut along an emitter's boresight, and the colour scale legend.
import { contours } from "d3-contour";
import { around, placeLabels, segmentBoxes, type Box as LabelBox, type LabelRequest } from "~/features/exposure/map-labels";
import { pdfColours as C } from "~/infra/pdf/palette";
import { say, type Doc } from "~/infra/pdf/pdf.server";
import { colourOf, fillOf, MAP_CONTOURS, scalePosition, SCALE_TICKS } from "./colour-scale";

type XY = [number, number];
export type MapGrid = { x0: number; y0: number; step: number; nx: number; ny: number; percent: number[]; mask?: number[] };
export type MapEmitter = { label: string; x: number; y: number; azimuthDeg: number };
export type LevelMap = { grid: MapGrid; polygon: XY[]; obstructions: XY[][]; emitters: MapEmitter[]; worst: { x: number; y: number } | null; signs: { x: number; y: number; category: string }[] };
type Box = { x: number; y: number; w: number; h: number };

/** Contour rings (d3-contour's marching squares) of a row-major grid, in grid units (cell centres at i + ½). */
function rings(values: number[], nx: number, ny: number, level: number): XY[][] {
  const mp = contours().size([nx, ny]).smooth(true).contour(values, level);
  return mp.coordinates.flatMap((polygon) => polygon.map((ring) => ring.map(([px, py]) => [px - 0.5, py - 0.5] as XY)));
}

/** Fills cells row by row, one rectangle per run of equal colour; cells under 1 % stay unfilled. */
function cells(doc: Doc, nx: number, ny: number, value: (i: number, j: number) => number | null, at: (i: number, j: number) => XY, cw: number, ch: number) {
  for (let j = 0; j < ny; j++) {
    let i = 0;
    while (i < nx) {
      const v = value(i, j);
      const colour = v === null ? null : fillOf(v);
      if (colour === null) {
        i++;
        continue;
      }
      let k = i + 1;
      while (k < nx) {
        const w = value(k, j);
        if (w === null || fillOf(w) !== colour) break;
        k++;
      }
      const [x, y] = at(i, j);
      doc.rect(x - cw / 2, y - ch / 2, cw * (k - i) + 0.05, ch + 0.05).fillColor(colour).fill();
      i = k;
    }
  }
}

function contourLabel(doc: Doc, text: string, x: number, y: number) {
  doc.fontSize(6.5);
  const w = doc.widthOfString(text) + 4;
  doc.rect(x - w / 2, y - 4.5, w, 9).fillColor("#ffffff").fillOpacity(0.85).fill().fillOpacity(1);
  say(doc, text, { x: x - w / 2 + 2, y: y - 3.6, size: 6.5, lineBreak: false });
}

/** A plan of one level, fitted into the box (north up), with a scale bar. */
export function drawLevelMap(doc: Doc, map: LevelMap, box: Box, opts: { levels?: number[]; key?: string } = {}) {
  const levels = opts.levels ?? MAP_CONTOURS;
  const { grid } = map;
  const xs = [...map.polygon.map((p) => p[0]), grid.x0, grid.x0 + (grid.nx - 1) * grid.step];
  const ys = [...map.polygon.map((p) => p[1]), grid.y0, grid.y0 + (grid.ny - 1) * grid.step];
  for (const e of map.emitters) (xs.push(e.x), ys.push(e.y));
  const [minX, maxX, minY, maxY] = [Math.min(...xs) - 1, Math.max(...xs) + 1, Math.min(...ys) - 1, Math.max(...ys) + 1];
  const s = Math.min(box.w / (maxX - minX), (box.h - 18) / (maxY - minY));
  const ox = box.x + (box.w - s * (maxX - minX)) / 2;
  const oy = box.y + (box.h - 18 - s * (maxY - minY)) / 2;
  const P = (x: number, y: number): XY => [ox + (x - minX) * s, oy + (maxY - y) * s];
  doc.save();
  doc.rect(box.x, box.y, box.w, box.h - 18).lineWidth(0.5).strokeColor(C.rule).stroke();
  const inside = (i: number, j: number) => !grid.mask || grid.mask[j * grid.nx + i] === 1;
  cells(doc, grid.nx, grid.ny, (i, j) => (inside(i, j) ? grid.percent[j * grid.nx + i] : null), (i, j) => P(grid.x0 + i * grid.step, grid.y0 + j * grid.step), grid.step * s, grid.step * s);
  const outline = (pts: XY[], width: number, colour: string, fill?: string) => {
    if (pts.length < 2) return;
    const [first, ...rest] = pts.map(([x, y]) => P(x, y));
    doc.moveTo(...first);
    for (const p of rest) doc.lineTo(...p);
    doc.closePath().lineWidth(width);
    if (fill) doc.fillAndStroke(fill, colour);
    else doc.strokeColor(colour).stroke();
  };
  for (const o of map.obstructions) outline(o, 0.6, C.ink, C.paperDeep);
  outline(map.polygon, 1.2, C.ink);
  const masked = grid.percent.map((v, k) => (!grid.mask || grid.mask[k] === 1 ? v : 0));
  // Contour labels are placed with the emitters' below, clear of the marks.
  const labels: [string, number, number][] = [];
  for (const level of levels) {
    for (const ring of rings(masked, grid.nx, grid.ny, level)) {
      const pts = ring.map(([i, j]) => P(grid.x0 + i * grid.step, grid.y0 + j * grid.step));
      if (pts.length < 3) continue;
      doc.moveTo(...pts[0]);
      for (const p of pts.slice(1)) doc.lineTo(...p);
      doc.lineWidth(level === 100 ? 1.4 : 0.7).strokeColor(level === 100 ? "#ffffff" : C.ink);
      if (level !== 100) doc.dash(2, { space: 1.5 });
      doc.stroke().undash();
      // Label a ring only when it is big enough to read, and each value at most twice per map.
      const span = Math.max(Math.max(...pts.map((p) => p[0])) - Math.min(...pts.map((p) => p[0])), Math.max(...pts.map((p) => p[1])) - Math.min(...pts.map((p) => p[1])));
      if (span < 24 || labels.filter(([text]) => text === `${level} %`).length >= 2) continue;
      const top = pts.reduce((a, b) => (b[1] < a[1] ? b : a));
      labels.push([`${level} %`, top[0], top[1]]);
    }
  }
  // Marks first, then every label placed clear of them and of each other (the web map's placer, in
  // the figure's own points): contour values first, then the emitters' names.
  const marks: LabelBox[] = [];
  const requests: LabelRequest[] = labels.map(([text, x, y], k) => ({ key: `c${k}`, at: [x - box.x, y - box.y], text, size: 6.5, gap: 0, places: [[x - box.x - (text.length * 3.9) / 2, y - box.y - 4.5], [x - box.x - (text.length * 3.9) / 2, y - box.y + 3], [x - box.x + 4, y - box.y - 4.5], [x - box.x - text.length * 3.9 - 4, y - box.y - 4.5]] }));
  for (const e of map.emitters) {
    const [x, y] = P(e.x, e.y);
    const a = ((90 - e.azimuthDeg) * Math.PI) / 180;
    const tip: XY = [x + 14 * Math.cos(a), y - 14 * Math.sin(a)];
    doc.moveTo(x, y).lineTo(...tip).lineWidth(1).strokeColor(C.ink).stroke();
    doc.circle(...tip, 1.4).fillColor(C.ink).fill();
    doc.rect(x - 3, y - 3, 6, 6).fillAndStroke("#ffffff", C.ink);
    marks.push(around([x - box.x, y - box.y], 3.5), ...segmentBoxes([x - box.x, y - box.y], [tip[0] - box.x, tip[1] - box.y], 1.5));
    requests.push({ key: `e${requests.length}`, at: [x - box.x, y - box.y], text: e.label, size: 6.5, gap: 5 });
  }
  for (const sign of map.signs) {
    const [x, y] = P(sign.x, sign.y);
    doc.polygon([x, y - 4], [x + 4, y + 3], [x - 4, y + 3]).lineWidth(0.8).fillAndStroke("#ffffff", C.ink);
    marks.push(around([x - box.x, y - box.y], 4));
  }
  if (map.worst) {
    const [x, y] = P(map.worst.x, map.worst.y);
    doc.moveTo(x - 5, y - 5).lineTo(x + 5, y + 5).moveTo(x - 5, y + 5).lineTo(x + 5, y - 5).lineWidth(1.6).strokeColor("#ffffff").stroke();
    doc.moveTo(x - 4, y - 4).lineTo(x + 4, y + 4).moveTo(x - 4, y + 4).lineTo(x + 4, y - 4).lineWidth(0.8).strokeColor(C.ink).stroke();
    marks.push(around([x - box.x, y - box.y], 5));
  }
  const placed = placeLabels(requests, marks, { width: box.w, height: box.h - 18 });
  for (const r of requests) {
    const l = placed.get(r.key)!;
    const [x0, y0, x1, y1] = l.box;
    if (l.leader) {
      const cx = Math.max(x0, Math.min(r.at[0], x1));
      const cy = Math.max(y0, Math.min(r.at[1], y1));
      doc.moveTo(box.x + r.at[0], box.y + r.at[1]).lineTo(box.x + cx, box.y + cy).lineWidth(0.4).strokeColor(C.ink).stroke();
    }
    doc.rect(box.x + x0, box.y + y0 + 0.5, x1 - x0, y1 - y0 - 1).fillColor("#ffffff").fillOpacity(0.85).fill().fillOpacity(1);
    say(doc, r.text, { x: box.x + x0 + 2, y: box.y + y0 + 1.6, size: 6.5, lineBreak: false });
  }
  // North arrow (on a white tile, so it reads over the colour field) and scale bar.
  const nx = box.x + box.w - 14;
  doc.roundedRect(nx - 7, box.y + 3, 14, 24, 2).fillColor("#ffffff").fillOpacity(0.9).fill().fillOpacity(1);
  doc.polygon([nx, box.y + 6], [nx + 4, box.y + 16], [nx - 4, box.y + 16]).fillColor(C.ink).fill();
  say(doc, "N", { x: nx - 3, y: box.y + 18, size: 7, weight: "bold", lineBreak: false });
  const metres = niceLength((box.w * 0.25) / s);
  const barY = box.y + box.h - 8;
  doc.moveTo(box.x, barY).lineTo(box.x + metres * s, barY).lineWidth(1.5).strokeColor(C.ink).stroke();
  say(doc, `${metres} m`, { x: box.x + metres * s + 4, y: barY - 4, size: 7, lineBreak: false });
  say(doc, opts.key ?? "Squares: emitters, with a line to their azimuth · triangles: signs · cross: the worst point · white line: 100 % of the limit", { x: box.x + metres * s + 36, y: barY - 4, size: 7, color: C.graphite, lineBreak: false });
  doc.restore();
}

function niceLength(v: number) {
  const p = 10 ** Math.floor(Math.log10(v));
  return [1, 2, 5, 10].map((m) => m * p).filter((m) => m <= v).pop() ?? p;
}

export type Cut = { lengthM: number; z0: number; z1: number; step: number; nh: number; nv: number; percent: number[]; emitter: { label: string; z: number }; surfaceZ: number; headM: number };

/** An elevation: distance along the line across, height up; the 100 % line and the people heights. */
export function drawElevationCut(doc: Doc, cut: Cut, box: Box): number {
  const s = Math.min(box.w / cut.lengthM, (box.h - 24) / (cut.z1 - cut.z0));
  const P = (d: number, z: number): XY => [box.x + d * s, box.y + (cut.z1 - z) * s];
  doc.save();
  cells(doc, cut.nh, cut.nv, (i, j) => cut.percent[j * cut.nh + i], (i, j) => P(i * cut.step, cut.z0 + j * cut.step), cut.step * s, cut.step * s);
  for (const level of MAP_CONTOURS) {
    for (const ring of rings(cut.percent, cut.nh, cut.nv, level)) {
      const pts = ring.map(([i, j]) => P(i * cut.step, cut.z0 + j * cut.step));
      if (pts.length < 3) continue;
      doc.moveTo(...pts[0]);
      for (const p of pts.slice(1)) doc.lineTo(...p);
      doc.lineWidth(level === 100 ? 1.4 : 0.7).strokeColor(level === 100 ? "#ffffff" : C.ink);
      if (level !== 100) doc.dash(2, { space: 1.5 });
      doc.stroke().undash();
      const right = pts.reduce((a, b) => (b[0] > a[0] ? b : a));
      contourLabel(doc, `${level} %`, Math.min(right[0], box.x + box.w - 16), right[1]);
    }
  }
  const [sx0, sy] = P(0, cut.surfaceZ);
  const [sx1] = P(cut.lengthM, cut.surfaceZ);
  doc.moveTo(sx0, sy).lineTo(sx1, sy).lineWidth(1.5).strokeColor(C.ink).stroke();
  const [, hy] = P(0, cut.surfaceZ + cut.headM);
  doc.moveTo(sx0, hy).lineTo(sx1, hy).lineWidth(0.6).dash(4, { space: 2 }).strokeColor(C.ink).stroke().undash();
  say(doc, `${cut.headM} m above the roof`, { x: sx1 - 70, y: hy + 2, size: 6.5, lineBreak: false });
  const [ex, ey] = P(0, cut.emitter.z);
  doc.rect(ex, ey - 4, 4, 8).fillAndStroke("#ffffff", C.ink);
  say(doc, cut.emitter.label, { x: ex + 6, y: ey - 12, size: 7, weight: "bold", lineBreak: false });
  const axisY = box.y + (cut.z1 - cut.z0) * s + 6;
  for (let d = 0; d <= cut.lengthM + 1e-9; d += niceLength(cut.lengthM / 5)) {
    const [x] = P(d, 0);
    doc.moveTo(x, axisY - 3).lineTo(x, axisY).lineWidth(0.5).strokeColor(C.ink).stroke();
    say(doc, `${Math.round(d * 10) / 10}`, { x: x - 8, y: axisY + 1, size: 6.5, width: 16, align: "center", lineBreak: false });
  }
  say(doc, "metres from the antenna along its azimuth", { x: box.x, y: axisY + 10, size: 7, color: C.graphite, lineBreak: false });
  doc.restore();
  return axisY + 22 - box.y;
}

/** The colour bar: log axis of total % of limit, with the standard and tier. */
export function drawLegend(doc: Doc, x: number, y: number, w: number, caption: string) {
  const n = 96;
  for (let k = 0; k < n; k++) {
    const p = 10 ** (3 * ((k + 0.5) / n));
    doc.rect(x + (w * k) / n, y, w / n + 0.3, 9).fillColor(colourOf(p)).fill();
  }
  doc.rect(x, y, w, 9).lineWidth(0.4).strokeColor(C.ruleStrong).stroke();
  for (const t of SCALE_TICKS) {
    const tx = x + w * scalePosition(t);
    doc.moveTo(tx, y + 9).lineTo(tx, y + 12).lineWidth(0.5).strokeColor(C.ink).stroke();
    say(doc, `${t} %`, { x: tx - 15, y: y + 13, size: 7, width: 30, align: "center", lineBreak: false });
  }
  say(doc, caption, { x, y: y + 23, size: 7, color: C.graphite, width: w, lineBreak: false });
}
