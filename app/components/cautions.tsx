/** The usual RF cautions (DESIGN.md §5), shown wherever results or site work are discussed. */
export function RfCautions() {
  return (
    <aside aria-label="RF safety cautions" className="rounded-card border border-caution-700/25 bg-caution-100 p-4 text-sm text-caution-700">
      <p className="font-semibold">RF safety</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        <li>Predictions are conservative estimates under stated assumptions, not measurements.</li>
        <li>People with medical implants may need lower exposure than the published limits.</li>
        <li>Stay out of the main beam of any antenna; follow the site's RF safety plan, signage and lock-out procedures.</li>
        <li>Local codes and the judgement of a licensed professional prevail over anything shown here.</li>
      </ul>
    </aside>
  );
}
