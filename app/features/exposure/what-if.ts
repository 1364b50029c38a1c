// What-if edits on a site's emitters: switched off, power scaled (dB), azimuth or total downtilt
// changed. Pure: edits in, the modified inventory list out, so the map's worker, the elevation and
// 3D views and the planner apply the same edits the same way. Nothing here is saved.
import type { InventoryEmitter } from "./engine-inputs";

export type EmitterEdit = {
  /** Switched off for the what-if. */
  off?: boolean;
  /** Power change in dB (−3 halves it); applied to every carrier's power. */
  powerDb?: number;
  /** New boresight bearing, degrees clockwise from north. */
  azimuthDeg?: number;
  /** New total downtilt (mechanical + electrical), degrees below the horizon; the electrical tilt is kept. */
  tiltDeg?: number;
};

/** Edits by inventory emitter id. */
export type WhatIfEdits = Record<string, EmitterEdit>;

export const POWER_DB_RANGE = [-60, 10] as const;
export const TILT_RANGE = [-90, 90] as const;

/** dB from a percentage of the stored power (50 % → −3.01 dB); 0 % or less is "off". */
export function percentToDb(percent: number): number | null {
  if (!(percent > 0)) return null;
  return 10 * Math.log10(percent / 100);
}

/** Percentage of the stored power from dB (−3 dB → 50.1 %). */
export function dbToPercent(db: number): number {
  return 100 * 10 ** (db / 10);
}

const clamp = (v: number, [lo, hi]: readonly [number, number]) => Math.min(hi, Math.max(lo, v));
const bearing = (deg: number) => ((deg % 360) + 360) % 360;

/** The edit with its values brought into range and the no-ops removed; null when nothing is left. */
export function cleanEdit(edit: EmitterEdit, emitter: InventoryEmitter): EmitterEdit | null {
  const out: EmitterEdit = {};
  if (edit.off) out.off = true;
  if (edit.powerDb !== undefined && Number.isFinite(edit.powerDb) && edit.powerDb !== 0) out.powerDb = clamp(edit.powerDb, POWER_DB_RANGE);
  if (edit.azimuthDeg !== undefined && Number.isFinite(edit.azimuthDeg) && bearing(edit.azimuthDeg) !== bearing(emitter.azimuthDeg)) out.azimuthDeg = bearing(edit.azimuthDeg);
  const tilt = emitter.mechanicalTiltDeg + emitter.electricalTiltDeg;
  if (edit.tiltDeg !== undefined && Number.isFinite(edit.tiltDeg) && edit.tiltDeg !== tilt) out.tiltDeg = clamp(edit.tiltDeg, TILT_RANGE);
  return Object.keys(out).length ? out : null;
}

/** Only the edits that change something, on emitters that exist and are active in the inventory. */
export function cleanEdits(emitters: InventoryEmitter[], edits: WhatIfEdits): WhatIfEdits {
  const out: WhatIfEdits = {};
  for (const e of emitters) {
    const edit = edits[e.id];
    if (!edit || !e.active) continue;
    const clean = cleanEdit(edit, e);
    if (clean) out[e.id] = clean;
  }
  return out;
}

export const hasEdits = (edits: WhatIfEdits) => Object.keys(edits).length > 0;

/** The inventory with the edits applied: a new list, the input untouched. */
export function applyWhatIf(emitters: InventoryEmitter[], edits: WhatIfEdits): InventoryEmitter[] {
  return emitters.map((e) => {
    const edit = e.active ? edits[e.id] : undefined;
    if (!edit) return e;
    const out = { ...e };
    if (edit.off) out.active = false;
    if (edit.powerDb !== undefined) out.powerPerCarrierW = e.powerPerCarrierW * 10 ** (clamp(edit.powerDb, POWER_DB_RANGE) / 10);
    if (edit.azimuthDeg !== undefined) out.azimuthDeg = bearing(edit.azimuthDeg);
    if (edit.tiltDeg !== undefined) out.mechanicalTiltDeg = clamp(edit.tiltDeg, TILT_RANGE) - e.electricalTiltDeg;
    return out;
  });
}

/** "off", "−3.0 dB, azimuth 90°, tilt 6°": what an edit does, in words for the what-if list. */
export function describeEdit(edit: EmitterEdit): string {
  if (edit.off) return "switched off";
  const parts: string[] = [];
  if (edit.powerDb !== undefined) parts.push(`power ${edit.powerDb > 0 ? "+" : "−"}${Math.abs(edit.powerDb).toFixed(1)} dB (${dbToPercent(edit.powerDb).toPrecision(3)} %)`);
  if (edit.azimuthDeg !== undefined) parts.push(`azimuth ${edit.azimuthDeg}°`);
  if (edit.tiltDeg !== undefined) parts.push(`downtilt ${edit.tiltDeg}°`);
  return parts.join(", ");
}
