// The pattern CSV (README.md, "Pattern CSV"): one row per sample of a cut, `cut,angle_deg,attenuation_db`,
// the cut `horizontal` (or h) and `vertical` (or v), the attenuation relative to boresight in dB (≥ 0).
// Read into the engine's tabulated pattern object, with every problem by row and column. Pure.
import Papa from "papaparse";
import type { CsvProblem } from "./csv";

export const PATTERN_CSV_COLUMNS = [
  { name: "cut", help: "horizontal (or h) or vertical (or v)" },
  { name: "angle_deg", help: "angle off boresight, degrees, −180 to 360 (vertical: positive up)" },
  { name: "attenuation_db", help: "attenuation relative to boresight, dB, 0 to 200" },
] as const;
export const PATTERN_CSV_MAX_BYTES = 1024 * 1024;
const MAX_POINTS = 3600;

export type Cut = { angleDeg: number; attenuationDb: number }[];
export type TabulatedPattern = { type: "tabulated"; horizontal: Cut; vertical: Cut };

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function patternFromCsv(text: string): { pattern: TabulatedPattern | null; problems: CsvProblem[] } {
  const clean = text.replace(/^\uFEFF/, "");
  if (clean.trim() === "") return { pattern: null, problems: [{ row: null, column: null, message: "The file is empty." }] };
  const parsed = Papa.parse<string[]>(clean, { header: false, skipEmptyLines: "greedy" });
  const [head, ...body] = parsed.data;
  const names = head.map((c) => c.trim().toLowerCase());
  const problems: CsvProblem[] = [];
  names.forEach((n) => {
    if (!PATTERN_CSV_COLUMNS.some((c) => c.name === n)) problems.push({ row: 1, column: n || null, message: n === "gain_db" || n === "gain_dbi" ? "Give the attenuation relative to boresight (attenuation_db, 0 at boresight, positive away from it), not the gain." : `Unknown column “${n}”. The columns are: cut, angle_deg, attenuation_db.` });
  });
  for (const c of PATTERN_CSV_COLUMNS) if (!names.includes(c.name)) problems.push({ row: 1, column: c.name, message: `The required column “${c.name}” is missing (${c.help}).` });
  if (problems.length) return { pattern: null, problems };
  const at = (cells: string[], name: string) => (cells[names.indexOf(name)] ?? "").trim();
  const horizontal: Cut = [];
  const vertical: Cut = [];
  body.forEach((cells, i) => {
    const row = i + 2;
    const cut = at(cells, "cut").toLowerCase();
    const target = cut === "h" || cut === "horizontal" ? horizontal : cut === "v" || cut === "vertical" ? vertical : null;
    if (!target) return void problems.push({ row, column: "cut", message: `Write horizontal or vertical, not “${at(cells, "cut").slice(0, 20)}”.` });
    const angle = at(cells, "angle_deg");
    const att = at(cells, "attenuation_db");
    if (!NUMBER.test(angle)) return void problems.push({ row, column: "angle_deg", message: `“${angle.slice(0, 20)}” is not a number of degrees.` });
    if (!NUMBER.test(att)) return void problems.push({ row, column: "attenuation_db", message: `“${att.slice(0, 20)}” is not a number of dB.` });
    const a = Number(angle);
    const d = Number(att);
    if (a < -180 || a > 360) return void problems.push({ row, column: "angle_deg", message: "Enter an angle from −180 to 360 degrees." });
    if (d < 0 || d > 200) return void problems.push({ row, column: "attenuation_db", message: d < 0 ? "Attenuation is relative to boresight: 0 or more dB (a negative value would be above the peak)." : "Enter an attenuation of at most 200 dB." });
    target.push({ angleDeg: a, attenuationDb: d });
  });
  for (const [name, cut] of [["horizontal", horizontal], ["vertical", vertical]] as const) {
    if (cut.length === 0) problems.push({ row: null, column: "cut", message: `The file has no ${name} cut.` });
    if (cut.length > MAX_POINTS) problems.push({ row: null, column: "cut", message: `The ${name} cut has ${cut.length} points; use at most ${MAX_POINTS}.` });
  }
  if (problems.length) return { pattern: null, problems };
  return { pattern: { type: "tabulated", horizontal, vertical }, problems };
}
