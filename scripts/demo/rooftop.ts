// The demo rooftop: Calloway House, an invented eight-storey block with a penthouse and a lower
// west wing, shared by three invented operators; a neighbouring building's east-facing windows
// across Tamsin Street face one sector. Geometry in site metres (x east, y north, z up from the
// main roof slab).
export type DemoEmitter = {
  label: string;
  operator: string;
  band: string;
  frequencyMHz: number;
  powerPerCarrierW: number;
  powerUnit?: "W" | "dBm";
  carriers: number;
  lossDb: number;
  gainDbi: number;
  gainUnit?: "dBi" | "dBd";
  hBeamwidthDeg: number;
  vBeamwidthDeg: number;
  azimuthDeg: number;
  mechanicalTiltDeg: number;
  electricalTiltDeg: number;
  x: number;
  y: number;
  z: number;
  model: "spherical" | "cylindrical" | "auto";
  apertureM: number;
  actualMaxFactor?: number;
  tddFactor?: number;
  patternName?: string;
  notes?: string;
};

export const rooftopSurfaces = [
  { name: "Main roof", kind: "area" as const, polygon: [[0, 0], [40, 0], [40, 28], [0, 28]] as [number, number][], elevationM: 0, access: "workers" as const },
  { name: "Penthouse top", kind: "area" as const, polygon: [[26, 16], [38, 16], [38, 26], [26, 26]] as [number, number][], elevationM: 4.2, access: "none" as const },
  { name: "West wing lower roof", kind: "area" as const, polygon: [[-18, 2], [0, 2], [0, 18], [-18, 18]] as [number, number][], elevationM: -3.5, access: "workers" as const },
  { name: "Harrow Court east windows", kind: "facade" as const, line: [[58, 0], [58, 30]] as [[number, number], [number, number]], bottomM: -21, topM: 3, access: "public" as const },
];

export const rooftopObstructions = [
  { name: "Penthouse", polygon: [[26, 16], [38, 16], [38, 26], [26, 26]] as [number, number][], baseM: 0, heightM: 4.2 },
  { name: "Lift motor room", polygon: [[6, 20], [12, 20], [12, 26], [6, 26]] as [number, number][], baseM: 0, heightM: 3 },
  { name: "Stair housing", polygon: [[2, 2], [6, 2], [6, 6], [2, 6]] as [number, number][], baseM: 0, heightM: 2.6 },
];

export const rooftopAccessPoints = [
  { name: "Stair door", kind: "door" as const, x: 6.2, y: 4, z: 0, locked: true },
  { name: "Roof hatch", kind: "hatch" as const, x: -9, y: 10, z: -3.5, locked: true },
  { name: "Penthouse ladder", kind: "ladder" as const, x: 25.8, y: 21, z: 0, locked: false },
];

const sector = (e: Omit<DemoEmitter, "model" | "hBeamwidthDeg"> & { hBeamwidthDeg?: number; model?: DemoEmitter["model"] }): DemoEmitter => ({
  model: "auto",
  hBeamwidthDeg: 65,
  ...e,
});

export const rooftopEmitters: DemoEmitter[] = [
  // Northwind Mobile: three sectors on the penthouse top, 700 MHz and 1900 MHz.
  sector({ label: "NW-A7", operator: "Northwind Mobile", band: "LTE 700", frequencyMHz: 739, powerPerCarrierW: 40, carriers: 2, lossDb: 1.2, gainDbi: 14.6, vBeamwidthDeg: 12, azimuthDeg: 20, mechanicalTiltDeg: 0, electricalTiltDeg: 4, x: 30, y: 25.4, z: 6.0, apertureM: 2.4, patternName: "Kestrel reference panel 65°/12°" }),
  sector({ label: "NW-A19", operator: "Northwind Mobile", band: "PCS 1900", frequencyMHz: 1960, powerPerCarrierW: 30, carriers: 4, lossDb: 1.5, gainDbi: 17.8, vBeamwidthDeg: 6, azimuthDeg: 20, mechanicalTiltDeg: 0, electricalTiltDeg: 2, x: 31.2, y: 25.4, z: 6.0, apertureM: 1.8 }),
  sector({ label: "NW-B7", operator: "Northwind Mobile", band: "LTE 700", frequencyMHz: 739, powerPerCarrierW: 40, carriers: 2, lossDb: 1.2, gainDbi: 14.6, vBeamwidthDeg: 12, azimuthDeg: 140, mechanicalTiltDeg: 0, electricalTiltDeg: 4, x: 37.6, y: 17, z: 6.0, apertureM: 2.4, patternName: "Kestrel reference panel 65°/12°" }),
  sector({ label: "NW-B19", operator: "Northwind Mobile", band: "PCS 1900", frequencyMHz: 1960, powerPerCarrierW: 30, carriers: 4, lossDb: 1.5, gainDbi: 17.8, vBeamwidthDeg: 6, azimuthDeg: 140, mechanicalTiltDeg: 0, electricalTiltDeg: 2, x: 37.6, y: 18.2, z: 6.0, apertureM: 1.8 }),
  sector({ label: "NW-C7", operator: "Northwind Mobile", band: "LTE 700", frequencyMHz: 739, powerPerCarrierW: 40, carriers: 2, lossDb: 1.2, gainDbi: 14.6, vBeamwidthDeg: 12, azimuthDeg: 260, mechanicalTiltDeg: 0, electricalTiltDeg: 4, x: 26.4, y: 17, z: 6.0, apertureM: 2.4, patternName: "Kestrel reference panel 65°/12°" }),
  sector({ label: "NW-C19", operator: "Northwind Mobile", band: "PCS 1900", frequencyMHz: 1960, powerPerCarrierW: 30, carriers: 4, lossDb: 1.5, gainDbi: 17.8, vBeamwidthDeg: 6, azimuthDeg: 260, mechanicalTiltDeg: 0, electricalTiltDeg: 2, x: 26.4, y: 18.2, z: 6.0, apertureM: 1.8 }),
  // Saltmarsh Telecom: pipe mounts on the parapets, low over the walkable roof.
  sector({ label: "SM-1-850", operator: "Saltmarsh Telecom", band: "Cellular 850", frequencyMHz: 881, powerPerCarrierW: 20, powerUnit: "dBm", carriers: 3, lossDb: 1.0, gainDbi: 15.15, gainUnit: "dBd", vBeamwidthDeg: 14, azimuthDeg: 0, mechanicalTiltDeg: 2, electricalTiltDeg: 0, x: 14, y: 27.6, z: 2.6, apertureM: 1.3 }),
  sector({ label: "SM-1-2100", operator: "Saltmarsh Telecom", band: "AWS 2100", frequencyMHz: 2130, powerPerCarrierW: 40, carriers: 4, lossDb: 1.0, gainDbi: 17.5, vBeamwidthDeg: 7, azimuthDeg: 0, mechanicalTiltDeg: 2, electricalTiltDeg: 0, x: 15.4, y: 27.6, z: 2.6, apertureM: 1.4, patternName: "Kestrel reference panel 65°/7°" }),
  sector({ label: "SM-2-850", operator: "Saltmarsh Telecom", band: "Cellular 850", frequencyMHz: 881, powerPerCarrierW: 20, powerUnit: "dBm", carriers: 3, lossDb: 1.0, gainDbi: 15.15, gainUnit: "dBd", vBeamwidthDeg: 14, azimuthDeg: 200, mechanicalTiltDeg: 2, electricalTiltDeg: 0, x: 20, y: 0.4, z: 2.4, apertureM: 1.3 }),
  sector({ label: "SM-2-2100", operator: "Saltmarsh Telecom", band: "AWS 2100", frequencyMHz: 2130, powerPerCarrierW: 40, carriers: 4, lossDb: 1.0, gainDbi: 17.5, vBeamwidthDeg: 7, azimuthDeg: 200, mechanicalTiltDeg: 2, electricalTiltDeg: 0, x: 21.4, y: 0.4, z: 2.4, apertureM: 1.4, patternName: "Kestrel reference panel 65°/7°" }),
  // Pointing back across the roof from the west parapet: the roof in front of it is over the general-population limit.
  sector({ label: "SM-3-2100", operator: "Saltmarsh Telecom", band: "AWS 2100", frequencyMHz: 2130, powerPerCarrierW: 60, carriers: 4, lossDb: 0.8, gainDbi: 18.0, vBeamwidthDeg: 7, azimuthDeg: 70, mechanicalTiltDeg: 2, electricalTiltDeg: 2, x: 0.4, y: 12, z: 2.0, apertureM: 1.4, patternName: "Kestrel reference panel 65°/7°", notes: "Mount lowered during the 2026 parapet works; operator asked to raise it." }),
  // Brightwave Wireless: a 5G massive-MIMO panel facing the windows across the street, and an LTE 2600 sector.
  sector({ label: "BW-NR-E", operator: "Brightwave Wireless", band: "NR n78 (massive MIMO)", frequencyMHz: 3650, powerPerCarrierW: 200, carriers: 1, lossDb: 0.5, gainDbi: 24.5, vBeamwidthDeg: 8, hBeamwidthDeg: 20, azimuthDeg: 90, mechanicalTiltDeg: 0, electricalTiltDeg: 3, x: 39.6, y: 14, z: 3.2, apertureM: 0.9, actualMaxFactor: 0.25, tddFactor: 0.75, notes: "Actual-maximum power factor and TDD downlink share from the operator's IEC 62232 statement." }),
  sector({ label: "BW-26-S", operator: "Brightwave Wireless", band: "LTE 2600", frequencyMHz: 2655, powerPerCarrierW: 20, carriers: 2, lossDb: 0.8, gainDbi: 16.5, vBeamwidthDeg: 7, azimuthDeg: 180, mechanicalTiltDeg: 3, electricalTiltDeg: 0, x: 32, y: 16.4, z: 5.4, apertureM: 1.4 }),
  sector({ label: "BW-26-W", operator: "Brightwave Wireless", band: "LTE 2600", frequencyMHz: 2655, powerPerCarrierW: 20, carriers: 2, lossDb: 0.8, gainDbi: 16.5, vBeamwidthDeg: 7, azimuthDeg: 300, mechanicalTiltDeg: 3, electricalTiltDeg: 0, x: 26.4, y: 24, z: 5.4, apertureM: 1.4 }),
];
