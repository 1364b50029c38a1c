// The Exposure page's tables: the worst point of each surface, each emitter's share at those
// points, the area in each class, and the readings against predictions.
import { memo } from "react";
import { StateGlyph } from "~/components/state-glyph";
import { DateText } from "~/components/date-text";
import { formatPercent } from "./colour-scale";
import { CLASS_NAMES } from "./evaluate-site";
import type { ExposureResult } from "./exposure-result";

export const th = "label-caps px-3 py-2 text-left font-medium align-bottom";
export const td = "px-3 py-2 align-top text-ink-900";
const num = `${td} figures text-right whitespace-nowrap`;

export function Table({ caption, head, children, testId }: { caption: string; head: React.ReactNode; children: React.ReactNode; testId?: string }) {
  return (
    // Focusable and named, so a keyboard can scroll it when it is wider than the screen; relative, so the
    // screen-reader-only text inside stays within the scrolled box.
    <div className="relative overflow-x-auto rounded-sheet border border-rule bg-sheet" data-testid={testId} tabIndex={0} role="region" aria-label={caption}>
      <table className="min-w-full text-sm tabular-nums">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-ink-900">{head}</thead>
        <tbody className="[&>tr]:border-b [&>tr]:border-rule [&>tr:last-child]:border-b-0">{children}</tbody>
      </table>
    </div>
  );
}

const xyz = (p: { x: number; y: number; z: number }) => `(${p.x.toFixed(2)}, ${p.y.toFixed(2)}, ${p.z.toFixed(2)})`;

export const WorstPointsTable = memo(function WorstPointsTable({ result }: { result: ExposureResult }) {
  const labels = new Map(result.emitters.map((e) => [e.engineId, e.label]));
  const rows = [...result.areas, ...result.facades];
  return (
    <Table
      caption="Worst point of each surface"
      testId="worst-points"
      head={
        <tr>
          <th className={th}>Surface</th>
          <th className={`${th} text-right`}>Worst, % of limit</th>
          <th className={th}>Where (x, y, z) m</th>
          <th className={th}>Class there and worst on the surface</th>
          <th className={th}>Largest contributors there</th>
        </tr>
      }
    >
      {rows.map((s) => (
        <tr key={s.surfaceId} data-surface={s.name}>
          <th scope="row" className={`${td} text-left font-medium`}>
            {s.name}
            <span className="block text-xs font-normal text-graphite-600">{"elevationM" in s ? `level ${signed(s.elevationM)} m` : "facade"}</span>
          </th>
          <td className={`${num} font-bold`} data-testid="worst-percent">
            {formatPercent(s.worstPercent)}
          </td>
          <td className={`${td} figures whitespace-nowrap`}>{s.worstAt ? xyz(s.worstAt) : "–"}</td>
          <td className={td}>{CLASS_NAMES[s.worstClass]}</td>
          <td className={td}>
            {s.contributions.slice(0, 3).map((c) => (
              <span key={c.id} className="block whitespace-nowrap">
                {labels.get(c.id) ?? c.id} <span className="figures">{formatPercent(c.percent)}</span>
              </span>
            ))}
          </td>
        </tr>
      ))}
    </Table>
  );
});

export const ContributionsTable = memo(function ContributionsTable({ result }: { result: ExposureResult }) {
  const surfaces = [...result.areas, ...result.facades];
  const share = surfaces.map((s) => new Map(s.contributions.map((c) => [c.id, c.percent])));
  return (
    <Table
      caption="Each emitter's contribution at each surface's worst point"
      testId="contributions"
      head={
        <tr>
          <th className={th}>Emitter</th>
          {surfaces.map((s) => (
            <th key={s.surfaceId} className={`${th} text-right`}>
              {s.name}
            </th>
          ))}
        </tr>
      }
    >
      {result.emitters.filter((e) => e.engineId).map((e) => (
        <tr key={e.inventoryId}>
          <th scope="row" className={`${td} text-left font-medium`}>
            {e.label}
          </th>
          {share.map((m, k) => (
            <td key={k} className={num}>
              {formatPercent(m.get(e.engineId!) ?? 0)}
            </td>
          ))}
        </tr>
      ))}
      <tr className="border-t border-ink-900">
        <th scope="row" className={`${td} text-left font-bold`}>
          Total
        </th>
        {surfaces.map((s) => (
          <td key={s.surfaceId} className={`${num} font-bold`}>
            {formatPercent(s.worstPercent)}
          </td>
        ))}
      </tr>
    </Table>
  );
});

const m2 = (v: number) => (v === 0 ? "0" : v < 10 ? v.toFixed(2) : v.toFixed(1));

export const AreasTable = memo(function AreasTable({ result }: { result: ExposureResult }) {
  return (
    <Table
      caption="Area in each class, per surface (m²)"
      testId="areas"
      head={
        <tr>
          <th className={th}>Surface</th>
          <th className={`${th} text-right`}>Total m²</th>
          {CLASS_NAMES.map((c) => (
            <th key={c} className={`${th} max-w-40 text-right`}>
              {c}
            </th>
          ))}
        </tr>
      }
    >
      {[...result.areas, ...result.facades].map((s) => {
        const a = s.areas;
        return (
          <tr key={s.surfaceId}>
            <th scope="row" className={`${td} text-left font-medium`}>
              {s.name}
            </th>
            <td className={num}>{m2(a.totalM2)}</td>
            <td className={num}>{m2(a.withinGeneralM2)}</td>
            <td className={num}>{m2(a.overGeneralM2 - a.overOccupationalM2)}</td>
            <td className={num}>{m2(a.overOccupationalM2 - a.overTenTimesOccupationalM2)}</td>
            <td className={num}>{m2(a.overTenTimesOccupationalM2)}</td>
          </tr>
        );
      })}
    </Table>
  );
});

const units: Record<string, string> = { "W/m2": "W/m²", "mW/cm2": "mW/cm²", "uW/cm2": "µW/cm²", percent: "%" };

export const ReadingsSummaryNotice = memo(function ReadingsSummaryNotice({ result }: { result: ExposureResult }) {
  const s = result.readingsSummary;
  if (!s.count) return null;
  if (!s.above)
    return (
      <p className="flex items-start gap-2 text-sm" data-testid="readings-summary">
        <StateGlyph state="ok" className="mt-0.5 h-4 w-4" />
        All {s.compared} compared readings are at or below their predictions{s.worst?.ratio != null ? ` (largest ratio ${s.worst.ratio.toFixed(2)}, ${s.worst.label})` : ""}.
      </p>
    );
  return (
    <div className="flex items-start gap-2 rounded-control border-l-4 border-caution-700 bg-caution-100 px-4 py-2.5 text-sm text-caution-700" role="status" data-testid="readings-summary">
      <StateGlyph state="caution" className="mt-0.5 h-4 w-4" />
      <p>
        <strong>
          {s.above} of {s.compared} readings {s.above === 1 ? "is" : "are"} above {s.above === 1 ? "its" : "their"} prediction.
        </strong>{" "}
        Worst: {s.worst?.label}, ratio {s.worst?.ratio == null ? "– (nothing predicted there)" : s.worst.ratio.toFixed(2)} at ({s.worst?.x}, {s.worst?.y}, {s.worst?.z}) m. The prediction is not conservative there: a practitioner must investigate (an emitter missing from the inventory, a
        wrong power, gain or tilt, a reflection) before the results are relied on.
      </p>
    </div>
  );
});

export const ReadingsTable = memo(function ReadingsTable({ result }: { result: ExposureResult }) {
  return (
    <Table
      caption="Readings against predictions"
      testId="readings"
      head={
        <tr>
          <th className={th}>Reading</th>
          <th className={th}>Visit</th>
          <th className={th}>Point (x, y, z) m</th>
          <th className={`${th} text-right`}>As measured</th>
          <th className={`${th} text-right`}>Measured, % of limit</th>
          <th className={`${th} text-right`}>Predicted, % of limit</th>
          <th className={`${th} text-right`}>Measured / predicted</th>
        </tr>
      }
    >
      {result.readings.map((r) => (
        <tr key={r.id} data-above={r.abovePrediction ? "true" : "false"}>
          <th scope="row" className={`${td} text-left font-medium`}>
            {r.label || "–"}
          </th>
          <td className={`${td} whitespace-nowrap`}>
            <DateText value={r.visitedOn} />
          </td>
          <td className={`${td} figures whitespace-nowrap`}>{xyz(r)}</td>
          <td className={num}>
            {Number(r.value.toPrecision(4))} {units[r.unit] ?? r.unit}
          </td>
          <td className={num}>{r.measuredPercent === null ? "–" : formatPercent(r.measuredPercent)}</td>
          <td className={num}>{formatPercent(r.predictedPercent)}</td>
          <td className={`${num} ${r.abovePrediction ? "font-bold" : ""}`}>
            {r.basis === "not comparable" ? (
              <span className="font-sans">not comparable</span>
            ) : (
              <span className="inline-flex items-center gap-1.5">
                {r.abovePrediction ? <StateGlyph state="caution" className="h-4 w-4" /> : null}
                {r.ratio === null ? "–" : r.ratio.toFixed(2)}
                {r.abovePrediction ? <span className="sr-only">above its prediction</span> : null}
              </span>
            )}
          </td>
        </tr>
      ))}
    </Table>
  );
});

export const signed = (v: number) => `${v >= 0 ? "+" : "−"}${Math.abs(v).toFixed(1)}`;
