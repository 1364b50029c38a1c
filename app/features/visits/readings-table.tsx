// The readings of a visit: as entered, with frequency and power density; editable in place.
import { useCallback, useState } from "react";
import { useFetcher } from "react-router";
import { buttonClass } from "~/components/button";
import { formatDensity, formatFrequency, formatMetres, formatReadingValue } from "./format";
import { ReadingForm } from "./reading-form";

export type ReadingRowView = {
  id: string;
  version: number;
  label: string;
  surfaceId: string | null;
  surfaceName: string | null;
  x: number;
  y: number;
  heightM: number;
  value: number;
  unit: string;
  percentStandard: string | null;
  percentTier: string | null;
  frequencyMHz: number | null;
  powerDensityWm2: number | null;
  notes: string;
};

type Surface = { id: string; name: string };
// What was read and what it means first, so a narrow screen shows them before it scrolls.
const headers = ["Label", "Reading", "Power density", "Frequency", "Surface", "x, y (m)", "Height (m)", "Notes"];

function DeleteReading({ reading }: { reading: ReadingRowView }) {
  const fetcher = useFetcher();
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <button type="button" className={buttonClass("quiet", "px-2 py-1")} onClick={() => setAsking(true)} aria-label={`Delete reading ${reading.label || formatReadingValue(reading)}`}>
        Delete
      </button>
    );
  }
  return (
    <fetcher.Form method="post" className="inline-flex items-center gap-1">
      <input type="hidden" name="intent" value="delete-reading" />
      <input type="hidden" name="id" value={reading.id} />
      <button type="submit" className={buttonClass("danger", "px-2 py-1")} disabled={fetcher.state !== "idle"}>
        Delete it
      </button>
      <button type="button" className={buttonClass("quiet", "px-2 py-1")} onClick={() => setAsking(false)}>
        Keep
      </button>
    </fetcher.Form>
  );
}

function EditRow({ reading, surfaces, onClose }: { reading: ReadingRowView; surfaces: Surface[]; onClose: () => void }) {
  return (
    <tr className="bg-flag-100/40">
      <td colSpan={headers.length + 1} className="px-3 py-3">
        <p className="mb-2 text-sm font-medium text-ink-700">Edit reading {reading.label}</p>
        <ReadingForm
          intent="edit-reading"
          formId={`reading-${reading.id}`}
          surfaces={surfaces}
          submitLabel="Save reading"
          onDone={onClose}
          onCancel={onClose}
          defaults={{ ...reading, standard: reading.percentStandard, tier: reading.percentTier }}
        />
      </td>
    </tr>
  );
}

export function ReadingsTable({ readings, surfaces, canEdit }: { readings: ReadingRowView[]; surfaces: Surface[]; canEdit: boolean }) {
  const [editing, setEditing] = useState<string | null>(null);
  const close = useCallback(() => setEditing(null), []);
  if (readings.length === 0) return <p className="text-sm text-graphite-600">No readings yet.</p>;
  return (
    <div className="relative overflow-x-auto rounded-sheet border border-rule">
      <table className="min-w-full divide-y divide-rule text-sm">
        <caption className="sr-only">Readings</caption>
        <thead className="bg-paper">
          <tr>
            {headers.map((h) => (
              <th key={h} scope="col" className="px-3 py-2 text-left font-medium whitespace-nowrap text-graphite-600">
                {h}
              </th>
            ))}
            {canEdit ? <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th> : null}
          </tr>
        </thead>
        <tbody className="divide-y divide-rule bg-white">
          {readings.map((r) =>
            editing === r.id ? (
              <EditRow key={r.id} reading={r} surfaces={surfaces} onClose={close} />
            ) : (
              <tr key={r.id}>
                <td className="px-3 py-2 font-medium break-words text-ink-900">{r.label || "—"}</td>
                <td className="min-w-28 px-3 py-2">{formatReadingValue(r)}</td>
                <td className="px-3 py-2 whitespace-nowrap font-medium tabular-nums" title={r.powerDensityWm2 === null ? "A broadband % reading has no power density: the limit depends on frequency." : undefined}>
                  {formatDensity(r.powerDensityWm2)}
                </td>
                <td className="px-3 py-2 whitespace-nowrap text-graphite-600">{formatFrequency(r.frequencyMHz)}</td>
                <td className="px-3 py-2 break-words text-ink-700">{r.surfaceName ?? <span className="text-graphite-500">—</span>}</td>
                <td className="px-3 py-2 whitespace-nowrap tabular-nums">
                  {formatMetres(r.x)}, {formatMetres(r.y)}
                </td>
                <td className="px-3 py-2 tabular-nums">{formatMetres(r.heightM)}</td>
                <td className="max-w-56 px-3 py-2 break-words text-graphite-600">{r.notes}</td>
                {canEdit ? (
                  <td className="px-3 py-2 whitespace-nowrap text-right">
                    <button type="button" className={buttonClass("quiet", "px-2 py-1")} onClick={() => setEditing(r.id)} aria-label={`Edit reading ${r.label || formatReadingValue(r)}`}>
                      Edit
                    </button>
                    <DeleteReading reading={r} />
                  </td>
                ) : null}
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
