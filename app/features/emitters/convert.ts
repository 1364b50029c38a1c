// Between what a person types and what is stored: power in W or dBm (stored W, the unit kept),
// gain in dBi or dBd (stored dBi = dBd + 2.15), the pattern as one choice. Uses the engine's own
// unit functions, so the table, the CSV and the computation agree to the last digit. Pure.
import { dbdToDbi, dbiToDbd, dbmToW, wToDbm } from "~/engine/units";
import type { EmitterFormInput, EmitterInput, GainUnit, ParametricKind, ParametricPattern, PowerUnit } from "./schemas";
import { PARAMETRIC_KINDS } from "./schemas";

/** The stored columns of an emitter (app/infra/db/schema/emitters.ts), without the bookkeeping ones. */
export type EmitterValues = {
  label: string;
  operator: string;
  band: string;
  frequencyMHz: number;
  powerPerCarrierW: number;
  powerUnit: PowerUnit;
  carriers: number;
  lossDb: number;
  gainDbi: number;
  gainUnit: GainUnit;
  patternId: string | null;
  pattern: ParametricPattern | null;
  hBeamwidthDeg: number | null;
  vBeamwidthDeg: number | null;
  azimuthDeg: number;
  mechanicalTiltDeg: number;
  electricalTiltDeg: number;
  x: number;
  y: number;
  z: number;
  model: "spherical" | "cylindrical" | "auto" | "aperture";
  apertureM: number | null;
  dishDiameterM: number | null;
  dutyFactor: number;
  actualMaxFactor: number;
  tddFactor: number;
  active: boolean;
  notes: string;
};

/** Power per carrier in W from the value as typed. */
export const powerToW = (value: number, unit: PowerUnit) => (unit === "dBm" ? dbmToW(value) : value);
/** The stored W shown in the unit it was entered in. */
export const powerFromW = (w: number, unit: PowerUnit) => (unit === "dBm" ? wToDbm(w) : w);
/** Gain in dBi from the value as typed. */
export const gainToDbi = (value: number, unit: GainUnit) => (unit === "dBd" ? dbdToDbi(value) : value);
/** The stored dBi shown in the unit it was entered in. */
export const gainFromDbi = (dbi: number, unit: GainUnit) => (unit === "dBd" ? dbiToDbd(dbi) : dbi);

/** A value shown without float noise (0.30000000000000004 → 0.3), at most 12 significant digits. */
export const tidy = (v: number) => Number(v.toPrecision(12));

/** The parametric pattern a kind and two beamwidths describe. */
export function parametricPattern(kind: ParametricKind, hBeamwidthDeg: number, vBeamwidthDeg: number): ParametricPattern {
  // TR 38.901 Table 7.3-1: A_max = 30 dB, SLA_V = 30 dB (the engine's defaults).
  return kind === "3gpp-38.901" ? { type: kind, hBeamwidthDeg, vBeamwidthDeg, maxAttenuationDb: 30, sideLobeDb: 30 } : { type: kind, hBeamwidthDeg, vBeamwidthDeg };
}

export const isParametricKind = (v: string): v is ParametricKind => (PARAMETRIC_KINDS as readonly string[]).includes(v);

/** The API's emitter as the row to store. */
export function valuesFromInput(e: EmitterInput): EmitterValues {
  const { id: _id, version: _v, gain, position, pattern, ...rest } = e;
  return { ...rest, pattern: pattern && pattern.type !== "isotropic" ? pattern : null, gainDbi: gainToDbi(gain, e.gainUnit), x: position.x, y: position.y, z: position.z };
}

/** The table's form as the row to store. */
export function valuesFromForm(f: EmitterFormInput): EmitterValues {
  const { id: _id, version: _v, pattern: _p, patternChoice, power, gain, ...rest } = f;
  const patternId = patternChoice.startsWith("lib:") ? patternChoice.slice(4) : null;
  const pattern = isParametricKind(patternChoice) && f.hBeamwidthDeg && f.vBeamwidthDeg ? parametricPattern(patternChoice, f.hBeamwidthDeg, f.vBeamwidthDeg) : null;
  return { ...rest, patternId, pattern, powerPerCarrierW: powerToW(power, f.powerUnit), gainDbi: gainToDbi(gain, f.gainUnit) };
}

/** The pattern select's value for a stored row. */
export function patternChoiceOf(row: { patternId: string | null; pattern: unknown }) {
  if (row.patternId) return `lib:${row.patternId}`;
  const type = (row.pattern as { type?: string } | null)?.type;
  return type && isParametricKind(type) ? type : "";
}

/** A stored row as the form's starting values (text, as the inputs hold them). */
export function formDefaults(row: EmitterValues & { id?: string; version?: number }): Record<string, string> {
  const out: Record<string, string> = {};
  const put = (k: string, v: unknown) => (out[k] = v === null || v === undefined ? "" : String(v));
  for (const [k, v] of Object.entries(row)) if (k !== "pattern" && typeof v !== "object") put(k, v);
  put("power", tidy(powerFromW(row.powerPerCarrierW, row.powerUnit)));
  put("gain", tidy(gainFromDbi(row.gainDbi, row.gainUnit)));
  put("patternChoice", patternChoiceOf(row));
  put("active", row.active ? "on" : "");
  put("apertureM", row.apertureM);
  put("dishDiameterM", row.dishDiameterM);
  put("hBeamwidthDeg", row.hBeamwidthDeg);
  put("vBeamwidthDeg", row.vBeamwidthDeg);
  return out;
}
