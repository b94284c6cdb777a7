import type { CornerResult, Part, Spec } from "./types.ts";
import { partCurve } from "./evaluateCorner.ts";

export interface WaveformSample {
  /** Time from the start of the first on-interval, s. */
  t: number;
  /** Inductor current, A. */
  i: number;
}

/**
 * Inductor current over `periods` switching periods of a solved corner, drawn from the same flux
 * curve the solver used: λ moves linearly in time on each interval, so i(t) = i(λ(t)).
 */
export function waveformSamples(spec: Spec, part: Part, corner: CornerResult, periods = 2, perInterval = 48): WaveformSample[] {
  const curve = partCurve(part, corner.inductance, corner.temperature);
  const ts = 1 / spec.fsw;
  const lambda0 = corner.mode === "dcm" || (corner.mode === "bcm" && corner.idle > 0) ? 0 : curve.flux(corner.ivalley);
  const swing = corner.fluxSwing;
  const samples: WaveformSample[] = [];
  const onTime = corner.duty * ts;
  const offTime = corner.d2 * ts;
  for (let p = 0; p < periods; p++) {
    const start = p * ts;
    for (let k = 0; k <= perInterval; k++) {
      const f = k / perInterval;
      samples.push({ t: start + f * onTime, i: curve.current(lambda0 + f * swing) });
    }
    for (let k = 1; k <= perInterval; k++) {
      const f = k / perInterval;
      samples.push({ t: start + onTime + f * offTime, i: curve.current(lambda0 + (1 - f) * swing) });
    }
    if (corner.idle > 0) samples.push({ t: start + ts, i: 0 });
  }
  return samples;
}
