// Two tabulated demo patterns, generated from the ITU-R F.1336-5 sectoral reference pattern
// (recommends 3.1.1, peak side lobes, typical k values) with the engine's own implementation,
// sampled every degree. Invented panel names; no manufacturer's data.
import { attenuationF1336, preparePattern } from "../../app/engine";

type Cut = { angleDeg: number; attenuationDb: number }[];
const RAD = Math.PI / 180;
const round = (v: number) => Math.round(v * 100) / 100;

function cuts(hBeamwidthDeg: number, vBeamwidthDeg: number) {
  const p = preparePattern({ type: "itu-r-f.1336-sectoral", hBeamwidthDeg, vBeamwidthDeg });
  const horizontal: Cut = [];
  const vertical: Cut = [];
  for (let a = -180; a < 180; a++) {
    horizontal.push({ angleDeg: a, attenuationDb: round(attenuationF1336(p, a * RAD, 0)) });
    // Behind the panel (|θ| > 90°) the vertical cut continues through the back at φ = 180°.
    const back = Math.abs(a) > 90;
    const theta = back ? 180 - Math.abs(a) : a;
    vertical.push({ angleDeg: a, attenuationDb: round(attenuationF1336(p, back ? Math.PI : 0, theta * RAD)) });
  }
  return { horizontal, vertical };
}

export const demoPatterns = [
  { name: "Kestrel reference panel 65°/12°", maker: "Kestrel Lane (reference)", model: "REF-65-12", gainDbi: 14.6, frequencyMHz: 739, hBeamwidthDeg: 65, vBeamwidthDeg: 12, notes: "Tabulated from ITU-R F.1336-5 (sectoral, peak side lobes, k_h = 0.8, k_v = 0.7, k_p = 0.7) at 1° steps." },
  { name: "Kestrel reference panel 65°/7°", maker: "Kestrel Lane (reference)", model: "REF-65-7", gainDbi: 17.5, frequencyMHz: 2130, hBeamwidthDeg: 65, vBeamwidthDeg: 7, notes: "Tabulated from ITU-R F.1336-5 (sectoral, peak side lobes, k_h = 0.8, k_v = 0.7, k_p = 0.7) at 1° steps." },
].map((p) => ({ ...p, kind: "tabulated", pattern: { type: "tabulated" as const, ...cuts(p.hBeamwidthDeg, p.vBeamwidthDeg) } }));
