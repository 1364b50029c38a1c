// A stale edit's answer: the row as someone else saved it, beside the values typed here, field by
// field, so neither is lost: take theirs (close the editor) or keep yours on top of their version.
import { Button } from "~/components/button";
import { patternChoiceOf, powerFromW, tidy } from "./convert";

const labels: Record<string, string> = {
  label: "Label", operator: "Operator", band: "Band", frequencyMHz: "Frequency (MHz)", power: "Power per carrier", powerUnit: "Power unit", carriers: "Carriers",
  lossDb: "Loss (dB)", gain: "Gain", gainUnit: "Gain unit", patternChoice: "Pattern", hBeamwidthDeg: "H beamwidth", vBeamwidthDeg: "V beamwidth", azimuthDeg: "Azimuth",
  mechanicalTiltDeg: "Mech. tilt", electricalTiltDeg: "Elec. tilt", x: "x", y: "y", z: "z", model: "Model", apertureM: "Aperture", dishDiameterM: "Dish diameter",
  dutyFactor: "Duty factor", actualMaxFactor: "F_PR", tddFactor: "TDD factor", active: "Active", notes: "Notes",
};

/** The saved row (the API's emitter) as the form's text values. */
export function theirValues(t: Record<string, unknown>): Record<string, string> {
  const pos = (t.position ?? {}) as { x?: number; y?: number; z?: number };
  const raw: Record<string, unknown> = { ...t, x: pos.x, y: pos.y, z: pos.z, active: t.active ? "on" : "", patternChoice: patternChoiceOf({ patternId: (t.patternId as string) ?? null, pattern: t.pattern }) };
  raw.power = typeof t.powerPerCarrierW === "number" ? tidy(powerFromW(t.powerPerCarrierW, t.powerUnit === "dBm" ? "dBm" : "W")) : "";
  raw.gain = typeof t.gain === "number" ? tidy(t.gain) : "";
  return Object.fromEntries(Object.keys(labels).map((k) => [k, raw[k] === null || raw[k] === undefined ? "" : String(raw[k])]));
}

export function ConflictPanel({ theirs, mine, onKeepMine, onTakeTheirs }: { theirs: Record<string, unknown>; mine: Record<string, unknown>; onKeepMine: () => void; onTakeTheirs?: () => void }) {
  const saved = theirValues(theirs);
  const typed = (k: string) => (k === "active" ? (mine.active === "on" ? "on" : "") : mine[k] === undefined || mine[k] === null ? "" : String(mine[k]));
  const differ = Object.keys(labels).filter((k) => saved[k] !== typed(k));
  const show = (k: string, v: string) => (k === "active" ? (v === "on" ? "yes" : "no") : v || "—");
  return (
    <div role="alert" className="space-y-2 rounded-control border border-caution-700/40 bg-caution-100 p-3 text-sm text-ink-900">
      <p className="font-medium">Someone else saved this emitter after you opened it (now version {String(theirs.version)}). Nothing of yours was saved yet.</p>
      {differ.length ? (
        <div className="overflow-x-auto rounded bg-sheet">
          <table className="min-w-full text-left">
            <caption className="sr-only">Their saved values beside yours</caption>
            <thead className="bg-paper text-graphite-600">
              <tr>
                <th scope="col" className="px-2 py-1 font-medium">Field</th>
                <th scope="col" className="px-2 py-1 font-medium">Saved by them</th>
                <th scope="col" className="px-2 py-1 font-medium">Yours</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {differ.map((k) => (
                <tr key={k}>
                  <th scope="row" className="px-2 py-1 font-medium">{labels[k]}</th>
                  <td className="px-2 py-1 break-words">{show(k, saved[k])}</td>
                  <td className="px-2 py-1 break-words">{show(k, typed(k))}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <p>Your values equal theirs.</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="button" size="sm" tone="secondary" onClick={onKeepMine}>
          Keep mine on their version
        </Button>
        {onTakeTheirs ? (
          <Button type="button" size="sm" tone="quiet" onClick={onTakeTheirs}>
            Take theirs
          </Button>
        ) : null}
      </div>
    </div>
  );
}
