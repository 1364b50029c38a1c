import { StateGlyph } from "./state-glyph";

/** The usual RF cautions (DESIGN.md §5), shown wherever results or site work are discussed. */
export function RfCautions() {
  return (
    <aside aria-label="RF safety cautions" className="flex overflow-hidden rounded-sheet border border-rule bg-sheet">
      <div className="hatch-caution w-2.5 shrink-0" />
      <div className="p-4 text-sm text-ink-900">
        <p className="flex items-center gap-2 font-bold text-caution-700">
          <StateGlyph state="caution" />
          RF safety
        </p>
        <ul className="mt-2 list-disc space-y-1 pl-5 marker:text-graphite-500">
          <li>Predictions are conservative estimates under stated assumptions, not measurements.</li>
          <li>People with medical implants may need lower exposure than the published limits.</li>
          <li>Stay out of the main beam of any antenna; follow the site's RF safety plan, signage and lock-out procedures.</li>
          <li>Local codes and the judgement of a licensed professional prevail over anything shown here.</li>
        </ul>
      </div>
    </aside>
  );
}
