// From the stored inventory to the engine's request: the one place where the inventory's
// fields become the engine's (all carriers' power, total tilt, time-averaging factors, the
// pattern, the model). Pure: the loader, the browser's what-if worker and the tests share it.
import type { EmitterInput, EvaluationRequestInput } from "~/engine";
import type { EnginePattern } from "~/infra/db/schema/emitters";

export type ModelName = "spherical" | "cylindrical" | "auto" | "aperture";

export type InventoryEmitter = {
  id: string;
  label: string;
  frequencyMHz: number;
  powerPerCarrierW: number;
  carriers: number;
  lossDb: number;
  gainDbi: number;
  patternId: string | null;
  pattern: EnginePattern | null;
  hBeamwidthDeg: number | null;
  vBeamwidthDeg: number | null;
  azimuthDeg: number;
  mechanicalTiltDeg: number;
  electricalTiltDeg: number;
  x: number;
  y: number;
  z: number;
  model: ModelName | null;
  apertureM: number | null;
  dishDiameterM: number | null;
  dutyFactor: number;
  actualMaxFactor: number;
  tddFactor: number;
  active: boolean;
};

export type EmitterOptions = { reflectionFactor: number; defaultModel: ModelName };

/**
 * Time-averaged share of full power: duty factor × F_PR × F_TDD. IEC 62232 (actual-maximum
 * approach): P_avg = F_PR · F_TDD · P_max, with F_PR the actual-maximum power reduction factor and
 * F_TDD the downlink share of a TDD frame; the duty factor covers any other time averaging.
 */
export function timeAveragingFactor(e: Pick<InventoryEmitter, "dutyFactor" | "actualMaxFactor" | "tddFactor">) {
  return e.dutyFactor * e.actualMaxFactor * e.tddFactor;
}

/** The pattern the engine gets: the library pattern, else the emitter's own, else 3GPP TR 38.901 from its beamwidths, else isotropic. */
export function emitterPattern(e: Pick<InventoryEmitter, "patternId" | "pattern" | "hBeamwidthDeg" | "vBeamwidthDeg">, library: ReadonlyMap<string, EnginePattern>): EnginePattern {
  if (e.patternId) {
    const found = library.get(e.patternId);
    if (!found) throw new Error(`pattern ${e.patternId} is not in the library given`);
    return found;
  }
  if (e.pattern) return e.pattern;
  if (e.hBeamwidthDeg && e.vBeamwidthDeg) return { type: "3gpp-38.901", hBeamwidthDeg: e.hBeamwidthDeg, vBeamwidthDeg: e.vBeamwidthDeg, maxAttenuationDb: 30, sideLobeDb: 30 };
  return "isotropic";
}

/** One inventory emitter as the engine's emitter. `engineId` must be unique within the request. */
export function engineEmitter(e: InventoryEmitter, engineId: string, library: ReadonlyMap<string, EnginePattern>, options: EmitterOptions): EmitterInput {
  const model = e.model ?? options.defaultModel;
  const aperture = model === "aperture" ? e.dishDiameterM : e.apertureM;
  const out: EmitterInput = {
    id: engineId,
    frequencyMHz: e.frequencyMHz,
    powerW: e.powerPerCarrierW * e.carriers,
    lossDb: e.lossDb,
    gainDbi: e.gainDbi,
    position: { x: e.x, y: e.y, z: e.z },
    azimuthDeg: e.azimuthDeg,
    tiltDeg: e.mechanicalTiltDeg + e.electricalTiltDeg,
    pattern: emitterPattern(e, library),
    // A model that needs a size the inventory lacks falls back to the spherical far-field model.
    model: model !== "spherical" && !aperture ? "spherical" : model,
    reflectionFactor: options.reflectionFactor,
    dutyFactor: timeAveragingFactor(e),
  };
  if (out.model !== "spherical" && aperture) out.apertureM = aperture;
  if (e.hBeamwidthDeg) out.hBeamwidthDeg = e.hBeamwidthDeg;
  return out;
}

/** The active emitters as engine emitters, with ids from their labels (made unique where two share one). */
export function engineEmitters(list: InventoryEmitter[], library: ReadonlyMap<string, EnginePattern>, options: EmitterOptions) {
  const used = new Map<string, number>();
  const ids = new Map<string, string>();
  const emitters: EmitterInput[] = [];
  for (const e of list) {
    if (!e.active) continue;
    const base = e.label || "emitter";
    const n = (used.get(base) ?? 0) + 1;
    used.set(base, n);
    const engineId = n === 1 ? base : `${base} (${n})`;
    ids.set(engineId, e.id);
    emitters.push(engineEmitter(e, engineId, library, options));
  }
  return { emitters, inventoryIdOf: ids };
}

export type { EmitterInput, EvaluationRequestInput };
