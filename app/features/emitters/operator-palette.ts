// Colours for operators on the plan: a categorical palette readable with the common colour-vision
// deficiencies (Okabe & Ito, "Color Universal Design", 2008: blue, bluish green, sky blue, yellow and black,
// with the pale grey of Paul Tol's "bright" scheme; orange, vermillion and reddish purple are left out,
// as they sit near the caution, danger and accent colours). Markers carry the operator's initials and label too, so greyscale reads.
// Data colours, not design tokens: DESIGN.md keeps the accent and state colours off data.
export const OPERATOR_PALETTE = ["#0072B2", "#009E73", "#56B4E9", "#F0E442", "#000000", "#BBBBBB"] as const;
/** Text on each colour: white on the dark ones, black on the light ones. */
export const OPERATOR_INK = ["#ffffff", "#ffffff", "#000000", "#000000", "#ffffff", "#000000"] as const;

/** Each operator's colour index, by the operators' names sorted (stable as rows move). */
export function operatorColours(operators: readonly string[]) {
  const names = [...new Set(operators.map((o) => o.trim() || "—"))].sort((a, b) => a.localeCompare(b));
  return new Map(names.map((name, i) => [name, i % OPERATOR_PALETTE.length]));
}

/** Up to two initials of an operator's name ("Northwind Mobile" → "NM"). */
export function initials(name: string) {
  const words = name.trim().split(/\s+/).filter(Boolean);
  if (words.length === 0) return "?";
  return (words.length === 1 ? words[0].slice(0, 2) : words[0][0] + words[1][0]).toUpperCase();
}
