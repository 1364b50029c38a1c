// One walkable surface of a frozen assessment as a small plan: each cell in the colour of its exposure
// class (cividis, light to dark as the class rises, so it still reads in greyscale), the outline,
// obstructions, access points, and the mitigation plan's barriers and signs on top.
import { interpolateCividis } from "d3-scale-chromatic";
import { useId } from "react";
import type { Barrier, Sign } from "~/features/exposure/mitigation";
import { boundsOf, makeFrame, type XY } from "~/features/layout/plan-frame";

export type MapGrid = { x0: number; y0: number; step: number; nx: number; ny: number };
/** Class 0 left unfilled (white); classes 1–3 darker as they rise: cividis runs from dark blue to light yellow, so it is read backwards. */
export const classColours = ["none", ...[0.82, 0.5, 0.12].map((t) => interpolateCividis(t))];
export const classShort = ["within the general-population limit", "above it, within the occupational", "above the occupational, up to 10×", "over 10× the occupational limit"];
const signLetter = { information: "I", notice: "N", caution: "C", warning: "W" } as const;

type Props = {
  name: string;
  polygon: XY[];
  grid: MapGrid;
  classes: number[];
  obstructions?: { id: string; polygon: XY[] }[];
  accessPoints?: { id: string; name: string; x: number; y: number }[];
  signs?: Sign[];
  barriers?: Barrier[];
  width?: number;
};

export function ClassMap({ name, polygon, grid, classes, obstructions = [], accessPoints = [], signs = [], barriers = [], width = 640 }: Props) {
  const titleId = useId();
  const frame = makeFrame(boundsOf([...polygon, ...accessPoints.map((a): XY => [a.x, a.y]), ...signs.map((s): XY => [s.x, s.y])]), { width, margin: 1.5, minSpan: 6 });
  const px = frame.scale * grid.step;
  const cells = [];
  // One rectangle per run of equal class along a row keeps the drawing small.
  for (let j = 0; j < grid.ny; j++) {
    let i = 0;
    while (i < grid.nx) {
      const c = classes[j * grid.nx + i];
      let end = i + 1;
      while (end < grid.nx && classes[j * grid.nx + end] === c) end++;
      if (c !== 255 && c !== 0 && c !== undefined) {
        const [x, y] = frame.toPx(grid.x0 + i * grid.step - grid.step / 2, grid.y0 + j * grid.step + grid.step / 2);
        cells.push(<rect key={`${j}-${i}`} x={x} y={y} width={(end - i) * px + 0.3} height={px + 0.3} fill={classColours[c]} />);
      }
      i = end;
    }
  }
  const path = (pts: XY[], close: boolean) => pts.map((p, k) => `${k ? "L" : "M"}${frame.toPx(...p).map((v) => v.toFixed(1)).join(" ")}`).join("") + (close ? "Z" : "");
  return (
    <svg viewBox={`0 0 ${frame.width} ${frame.height}`} role="img" aria-labelledby={titleId} className="block h-auto w-full rounded-sheet border border-rule bg-white">
      <title id={titleId}>{`${name}: exposure classes${signs.length ? ", signs" : ""}${barriers.length ? " and barriers" : ""}`}</title>
      <defs>
        <clipPath id={`${titleId}-clip`}>
          <path d={path(polygon, true)} />
        </clipPath>
      </defs>
      {/* Cells are whole grid squares around centres inside the outline; the outline clips them. */}
      <g clipPath={`url(#${titleId}-clip)`}>{cells}</g>
      <path d={path(polygon, true)} fill="none" className="stroke-ink-900" strokeWidth={1.5} />
      {obstructions.map((o) => (
        <path key={o.id} d={path(o.polygon, true)} className="fill-paper-deep stroke-graphite-600" strokeWidth={1} />
      ))}
      {barriers.flatMap((b) =>
        b.lines.map((line, k) => <path key={`${b.id}-${k}`} d={path(line, false)} fill="none" className="stroke-ink-900" strokeWidth={b.boundary === "occupational" ? 3 : 2} strokeDasharray={b.boundary === "general" ? "6 3" : undefined} />),
      )}
      {accessPoints.map((a) => {
        const [x, y] = frame.toPx(a.x, a.y);
        return <rect key={a.id} x={x - 5} y={y - 5} width={10} height={10} className="fill-white stroke-ink-900" strokeWidth={1.5}><title>{a.name}</title></rect>;
      })}
      {signs.map((s) => {
        const [x, y] = frame.toPx(s.x, s.y);
        return (
          <g key={s.id} transform={`translate(${x} ${y})`}>
            <title>{`${s.id} ${s.category.toUpperCase()}: ${s.where}`}</title>
            <path d="M0 -9L8 5H-8Z" className="fill-white stroke-ink-900" strokeWidth={1.5} />
            <text y={3.5} textAnchor="middle" className="fill-ink-900 text-[8px] font-bold">
              {signLetter[s.category]}
            </text>
          </g>
        );
      })}
    </svg>
  );
}

export function ClassLegend() {
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-graphite-600">
      {classShort.map((label, c) => (
        <li key={label} className="flex items-center gap-1.5">
          <svg width="14" height="14" aria-hidden="true"><rect width="14" height="14" fill={classColours[c]} className="stroke-rule-strong" /></svg>
          {label}
        </li>
      ))}
      <li className="flex items-center gap-1.5"><svg width="22" height="8" aria-hidden="true"><line x1="0" x2="22" y1="4" y2="4" className="stroke-ink-900" strokeWidth="2" strokeDasharray="6 3" /></svg>barrier, general-population 100 %</li>
      <li className="flex items-center gap-1.5"><svg width="22" height="8" aria-hidden="true"><line x1="0" x2="22" y1="4" y2="4" className="stroke-ink-900" strokeWidth="3" /></svg>barrier, occupational 100 %</li>
      <li>△ sign: I information, N NOTICE, C CAUTION, W WARNING · □ access point</li>
    </ul>
  );
}
