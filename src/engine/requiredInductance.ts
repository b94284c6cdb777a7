import type { Spec } from "./types.ts";
import { inductorCurrentCcm, segmentVoltages } from "./segmentVoltages.ts";

export interface InductanceBand {
  /** Smallest actual inductance that keeps the ripple ratio at or below the window's maximum, H. */
  min: number;
  /** Largest actual inductance that keeps the ripple ratio at or above the window's minimum, H. */
  max: number;
  /** Where the band is computed: nominal input, full load. */
  vin: number;
  iout: number;
}

/**
 * Band of actual (zero-bias) inductance for which the ripple ratio r = ΔI/IL at nominal input and
 * full load lies in the target window. In CCM with constant L, ΔI = von·D/(fsw·L)
 * (Erickson & Maksimović ch. 2, with the switch and rectifier drops), so r = c/L and the band is
 * [c/rmax, c/rmin]. Winding resistance is left out: it depends on the part.
 */
export function requiredInductance(spec: Spec): InductanceBand | null {
  const vin = spec.vin.nom;
  const iout = spec.iout.max;
  const drops = { ...spec, dcr: 0 };
  let il = iout;
  let duty = 0;
  let von = 0;
  for (let i = 0; i < 100; i++) {
    const v = segmentVoltages(spec.topology, vin, spec.vout, il, drops);
    if (!(v.on > 0) || !(v.off < 0)) return null;
    duty = -v.off / (v.on - v.off);
    von = v.on;
    const next = inductorCurrentCcm(spec.topology, iout, duty);
    if (Math.abs(next - il) <= 1e-12 * next) break;
    il = next;
  }
  const c = (von * duty) / (spec.fsw * il);
  const { min: rMin, max: rMax } = spec.targets.rippleRatio;
  return { min: c / rMax, max: rMin > 0 ? c / rMin : Infinity, vin, iout };
}

/**
 * Nominal inductances whose whole tolerance span [L(1 − t), L(1 + t)] lies inside the band;
 * null when the band is narrower than the tolerance allows.
 */
export function nominalInductanceRange(band: InductanceBand, tolerance: number): { min: number; max: number } | null {
  const min = band.min / (1 - tolerance);
  const max = band.max / (1 + tolerance);
  return min <= max ? { min, max } : null;
}
