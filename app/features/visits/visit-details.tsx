// The visit as read: people, conditions, instruments with their calibration, notes, and the calibration warnings.
import { formatDate } from "~/lib/dates";

type Instrument = { probe: string; serial: string; calibrationDate: string | null };
type Props = { people: string; conditions: string; notes: string; instruments: Instrument[]; warnings: { index: number; message: string }[] };

export function CalibrationWarnings({ warnings }: { warnings: { message: string }[] }) {
  if (!warnings.length) return null;
  return (
    <div role="status" className="rounded-sheet border border-caution-700/25 bg-caution-100 p-4 text-sm text-caution-700">
      <p className="font-semibold">Check the calibration</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {warnings.map((w) => (
          <li key={w.message} className="break-words">
            {w.message}
          </li>
        ))}
      </ul>
      <p className="mt-2 text-xs">The visit is kept as recorded; readings taken with an instrument out of calibration may need a note in the report.</p>
    </div>
  );
}

export function VisitDetails({ people, conditions, notes, instruments, warnings }: Props) {
  const flagged = new Set(warnings.map((w) => w.index));
  return (
    <div className="space-y-4 text-sm">
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
        <div>
          <dt className="font-medium text-graphite-600">People</dt>
          <dd className="mt-0.5 break-words text-ink-900">{people || "—"}</dd>
        </div>
        <div>
          <dt className="font-medium text-graphite-600">Conditions</dt>
          <dd className="mt-0.5 break-words text-ink-900">{conditions || "—"}</dd>
        </div>
        {notes ? (
          <div className="sm:col-span-2">
            <dt className="font-medium text-graphite-600">Notes</dt>
            <dd className="mt-0.5 whitespace-pre-line break-words text-ink-900">{notes}</dd>
          </div>
        ) : null}
      </dl>
      <div>
        <h3 className="font-medium text-graphite-600">Instruments</h3>
        {instruments.length === 0 ? (
          <p className="mt-0.5 text-graphite-600">None listed.</p>
        ) : (
          <ul className="mt-1 divide-y divide-rule rounded-control border border-rule">
            {instruments.map((i, index) => (
              <li key={`${i.probe}-${i.serial}-${index}`} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-3 py-2">
                <span className="min-w-0 break-words">
                  <span className="font-medium text-ink-900">{i.probe}</span>
                  {i.serial ? <span className="text-graphite-600"> · serial {i.serial}</span> : null}
                </span>
                <span className={flagged.has(index) ? "rounded bg-caution-100 px-1.5 text-caution-700" : "text-graphite-600"}>
                  {i.calibrationDate ? `calibrated ${formatDate(i.calibrationDate)}` : "no calibration date"}
                </span>
              </li>
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}
