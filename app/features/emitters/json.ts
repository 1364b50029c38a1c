// Emitters as the JSON API shows them (issue contract), with the gain in the unit it was
// entered in, and EIRP / ERP from the engine's own unit functions added for convenience.
import { antennaInputPowerW, DIPOLE_GAIN_DBI, eirpToErp, eirpW } from "~/engine/units";
import type { schema } from "~/infra/db.server";

type EmitterRow = typeof schema.emitter.$inferSelect;

/** EIRP and ERP of all carriers at full power (before duty, F_PR and TDD factors), in W. */
export function emitterEirp(row: Pick<EmitterRow, "powerPerCarrierW" | "carriers" | "lossDb" | "gainDbi">) {
  const eirp = eirpW(antennaInputPowerW(row.powerPerCarrierW * row.carriers, row.lossDb), row.gainDbi);
  return { eirpW: eirp, erpW: eirpToErp(eirp) };
}

export function emitterJson(row: EmitterRow) {
  return {
    id: row.id,
    label: row.label,
    operator: row.operator,
    band: row.band,
    frequencyMHz: row.frequencyMHz,
    powerPerCarrierW: row.powerPerCarrierW,
    powerUnit: row.powerUnit,
    carriers: row.carriers,
    lossDb: row.lossDb,
    gain: row.gainUnit === "dBd" ? row.gainDbi - DIPOLE_GAIN_DBI : row.gainDbi,
    gainUnit: row.gainUnit,
    gainDbi: row.gainDbi,
    patternId: row.patternId,
    pattern: row.pattern,
    hBeamwidthDeg: row.hBeamwidthDeg,
    vBeamwidthDeg: row.vBeamwidthDeg,
    azimuthDeg: row.azimuthDeg,
    mechanicalTiltDeg: row.mechanicalTiltDeg,
    electricalTiltDeg: row.electricalTiltDeg,
    position: { x: row.x, y: row.y, z: row.z },
    model: row.model,
    apertureM: row.apertureM,
    dishDiameterM: row.dishDiameterM,
    dutyFactor: row.dutyFactor,
    actualMaxFactor: row.actualMaxFactor,
    tddFactor: row.tddFactor,
    active: row.active,
    notes: row.notes,
    version: row.version,
    ...emitterEirp(row),
  };
}
