import { formatDate, isoDate, type DateInput } from "~/lib/dates";

/** A date as "2 Dec 2026", with the ISO date for machines and on hover; `figures` sets it in the mono face (tables). */
export function DateText({ value, figures = false }: { value: DateInput; figures?: boolean }) {
  const iso = isoDate(value);
  return (
    <time dateTime={iso} title={iso} className={figures ? "figures" : "tabular-nums"}>
      {formatDate(value)}
    </time>
  );
}
