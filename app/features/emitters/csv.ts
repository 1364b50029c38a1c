// The emitter CSV (README.md, "Emitter CSV"): read with papaparse into the API's emitter shape,
// every problem reported by spreadsheet row (the header is row 1), column and reason, so the
// person fixes the file in one pass; and written back in the same layout. Pure.
import Papa from "papaparse";
import { dbmToW } from "~/engine/units";
import { decodeTextFile } from "~/lib/text-file";
import { gainFromDbi, isParametricKind, parametricPattern, powerFromW, tidy, type EmitterValues } from "./convert";
import { EMITTER_CSV_COLUMNS, UNIT_SUFFIXES } from "./csv-columns";
import { emitterInputSchema, PARAMETRIC_KINDS, type EmitterInput } from "./schemas";

export const EMITTER_CSV_MAX_BYTES = 5 * 1024 * 1024;
export const EMITTER_CSV_MAX_ROWS = 10_000;

export type CsvProblem = { row: number | null; column: string | null; message: string };
export type LibraryRef = { id: string; name: string };
export type CsvResult = { valid: { row: number; emitter: EmitterInput }[]; problems: CsvProblem[]; rowCount: number; encoding?: string };

const byName = new Map(EMITTER_CSV_COLUMNS.map((c) => [c.name, c]));
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const WITH_UNIT = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([a-zA-Zµ°]+)$/;
const YES = new Set(["yes", "y", "true", "1", "on"]);
const NO = new Set(["no", "n", "false", "0", "off"]);

/** A header whose quantity we know but in another unit: "frequency_ghz" → what to write instead. */
function wrongUnit(name: string): string | null {
  const cut = name.lastIndexOf("_");
  if (cut < 0) return null;
  const stem = name.slice(0, cut);
  const unit = name.slice(cut + 1);
  if (!(unit in UNIT_SUFFIXES)) return null;
  const same = EMITTER_CSV_COLUMNS.filter((c) => c.name.startsWith(`${stem}_`) && c.name.slice(stem.length + 1) in UNIT_SUFFIXES);
  if (same.length === 0) return null;
  const wanted = same.map((c) => `${c.name} (${UNIT_SUFFIXES[c.name.slice(stem.length + 1)]})`).join(" or ");
  return `The column “${name}” is in ${UNIT_SUFFIXES[unit]}, a unit this layout does not take: use ${wanted}.`;
}

function readHeader(cells: string[]) {
  const problems: CsvProblem[] = [];
  const names = cells.map((c) => c.replace(/^\uFEFF/, "").trim().toLowerCase());
  names.forEach((name, i) => {
    if (!name) problems.push({ row: 1, column: `column ${i + 1}`, message: `Column ${i + 1} has no name.` });
    else if (!byName.has(name)) problems.push({ row: 1, column: name, message: wrongUnit(name) ?? `Unknown column “${name}”. The columns are: ${[...byName.keys()].join(", ")}.` });
    else if (names.indexOf(name) !== i) problems.push({ row: 1, column: name, message: `The column “${name}” appears twice.` });
  });
  for (const c of EMITTER_CSV_COLUMNS) if (c.required && !names.includes(c.name)) problems.push({ row: 1, column: c.name, message: `The required column “${c.name}” is missing (${c.help}).` });
  if (!names.includes("power_per_carrier_w") && !names.includes("power_per_carrier_dbm")) problems.push({ row: 1, column: "power_per_carrier_w", message: "The power per carrier is missing: add a power_per_carrier_w or a power_per_carrier_dbm column." });
  if (!names.includes("gain_dbi") && !names.includes("gain_dbd")) problems.push({ row: 1, column: "gain_dbi", message: "The gain is missing: add a gain_dbi or a gain_dbd column." });
  return { names, problems };
}

/** Which column a schema field's problem belongs to, for the report. */
function columnOf(path: PropertyKey[], cells: Record<string, string>) {
  const key = path.map(String).join(".");
  const map: Record<string, string> = {
    label: "label", operator: "operator", band: "band", frequencyMHz: "frequency_mhz", carriers: "carriers", lossDb: "loss_db",
    powerPerCarrierW: cells.power_per_carrier_dbm ? "power_per_carrier_dbm" : "power_per_carrier_w", gain: cells.gain_dbd ? "gain_dbd" : "gain_dbi",
    patternId: "pattern", hBeamwidthDeg: "h_beamwidth_deg", vBeamwidthDeg: "v_beamwidth_deg", azimuthDeg: "azimuth_deg", mechanicalTiltDeg: "mechanical_tilt_deg",
    electricalTiltDeg: "electrical_tilt_deg", "position.x": "x_m", "position.y": "y_m", "position.z": "z_m", model: "model", apertureM: "aperture_m",
    dishDiameterM: "dish_diameter_m", dutyFactor: "duty_factor", actualMaxFactor: "actual_max_factor", tddFactor: "tdd_factor", active: "active", notes: "notes",
  };
  if (key.startsWith("pattern.") || key === "pattern") return path[1] === "hBeamwidthDeg" ? "h_beamwidth_deg" : path[1] === "vBeamwidthDeg" ? "v_beamwidth_deg" : "pattern_model";
  return map[key] ?? key;
}

/** One data row's cells as the API's emitter, or its problems. */
function rowToEmitter(row: number, cells: Record<string, string>, library: LibraryRef[]): { emitter?: EmitterInput; problems: CsvProblem[] } {
  const problems: CsvProblem[] = [];
  const num: Record<string, number | null> = {};
  for (const [name, raw] of Object.entries(cells)) {
    const column = byName.get(name)!;
    if (!column.numeric) continue;
    if (raw === "") num[name] = null;
    else if (NUMBER.test(raw)) num[name] = Number(raw);
    else {
      const unit = WITH_UNIT.exec(raw)?.[2];
      const own = UNIT_SUFFIXES[name.slice(name.lastIndexOf("_") + 1)];
      problems.push({ row, column: name, message: unit ? `“${raw.slice(0, 40)}” carries a unit (${unit}); this column is in ${own ?? "plain numbers"}: write the number alone${own ? ` in ${own}` : ""}.` : `“${raw.slice(0, 40)}” is not a number (write decimals with a point).` });
    }
  }
  if (problems.length) return { problems };
  const pick = (a: string, b: string, what: string): [string, number] | null => {
    const va = num[a] ?? null;
    const vb = num[b] ?? null;
    if (va !== null && vb !== null) return void problems.push({ row, column: b, message: `Fill one of ${a} and ${b}, not both.` }), null;
    if (va === null && vb === null) return void problems.push({ row, column: a, message: `Enter ${what} in ${a} or ${b}.` }), null;
    return va !== null ? [a, va] : [b, vb!];
  };
  const power = pick("power_per_carrier_w", "power_per_carrier_dbm", "the power per carrier");
  const gain = pick("gain_dbi", "gain_dbd", "the gain");
  let active = true;
  const activeText = (cells.active ?? "").toLowerCase();
  if (activeText && YES.has(activeText)) active = true;
  else if (activeText && NO.has(activeText)) active = false;
  else if (activeText) problems.push({ row, column: "active", message: `Write yes or no, not “${cells.active.slice(0, 20)}”.` });
  let patternId: string | null = null;
  const patternText = cells.pattern ?? "";
  if (patternText) {
    const exact = library.find((p) => p.id === patternText);
    const named = library.filter((p) => p.name.trim().toLowerCase() === patternText.toLowerCase());
    if (exact) patternId = exact.id;
    else if (named.length === 1) patternId = named[0].id;
    else problems.push({ row, column: "pattern", message: named.length > 1 ? `${named.length} library patterns are named “${patternText}”: give its id.` : `The library has no pattern named “${patternText.slice(0, 60)}”.` });
  }
  const kind = cells.pattern_model ?? "";
  if (kind && !isParametricKind(kind)) problems.push({ row, column: "pattern_model", message: `Write ${PARAMETRIC_KINDS.join(" or ")}, or leave it empty.` });
  if (kind && patternText) problems.push({ row, column: "pattern_model", message: "Give a library pattern or a pattern model, not both." });
  const h = num.h_beamwidth_deg ?? null;
  const v = num.v_beamwidth_deg ?? null;
  if (kind && isParametricKind(kind) && (h === null || v === null)) problems.push({ row, column: h === null ? "h_beamwidth_deg" : "v_beamwidth_deg", message: "A pattern model needs both beamwidths." });
  if (problems.length || !power || !gain) return { problems };
  const candidate = {
    label: cells.label ?? "",
    operator: cells.operator ?? "",
    band: cells.band ?? "",
    frequencyMHz: num.frequency_mhz,
    powerPerCarrierW: power[0] === "power_per_carrier_dbm" ? dbmToW(power[1]) : power[1],
    powerUnit: power[0] === "power_per_carrier_dbm" ? "dBm" : "W",
    carriers: num.carriers ?? undefined,
    lossDb: num.loss_db ?? undefined,
    gain: gain[1],
    gainUnit: gain[0] === "gain_dbd" ? "dBd" : "dBi",
    patternId,
    pattern: kind && isParametricKind(kind) && h !== null && v !== null ? parametricPattern(kind, h, v) : null,
    hBeamwidthDeg: h,
    vBeamwidthDeg: v,
    azimuthDeg: num.azimuth_deg ?? undefined,
    mechanicalTiltDeg: num.mechanical_tilt_deg ?? undefined,
    electricalTiltDeg: num.electrical_tilt_deg ?? undefined,
    position: { x: num.x_m, y: num.y_m, z: num.z_m },
    model: cells.model || undefined,
    apertureM: num.aperture_m ?? null,
    dishDiameterM: num.dish_diameter_m ?? null,
    dutyFactor: num.duty_factor ?? undefined,
    actualMaxFactor: num.actual_max_factor ?? undefined,
    tddFactor: num.tdd_factor ?? undefined,
    active,
    notes: cells.notes ?? "",
  };
  // A dBm value below −100 or above 90 is a typo, not a transmitter.
  if (power[0] === "power_per_carrier_dbm" && (power[1] < -100 || power[1] > 90)) return { problems: [{ row, column: "power_per_carrier_dbm", message: "Enter the power per carrier in dBm from −100 to 90." }] };
  const parsed = emitterInputSchema.safeParse(candidate);
  if (parsed.success) return { emitter: parsed.data, problems };
  const seen = new Set<string>();
  for (const issue of parsed.error.issues) {
    const column = columnOf(issue.path, cells);
    if (seen.has(column)) continue;
    seen.add(column);
    problems.push({ row, column, message: issue.message });
  }
  return { problems };
}

/** The CSV's text checked to the end: the emitters ready to store, and every problem by row and column. */
export function emittersFromCsv(text: string, library: LibraryRef[]): CsvResult {
  if (text.replace(/^\uFEFF/, "").trim() === "") return { valid: [], problems: [{ row: null, column: null, message: "The file is empty." }], rowCount: 0 };
  const parsed = Papa.parse<string[]>(text, { header: false, skipEmptyLines: false });
  const [headerCells, ...body] = parsed.data;
  const { names, problems } = readHeader(headerCells ?? []);
  if (problems.length) return { valid: [], problems, rowCount: 0 };
  const count = body.reduce((n, cells) => (cells.every((c) => c.trim() === "") ? n : n + 1), 0);
  if (count > EMITTER_CSV_MAX_ROWS) return { valid: [], problems: [{ row: null, column: null, message: `The file has ${count} emitters; import at most ${EMITTER_CSV_MAX_ROWS} at a time.` }], rowCount: count };
  const broken = new Map<number, string>();
  for (const e of parsed.errors) if (e.row !== undefined && e.code !== "UndetectableDelimiter") broken.set(e.row, e.message);
  const valid: CsvResult["valid"] = [];
  body.forEach((raw, i) => {
    const row = i + 2;
    if (raw.every((c) => c.trim() === "")) return;
    if (broken.has(i + 1)) return void problems.push({ row, column: null, message: `This row cannot be read: ${broken.get(i + 1)}.` });
    if (raw.length !== names.length) return void problems.push({ row, column: null, message: `This row has ${raw.length} fields; the header has ${names.length}.` });
    const cells = Object.fromEntries(names.map((n, j) => [n, raw[j].trim().replace(/^'(?=[=+\-@])/, "")]));
    const result = rowToEmitter(row, cells, library);
    problems.push(...result.problems);
    if (result.emitter && result.problems.length === 0) valid.push({ row, emitter: result.emitter });
  });
  if (count === 0) problems.push({ row: null, column: null, message: "The file has a header but no emitters." });
  return { valid, problems, rowCount: count };
}

/** A file's bytes (UTF-8 with or without a BOM, UTF-16, Latin-1) checked as above, refused over 5 MB. */
export function emittersFromCsvBytes(bytes: Uint8Array, library: LibraryRef[]): CsvResult {
  if (bytes.byteLength > EMITTER_CSV_MAX_BYTES) return { valid: [], problems: [{ row: null, column: null, message: "The file is larger than 5 MB. Split it, or import the site in parts with “Add to the list”." }], rowCount: 0 };
  const { text, encoding } = decodeTextFile(bytes);
  return { ...emittersFromCsv(text, library), encoding };
}

const cell = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));

/** The site's emitters in the import layout, so exporting and importing again gives the same inventory. */
export function emittersToCsv(rows: (EmitterValues & { patternName?: string | null })[]): string {
  const header = EMITTER_CSV_COLUMNS.map((c) => c.name);
  const data = rows.map((e) => {
    const kind = (e.pattern as { type?: string } | null)?.type ?? "";
    const record: Record<string, string> = {
      label: e.label, operator: e.operator, band: e.band, frequency_mhz: cell(e.frequencyMHz),
      power_per_carrier_w: e.powerUnit === "W" ? cell(e.powerPerCarrierW) : "",
      power_per_carrier_dbm: e.powerUnit === "dBm" ? cell(tidy(powerFromW(e.powerPerCarrierW, "dBm"))) : "",
      carriers: cell(e.carriers), loss_db: cell(e.lossDb),
      gain_dbi: e.gainUnit === "dBi" ? cell(e.gainDbi) : "",
      gain_dbd: e.gainUnit === "dBd" ? cell(tidy(gainFromDbi(e.gainDbi, "dBd"))) : "",
      pattern: e.patternId ? (e.patternName ?? e.patternId) : "",
      pattern_model: isParametricKind(kind) ? kind : "",
      h_beamwidth_deg: cell(e.hBeamwidthDeg), v_beamwidth_deg: cell(e.vBeamwidthDeg), azimuth_deg: cell(e.azimuthDeg),
      mechanical_tilt_deg: cell(e.mechanicalTiltDeg), electrical_tilt_deg: cell(e.electricalTiltDeg),
      x_m: cell(e.x), y_m: cell(e.y), z_m: cell(e.z), model: e.model, aperture_m: cell(e.apertureM), dish_diameter_m: cell(e.dishDiameterM),
      duty_factor: cell(e.dutyFactor), actual_max_factor: cell(e.actualMaxFactor), tdd_factor: cell(e.tddFactor), active: e.active ? "yes" : "no", notes: e.notes,
    };
    return header.map((h) => record[h]);
  });
  // Cells that a spreadsheet would run as a formula are quoted with a leading apostrophe (CSV injection).
  const safe = data.map((r) => r.map((v) => (/^[=+\-@\t\r]/.test(v) && !NUMBER.test(v) ? `'${v}` : v)));
  return Papa.unparse({ fields: header, data: safe }, { newline: "\r\n" });
}
