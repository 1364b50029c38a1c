// The frozen results as tables: per surface the worst point, its largest contributors and the area in
// each class; per emitter its EIRP and compliance distances for both tiers.
import { areaFigure, figure, figure3 } from "./format";
import type { AssessmentView } from "./view";

// Figures and their units stay on one line (a narrow column wrapped "1120.0" and "m²" apart).
const m2 = (v: number) => <span className="figures whitespace-nowrap">{areaFigure(v)} m²</span>;
const th = "label-caps px-3 py-2 text-left font-medium";
const td = "px-3 py-2 align-top";

export function AssessmentTables({ view }: { view: Pick<AssessmentView, "surfaces" | "emitters"> }) {
  return (
    <>
      <section aria-labelledby="surfaces-title" className="space-y-2">
        <h3 id="surfaces-title" className="text-lg font-semibold">Surfaces</h3>
        <div className="overflow-x-auto rounded-sheet border border-rule bg-sheet">
          <table className="min-w-full text-sm">
            <caption className="sr-only">Worst point and areas by class per surface</caption>
            <thead className="border-b border-ink-900">
              <tr>{["Surface", "Worst point", "Where (m)", "Largest contributors", "Area", "Over general", "Over occupational", "Over 10× occupational"].map((h) => <th key={h} scope="col" className={th}>{h}</th>)}</tr>
            </thead>
            <tbody>
              {view.surfaces.map((s) => (
                <tr key={s.surfaceId} className="border-b border-rule last:border-b-0">
                  <th scope="row" className={`${td} text-left font-medium break-words`}>{s.name}{s.kind === "facade" ? " (facade)" : ""}</th>
                  <td className={`${td} figures whitespace-nowrap`}>{figure(s.worstPercent)} %</td>
                  <td className={`${td} figures whitespace-nowrap`}>{s.worstAt ? `${s.worstAt.x}, ${s.worstAt.y}, ${s.worstAt.z}` : "—"}</td>
                  <td className={td}>
                    {s.contributions.length
                      ? s.contributions.map((c) => (
                          <span key={c.id} className="block whitespace-nowrap">
                            {c.id} {figure3(c.percent)} %
                          </span>
                        ))
                      : "—"}
                  </td>
                  <td className={td}>{m2(s.areas.totalM2)}</td>
                  <td className={td}>{m2(s.areas.overGeneralM2)}</td>
                  <td className={td}>{m2(s.areas.overOccupationalM2)}</td>
                  <td className={td}>{m2(s.areas.overTenTimesOccupationalM2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
      <section aria-labelledby="emitters-title" className="space-y-2">
        <h3 id="emitters-title" className="text-lg font-semibold">Emitters and compliance distances</h3>
        <p className="text-sm text-graphite-600">Along boresight, each emitter alone reaching 100 % of its limit.</p>
        <div className="overflow-x-auto rounded-sheet border border-rule bg-sheet">
          <table className="min-w-full text-sm">
            <caption className="sr-only">Emitters with their compliance distances</caption>
            <thead className="border-b border-ink-900">
              <tr>{["Emitter", "Operator", "Band", "Frequency", "EIRP", "General population", "Occupational"].map((h) => <th key={h} scope="col" className={th}>{h}</th>)}</tr>
            </thead>
            <tbody>
              {view.emitters.map((e) => (
                <tr key={e.id} className="border-b border-rule last:border-b-0">
                  <th scope="row" className={`${td} text-left font-medium break-words`}>{e.id}</th>
                  <td className={`${td} break-words`}>{e.operator || "—"}</td>
                  <td className={`${td} break-words`}>{e.band || "—"}</td>
                  <td className={`${td} figures whitespace-nowrap`}>{e.frequencyMHz} MHz</td>
                  <td className={`${td} figures whitespace-nowrap`}>{figure(e.eirpW)} W</td>
                  <td className={`${td} figures whitespace-nowrap`}>{e.complianceDistanceM.general.toFixed(2)} m</td>
                  <td className={`${td} figures whitespace-nowrap`}>{e.complianceDistanceM.occupational.toFixed(2)} m</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </>
  );
}
