// A site's status as a landlord reads it: compliant, or the areas to keep people out of and why,
// with the doors to keep locked. The words come from status.ts; the page adds the maps.
import { Notice } from "~/components/panels";
import { DateText } from "~/components/date-text";
import { kindLabels } from "~/features/documents/labels";
import { classNames, type SiteStatus, type StatusBasis } from "./status";

const percent = (v: number) => `${v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toFixed(2)} %`;
const area = (m2: number) => `${m2 >= 10 ? m2.toFixed(0) : m2.toFixed(1)} m²`;

/** ", mostly in the west part (25 m²), also the south part (1.3 m²) and 2 smaller patches". */
function whereText(zones: SiteStatus["keepOut"][number]["zones"]) {
  const named = zones.filter((z) => z.where);
  if (!named.length) return "";
  const [first, ...rest] = named;
  const shown = rest.slice(0, 2).map((z) => `${z.where} (${area(z.areaM2)})`);
  const more = rest.length - shown.length;
  const also = [...shown, ...(more ? [`${more} smaller ${more === 1 ? "patch" : "patches"}`] : [])];
  return `, ${rest.length ? "mostly " : ""}in ${first.where} (${area(first.areaM2)})${also.length ? `, also ${also.join(", ").replace(/, ([^,]*)$/, " and $1")}` : ""}`;
}

/** One short badge: a tick and "Compliant", or a triangle and the count of keep-out areas. */
export function StatusBadge({ status }: { status: SiteStatus | null }) {
  if (!status) return <Notice state="info">No issued assessment yet</Notice>;
  if (status.compliant) return <Notice state="ok">Compliant: within the public limit everywhere assessed</Notice>;
  const n = status.keepOut.length;
  return (
    <Notice state="caution">
      {n} {n === 1 ? "area" : "areas"} to keep people out of
    </Notice>
  );
}

export function BasisLine({ basis }: { basis: StatusBasis }) {
  return (
    <p className="text-sm text-graphite-600">
      From the assessment “<span className="[overflow-wrap:anywhere]">{basis.assessmentName}</span>” of <DateText value={basis.assessedOn} /> against the {basis.standard} limit, issued in the {kindLabels[basis.documentKind].toLowerCase()}
      {basis.issuedAt ? (
        <>
          {" "}of <DateText value={basis.issuedAt} />
        </>
      ) : null}
      .
    </p>
  );
}

export function StatusDetail({ status }: { status: SiteStatus }) {
  if (status.compliant) {
    return (
      <div className="space-y-2">
        <StatusBadge status={status} />
        <p>
          Predicted exposure is at most <span className="figures">{percent(status.worstPercent)}</span> of the limit everywhere we assessed. Nowhere needs to be closed to the public; keep any signs
          posted and call the operators before work near the antennas.
        </p>
      </div>
    );
  }
  return (
    <div className="space-y-4">
      <StatusBadge status={status} />
      <p>
        Exposure reaches <span className="figures">{percent(status.worstPercent)}</span> of the limit near the antennas. Keep people out of these areas:
      </p>
      <ul className="space-y-3">
        {status.keepOut.map((k) => (
          <li key={k.surfaceId} className="rounded-sheet border border-rule bg-sheet p-4">
            <p className="flex flex-wrap items-baseline justify-between gap-x-3">
              <span className="font-bold [overflow-wrap:anywhere] text-ink-900">
                {k.kind === "facade" ? `In front of ${k.name}` : k.name}
              </span>
              <span className="label-caps">{classNames[k.worstClass]}</span>
            </p>
            <p className="mt-1">{k.rule}</p>
            <p className="mt-1 text-sm text-graphite-600">
              {k.kind === "area" ? (
                <>
                  <span className="figures">{area(k.overGeneralM2)}</span> above the public limit
                  {whereText(k.zones)}; shaded on the map below.
                </>
              ) : (
                "Keep windows, balconies and platforms on this face closed to the public."
              )}
            </p>
          </li>
        ))}
      </ul>
      {status.lockedAccess.length ? (
        <p>
          <span className="font-bold">Keep locked or supervised:</span> {status.lockedAccess.join(", ")}. Give keys only to people who know about these areas, and call the operators before any work
          there.
        </p>
      ) : null}
    </div>
  );
}
