// The two cuts of any pattern the engine takes, sampled every degree for a polar diagram: the
// horizontal cut (θ = 0) and the vertical cut through boresight and, past ±90°, through the back
// (φ = 180°). Computed by the engine's own pattern functions, so the drawing is what it computes.
import { patternAttenuationDb, preparePattern, type PatternSpec } from "~/engine/patterns";

const RAD = Math.PI / 180;
export type PolarCut = { angleDeg: number; attenuationDb: number }[];

export function patternCuts(spec: PatternSpec): { horizontal: PolarCut; vertical: PolarCut; hBeamwidthDeg: number; vBeamwidthDeg: number } {
  const p = preparePattern(spec);
  const horizontal: PolarCut = [];
  const vertical: PolarCut = [];
  for (let a = -180; a < 180; a++) {
    horizontal.push({ angleDeg: a, attenuationDb: patternAttenuationDb(p, a * RAD, 0) });
    const back = Math.abs(a) > 90;
    const theta = back ? Math.sign(a) * (180 - Math.abs(a)) : a;
    vertical.push({ angleDeg: a, attenuationDb: patternAttenuationDb(p, back ? Math.PI : 0, theta * RAD) });
  }
  return { horizontal, vertical, hBeamwidthDeg: p.h3 / RAD, vBeamwidthDeg: p.v3 / RAD };
}
