// The small header of the Exposure section's child pages (elevation, 3D, planner): the site, the
// options they were computed with, and the way back to the Exposure page with the same options.
import { Link, useLocation } from "react-router";
import { Notice } from "~/components/panels";
import { describeHeights, standardLabels, tierLabels, type ExposureOptions } from "./options";

export function ViewHeader({ title, siteName, options, optionErrors }: { title: string; siteName: string; options: ExposureOptions; optionErrors: string[] }) {
  const { search } = useLocation();
  return (
    <div className="mb-4 space-y-2">
      <p className="text-sm">
        <Link to={{ pathname: "..", search }} relative="path" className="link">
          ← Exposure
        </Link>
      </p>
      <h2 id="view-title" className="text-xl font-bold text-ink-900">
        {title} <span className="font-normal text-graphite-600">· {siteName}</span>
      </h2>
      <p className="text-sm text-graphite-600">
        {standardLabels[options.standard]}, {tierLabels[options.standard][options.tier]} · {describeHeights(options)} · grid step <span className="figures">{options.gridStepM} m</span> · reflection factor{" "}
        <span className="figures">{options.reflectionFactor}</span>
      </p>
      {optionErrors.length ? (
        <Notice state="caution">Some options in the address were not understood and their defaults are used: {optionErrors.join(" ")}</Notice>
      ) : null}
    </div>
  );
}
