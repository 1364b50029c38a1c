// A list of audit events with a field-by-field table of what changed.
import { formatDateTime, isoDateTime } from "~/lib/dates";
import { changeRows, describeAction, recordLabel } from "./describe";

export type HistoryEvent = {
  id: number;
  at: string | Date;
  actor: string | null;
  action: string;
  entity: string;
  entityId: string;
  siteId?: string | null;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
  detail?: Record<string, unknown> | null;
};

export function HistoryList({ events, names = {}, empty, context }: { events: HistoryEvent[]; names?: Record<string, string>; empty: string; context?: (e: HistoryEvent) => React.ReactNode }) {
  if (events.length === 0) return <p className="rounded-sheet border border-dashed border-rule px-6 py-10 text-center text-sm text-graphite-600">{empty}</p>;
  return (
    <ol className="space-y-3">
      {events.map((e) => {
        const rows = changeRows(e.before, e.after, names);
        const label = recordLabel(e.after) ?? recordLabel(e.before);
        return (
          <li key={e.id} className="rounded-sheet border border-rule bg-white p-4">
            <p className="text-sm">
              <time dateTime={isoDateTime(e.at)} className="tabular-nums text-graphite-600">
                {formatDateTime(e.at)}
              </time>
              {" · "}
              <span className="font-medium text-ink-900">{e.actor ?? "A former member"}</span> {describeAction(e.action, e.entity, label)}
              {context ? <> {context(e)}</> : null}
            </p>
            {rows.length && e.before && e.after ? (
              <div className="mt-2 overflow-x-auto">
                <table className="min-w-full text-sm">
                  <thead>
                    <tr className="text-left text-graphite-600">
                      <th scope="col" className="py-1 pr-4 font-medium">Field</th>
                      <th scope="col" className="py-1 pr-4 font-medium">Before</th>
                      <th scope="col" className="py-1 font-medium">After</th>
                    </tr>
                  </thead>
                  <tbody>
                    {rows.map((r) => (
                      <tr key={r.field} className="border-t border-rule align-top">
                        <th scope="row" className="py-1 pr-4 text-left font-normal text-graphite-600">{r.field}</th>
                        <td className="py-1 pr-4 break-words text-graphite-600 line-through decoration-rule-strong/60">{r.before}</td>
                        <td className="py-1 break-words text-ink-900">{r.after}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            ) : rows.length ? (
              <p className="mt-1 text-sm break-words text-graphite-600">
                {rows.slice(0, 6).map((r) => `${r.field}: ${e.after ? r.after : r.before}`).join(" · ")}
                {rows.length > 6 ? " …" : ""}
              </p>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}
