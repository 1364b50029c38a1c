// A site's emitters as the import layout's CSV, library patterns by name.
import { libraryRefs, listEmitters } from "./emitters.server";
import { emittersToCsv } from "./csv";
import type { EmitterValues } from "./convert";

export async function exportEmittersCsv(organizationId: string, siteId: string) {
  const [rows, library] = await Promise.all([listEmitters(siteId), libraryRefs(organizationId)]);
  const names = new Map(library.map((p) => [p.id, p.name]));
  // A name two library patterns share would not find its way back: those go out by id.
  const counts = new Map<string, number>();
  for (const p of library) counts.set(p.name.toLowerCase(), (counts.get(p.name.toLowerCase()) ?? 0) + 1);
  return emittersToCsv(
    rows.map((r) => {
      const name = r.patternId ? names.get(r.patternId) : null;
      return { ...(r as EmitterValues), patternName: name && counts.get(name.toLowerCase()) === 1 ? name : r.patternId };
    }),
  );
}
