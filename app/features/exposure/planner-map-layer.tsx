// A level's grids as a SitePlan layer: each cell in its colour (an image, one pixel a cell, drawn
// crisp), and the 100 % contour. Used by the planner's map after the change.
import { useMemo } from "react";
import type { PlanFrame } from "~/features/layout/plan-frame";
import { percentRgb } from "./colour-scale";
import type { LevelMap } from "./planner-compute";

function cellsImage(m: LevelMap) {
  if (typeof document === "undefined") return null;
  const canvas = document.createElement("canvas");
  canvas.width = m.nx;
  canvas.height = m.ny;
  const ctx = canvas.getContext("2d");
  if (!ctx) return null;
  const img = ctx.createImageData(m.nx, m.ny);
  for (let j = 0; j < m.ny; j++) {
    for (let i = 0; i < m.nx; i++) {
      const c = j * m.nx + i;
      if (m.mask && !m.mask[c]) continue;
      const [r, g, b] = percentRgb(m.percent[c]);
      const o = ((m.ny - 1 - j) * m.nx + i) * 4; // rows from the north down
      img.data[o] = r;
      img.data[o + 1] = g;
      img.data[o + 2] = b;
      img.data[o + 3] = 255;
    }
  }
  ctx.putImageData(img, 0, 0);
  return canvas.toDataURL("image/png");
}

export function LevelMapLayer({ frame, maps, contourClass = "stroke-ink-900", dash }: { frame: PlanFrame; maps: LevelMap[]; contourClass?: string; dash?: string }) {
  const images = useMemo(() => maps.map(cellsImage), [maps]);
  return (
    <g>
      {maps.map((m, n) => {
        const [left, top] = frame.toPx(m.x0 - m.step / 2, m.y0 + (m.ny - 0.5) * m.step);
        const href = images[n];
        return href ? <image key={m.surfaceId} href={href} x={left} y={top} width={m.nx * m.step * frame.scale} height={m.ny * m.step * frame.scale} preserveAspectRatio="none" imageRendering="pixelated" /> : null;
      })}
      <MapContours frame={frame} maps={maps} className={contourClass} dash={dash} />
    </g>
  );
}

export function MapContours({ frame, maps, className = "stroke-ink-900", dash }: { frame: PlanFrame; maps: LevelMap[]; className?: string; dash?: string }) {
  const d = maps
    .flatMap((m) => m.contour100)
    .map((ring) => ring.map((p, i) => `${i ? "L" : "M"}${frame.toPx(p[0], p[1]).map((v) => v.toFixed(1)).join(" ")}`).join("") + "Z")
    .join("");
  return (
    <g fill="none">
      <path d={d} className="stroke-white" strokeWidth={4} strokeDasharray={dash} />
      <path d={d} className={className} strokeWidth={1.75} strokeDasharray={dash} />
    </g>
  );
}
