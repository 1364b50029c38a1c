// The readings CSV: our own layout, one reading per row, units in the header names
// (README.md, "Readings CSV"). Parsed with papaparse; every problem reported by spreadsheet
// row (the header is row 1) and column, so the person can fix the file in one pass.
import Papa from "papaparse";
import { READINGS_MAX_ROWS } from "./limits";
import { checkReadings, type NewReading, type SurfaceRef } from "./readings-check";
import { READINGS_CSV_COLUMNS, type Column } from "./readings-csv-columns";

export type CsvProblem = { row: number | null; column: string | null; message: string };

const byName = new Map(READINGS_CSV_COLUMNS.map((c) => [c.name, c]));
const byField = new Map(READINGS_CSV_COLUMNS.map((c) => [c.field, c]));
byField.set("surfaceId", byName.get("surface")!);
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

function readHeader(cells: string[]): { columns: (Column | null)[]; problems: CsvProblem[] } {
  const problems: CsvProblem[] = [];
  const names = cells.map((c) => c.replace(/^\uFEFF/, "").trim().toLowerCase());
  const columns = names.map((name) => byName.get(name) ?? null);
  names.forEach((name, i) => {
    if (!columns[i]) problems.push({ row: 1, column: name || `column ${i + 1}`, message: name ? `Unknown column “${name}”. The columns are: ${[...byName.keys()].join(", ")}.` : `Column ${i + 1} has no name.` });
    else if (names.indexOf(name) !== i) problems.push({ row: 1, column: name, message: `The column “${name}” appears twice.` });
  });
  for (const c of READINGS_CSV_COLUMNS) {
    if (c.required && !names.includes(c.name)) problems.push({ row: 1, column: c.name, message: `The required column “${c.name}” is missing (${c.help}).` });
  }
  return { columns, problems };
}

/** Reads the CSV text into one plain object per data row (keyed like the JSON body), or the problems that stop it. */
export function parseReadingsCsv(text: string): { rows: { row: number; data: Record<string, unknown> }[]; problems: CsvProblem[] } {
  if (text.replace(/^\uFEFF/, "").trim() === "") return { rows: [], problems: [{ row: null, column: null, message: "The file is empty." }] };
  const parsed = Papa.parse<string[]>(text, { header: false, skipEmptyLines: false });
  const [headerCells, ...body] = parsed.data;
  const { columns, problems } = readHeader(headerCells);
  if (problems.length) return { rows: [], problems };
  const count = body.reduce((n, cells) => (cells.every((c) => c.trim() === "") ? n : n + 1), 0);
  if (count > READINGS_MAX_ROWS) return { rows: [], problems: [{ row: null, column: null, message: `The file has ${count} readings; import at most ${READINGS_MAX_ROWS} at a time.` }] };
  const rows: { row: number; data: Record<string, unknown> }[] = [];
  const broken = new Map<number, string>();
  for (const e of parsed.errors) if (e.row !== undefined && e.code !== "UndetectableDelimiter") broken.set(e.row, e.message);
  body.forEach((cells, i) => {
    const row = i + 2;
    if (cells.every((c) => c.trim() === "")) return;
    if (broken.has(i + 1)) return void problems.push({ row, column: null, message: `This row cannot be read: ${broken.get(i + 1)}.` });
    if (cells.length !== columns.length) return void problems.push({ row, column: null, message: `This row has ${cells.length} fields; the header has ${columns.length}.` });
    const data: Record<string, unknown> = {};
    cells.forEach((raw, j) => {
      const column = columns[j]!;
      const cell = raw.trim();
      if (!column.numeric) data[column.field] = cell;
      else if (cell === "") data[column.field] = column.required ? undefined : null;
      else if (NUMBER.test(cell)) data[column.field] = Number(cell);
      else problems.push({ row, column: column.name, message: `“${cell.slice(0, 40)}” is not a number (write decimals with a point).` });
    });
    rows.push({ row, data });
  });
  if (rows.length === 0 && problems.length === 0) problems.push({ row: null, column: null, message: "The file has a header but no readings." });
  return { rows, problems };
}

/** The CSV checked to the end: readings ready to store, and every problem by row and column. */
export function readingsFromCsv(text: string, surfaces: SurfaceRef[]): { valid: { row: number; reading: NewReading }[]; problems: CsvProblem[]; rowCount: number } {
  const { rows, problems } = parseReadingsCsv(text);
  const unreadable = new Set(problems.map((p) => p.row));
  const candidates = rows.filter((r) => !unreadable.has(r.row));
  const checked = checkReadings(candidates.map((r) => r.data), surfaces);
  const all = [
    ...problems,
    ...checked.problems.map((p) => ({ row: candidates[p.index].row, column: byField.get(p.field)?.name ?? p.field, message: p.message })),
  ].sort((a, b) => (a.row ?? 0) - (b.row ?? 0));
  const rowCount = new Set([...rows.map((r) => r.row), ...problems.map((p) => p.row).filter((r) => r !== null)]).size;
  return { valid: checked.valid.map((v) => ({ row: candidates[v.index].row, reading: v.reading })), problems: all, rowCount };
}
