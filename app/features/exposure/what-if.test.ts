// What-if edits on the inventory: off, power in dB or %, azimuth, total downtilt.
import { describe, expect, it } from "vitest";
import type { InventoryEmitter } from "./engine-inputs";
import { applyWhatIf, cleanEdits, dbToPercent, describeEdit, hasEdits, percentToDb } from "./what-if";

const emitter = (id: string, over: Partial<InventoryEmitter> = {}): InventoryEmitter => ({
  id, label: id, frequencyMHz: 1900, powerPerCarrierW: 40, carriers: 2, lossDb: 1, gainDbi: 15, patternId: null, pattern: null, hBeamwidthDeg: 65, vBeamwidthDeg: 7,
  azimuthDeg: 120, mechanicalTiltDeg: 2, electricalTiltDeg: 4, x: 0, y: 0, z: 3, model: null, apertureM: 1.4, dishDiameterM: null, dutyFactor: 1, actualMaxFactor: 1, tddFactor: 1, active: true, ...over,
});
const list = [emitter("a"), emitter("b"), emitter("c", { active: false })];

describe("what-if edits", () => {
  it("converts between dB and % of power: 10·log10(P/P0) (the decibel's definition; IEC 60027-3)", () => {
    expect(percentToDb(50)).toBeCloseTo(-3.0103, 4);
    expect(percentToDb(100)).toBe(0);
    expect(percentToDb(0)).toBeNull();
    expect(dbToPercent(-10)).toBeCloseTo(10, 10);
    expect(dbToPercent(3)).toBeCloseTo(199.526, 3);
  });

  it("switches an emitter off and scales another's power per carrier, leaving the input untouched", () => {
    const out = applyWhatIf(list, { a: { off: true }, b: { powerDb: -3 } });
    expect(out[0].active).toBe(false);
    expect(out[1].powerPerCarrierW).toBeCloseTo(40 * 10 ** -0.3, 10);
    expect(out[1].carriers).toBe(2);
    expect(list[0].active).toBe(true);
    expect(list[1].powerPerCarrierW).toBe(40);
  });

  it("sets the total downtilt by changing the mechanical tilt and keeps the electrical; wraps the azimuth to 0–360°", () => {
    const [a] = applyWhatIf(list, { a: { tiltDeg: 10, azimuthDeg: -30 } });
    expect(a.electricalTiltDeg).toBe(4);
    expect(a.mechanicalTiltDeg).toBe(6);
    expect(a.azimuthDeg).toBe(330);
  });

  it("drops no-op edits, edits on inactive or unknown emitters, and clamps power to −60…+10 dB", () => {
    const clean = cleanEdits(list, { a: { powerDb: 0, azimuthDeg: 480, tiltDeg: 6 }, b: { powerDb: -100 }, c: { off: true }, zz: { off: true } });
    expect(clean).toEqual({ b: { powerDb: -60 } });
    expect(hasEdits(clean)).toBe(true);
    expect(hasEdits(cleanEdits(list, { a: { tiltDeg: 6 } }))).toBe(false);
  });

  it("describes an edit in words", () => {
    expect(describeEdit({ off: true })).toBe("switched off");
    expect(describeEdit({ powerDb: -3, azimuthDeg: 90 })).toBe("power −3.0 dB (50.1 %), azimuth 90°");
  });
});
