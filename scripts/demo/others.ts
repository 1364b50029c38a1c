// The demo's monopole and small-cell street pole, and the three invented clients.
import type { DemoEmitter } from "./rooftop";

export const demoClients = [
  {
    key: "larchmont",
    name: "Larchmont Estates",
    billingAddress: "Larchmont Estates Ltd\n3 Wexcombe Yard\nPort Ellery PE4 7QT",
    notes: "Portfolio of mixed-use blocks. Roof access only through the building manager.",
    contacts: [
      { name: "Priya Fenwick", email: "client@demo.isotrope.test", phone: "+44 1632 960 118", role: "Property manager" },
      { name: "Gareth Lowe-Imbert", email: "g.lowe-imbert@larchmont.example", phone: "+44 1632 960 342", role: "Building manager, Calloway House" },
    ],
  },
  {
    key: "orchard",
    name: "Orchard Lane Holdings",
    billingAddress: "Orchard Lane Holdings\nUnit 9, Saltings Business Park\nMarrow Bay MB2 1HX",
    notes: "",
    contacts: [{ name: "Hollis Achterberg", email: "hollis@orchardlane.example", phone: "+44 1632 960 877", role: "Estates surveyor" }],
  },
  {
    key: "tidewater",
    name: "Tidewater Borough Estates",
    billingAddress: "Tidewater Borough Council, Estates Office\nGuildhall Steps\nPort Ellery PE1 2AA",
    notes: "Street furniture licences; small cells on lamp columns.",
    contacts: [{ name: "Noor Castellane", email: "n.castellane@tidewater.example", phone: "+44 1632 960 505", role: "Street works officer" }],
  },
];

const panel = (e: Partial<DemoEmitter> & Pick<DemoEmitter, "label" | "operator" | "band" | "frequencyMHz" | "azimuthDeg" | "x" | "y">): DemoEmitter => ({
  powerPerCarrierW: 40,
  carriers: 2,
  lossDb: 2.5,
  gainDbi: 16,
  hBeamwidthDeg: 65,
  vBeamwidthDeg: 8,
  mechanicalTiltDeg: 0,
  electricalTiltDeg: 4,
  z: 30,
  model: "auto",
  apertureM: 1.8,
  ...e,
});

export const monopole = {
  site: { name: "Fenwick Yard monopole", kind: "monopole", address: "Fenwick Yard, off Kiln Lane", city: "Marrow Bay", latitude: 50.7012, longitude: -3.5521, datumNote: "ground at the monopole base", accessNotes: "Compound gate padlocked; key with Orchard Lane's estates office. Climbing only with the operator's permit." },
  surfaces: [
    { name: "Equipment compound", kind: "area" as const, polygon: [[-6, -6], [6, -6], [6, 6], [-6, 6]] as [number, number][], elevationM: 0, access: "workers" as const },
    { name: "Yard and footpath", kind: "area" as const, polygon: [[-40, -30], [40, -30], [40, 30], [-40, 30], [-40, 7], [7, 7], [7, -7], [-40, -7]] as [number, number][], elevationM: 0, access: "public" as const },
  ],
  obstructions: [{ name: "Equipment cabinets", polygon: [[-5, 2], [-1, 2], [-1, 5], [-5, 5]] as [number, number][], baseM: 0, heightM: 2.2 }],
  accessPoints: [{ name: "Compound gate", kind: "gate" as const, x: 0, y: -6, z: 0, locked: true }],
  emitters: [
    panel({ label: "NW-M1", operator: "Northwind Mobile", band: "LTE 800", frequencyMHz: 806, azimuthDeg: 0, x: 0, y: 0.4, z: 31.5 }),
    panel({ label: "NW-M2", operator: "Northwind Mobile", band: "LTE 800", frequencyMHz: 806, azimuthDeg: 120, x: 0.35, y: -0.2, z: 31.5 }),
    panel({ label: "NW-M3", operator: "Northwind Mobile", band: "LTE 800", frequencyMHz: 806, azimuthDeg: 240, x: -0.35, y: -0.2, z: 31.5 }),
    panel({ label: "SM-M1", operator: "Saltmarsh Telecom", band: "UMTS 2100", frequencyMHz: 2140, azimuthDeg: 60, x: 0.35, y: 0.2, z: 28, gainDbi: 17.5, powerPerCarrierW: 30, carriers: 3, vBeamwidthDeg: 6 }),
    panel({ label: "SM-M2", operator: "Saltmarsh Telecom", band: "UMTS 2100", frequencyMHz: 2140, azimuthDeg: 180, x: 0, y: -0.4, z: 28, gainDbi: 17.5, powerPerCarrierW: 30, carriers: 3, vBeamwidthDeg: 6 }),
    panel({ label: "SM-M3", operator: "Saltmarsh Telecom", band: "UMTS 2100", frequencyMHz: 2140, azimuthDeg: 300, x: -0.35, y: 0.2, z: 28, gainDbi: 17.5, powerPerCarrierW: 30, carriers: 3, vBeamwidthDeg: 6 }),
  ],
};

export const streetPole = {
  site: { name: "Quay Road pole 14", kind: "street-pole", address: "Lamp column 14, Quay Road (outside no. 31)", city: "Port Ellery", latitude: 50.7155, longitude: -3.5333, datumNote: "pavement level at the column base", accessNotes: "Traffic management needed for any work at height; licence ref. TBE-SC-0142." },
  surfaces: [
    { name: "Pavement", kind: "area" as const, polygon: [[-15, -2], [15, -2], [15, 2.5], [-15, 2.5]] as [number, number][], elevationM: 0, access: "public" as const },
    { name: "31 Quay Road, first-floor windows", kind: "facade" as const, line: [[-10, 3], [10, 3]] as [[number, number], [number, number]], bottomM: 0, topM: 7, access: "public" as const },
  ],
  obstructions: [],
  accessPoints: [],
  emitters: [
    { label: "BW-SC1", operator: "Brightwave Wireless", band: "NR n78 small cell", frequencyMHz: 3550, powerPerCarrierW: 5, carriers: 2, lossDb: 0.3, gainDbi: 9, hBeamwidthDeg: 90, vBeamwidthDeg: 30, azimuthDeg: 90, mechanicalTiltDeg: 8, electricalTiltDeg: 0, x: 0, y: 0, z: 6.5, model: "spherical" as const, apertureM: 0.4 },
    { label: "BW-SC2", operator: "Brightwave Wireless", band: "NR n78 small cell", frequencyMHz: 3550, powerPerCarrierW: 5, carriers: 2, lossDb: 0.3, gainDbi: 9, hBeamwidthDeg: 90, vBeamwidthDeg: 30, azimuthDeg: 270, mechanicalTiltDeg: 8, electricalTiltDeg: 0, x: 0, y: 0, z: 6.5, model: "spherical" as const, apertureM: 0.4 },
  ] satisfies DemoEmitter[],
};
