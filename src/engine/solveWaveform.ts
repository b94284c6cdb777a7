import type { Mode, Rectifier, Topology } from "./types.ts";
import type { FluxCurve } from "./fluxCurve.ts";
import { type Drops, inductorCurrentCcm, segmentVoltages } from "./segmentVoltages.ts";

export interface OperatingPoint {
  topology: Topology;
  rectifier: Rectifier;
  vin: number;
  /** Output voltage magnitude. */
  vout: number;
  iout: number;
  fsw: number;
  drops: Drops;
}

/** Steady-state inductor waveform over one period, all in SI. */
export interface WaveformSolution {
  mode: Mode;
  duty: number;
  d2: number;
  idle: number;
  /** Flux linkage at the start of the on-interval (the valley; 0 in DCM). */
  lambdaValley: number;
  /** Flux-linkage swing Δλ over the on-interval, V·s. */
  fluxSwing: number;
  vOn: number;
  vOff: number;
  ipk: number;
  ivalley: number;
  iavg: number;
  /** Mean of i² over the period. */
  meanSquare: number;
  negativeFraction: number;
  beyondCurve: boolean;
  unreachable: boolean;
}

/** Valley within this fraction of the ripple of zero (or an idle fraction this small) is the boundary. */
export const BCM_TOLERANCE = 0.02;
const DUTY_ITERATIONS = 100;
const NEWTON_ITERATIONS = 40;
const RELATIVE_TOLERANCE = 1e-12;
const STEP_TOLERANCE = 1e-10;

function unreachable(duty: number): WaveformSolution {
  return {
    mode: "ccm",
    duty,
    d2: 0,
    idle: 0,
    lambdaValley: 0,
    fluxSwing: 0,
    vOn: 0,
    vOff: 0,
    ipk: 0,
    ivalley: 0,
    iavg: 0,
    meanSquare: 0,
    negativeFraction: 0,
    beyondCurve: false,
    unreachable: true,
  };
}

/**
 * Duty and average inductor current in continuous conduction: volt-second balance
 * D·von + (1 − D)·voff = 0 with the drops at the average current, solved by fixed-point iteration
 * (for the boost it converges to the physical root of a·D'² − b·D' + c = 0; no root = unreachable).
 */
function continuousDuty(p: OperatingPoint): { duty: number; il: number; on: number; off: number } | null {
  let il = p.iout;
  let duty = 0;
  for (let iteration = 0; iteration < DUTY_ITERATIONS; iteration++) {
    const v = segmentVoltages(p.topology, p.vin, p.vout, il, p.drops);
    if (!(v.on > 0) || !(v.off < 0)) return null;
    duty = -v.off / (v.on - v.off);
    const next = inductorCurrentCcm(p.topology, p.iout, duty);
    if (!(duty < 1) || !Number.isFinite(next)) return null;
    const settled = Math.abs(next - il) <= RELATIVE_TOLERANCE * Math.max(1, Math.abs(next));
    il = next;
    if (settled || p.topology === "buck") {
      const w = segmentVoltages(p.topology, p.vin, p.vout, il, p.drops);
      return { duty: -w.off / (w.on - w.off), il, on: w.on, off: w.off };
    }
  }
  return null;
}

/**
 * λ0 so that the mean current over the ramp λ0 → λ0 + Δλ equals il. Time is linear in λ on
 * each ramp and both ramps span the same λ range, so mean = (G(λ0+Δλ) − G(λ0))/Δλ; Newton with
 * the exact derivative (i(λ0+Δλ) − i(λ0))/Δλ.
 */
function valleyFlux(curve: FluxCurve, il: number, swing: number): { lambda0: number; beyond: boolean } {
  // Constant L: mean = (λ0 + λ0 + Δλ)/(2L), so λ0 = L·IL − Δλ/2 exactly (the textbook valley).
  if (curve.constant) return { lambda0: curve.inductance * il - swing / 2, beyond: false };
  const limit = curve.lambdaLimit;
  let lambda0 = curve.flux(il) - swing / 2;
  const scale = Math.max(Math.abs(il), 1e-30);
  let beyond = false;
  for (let iteration = 0; iteration < NEWTON_ITERATIONS; iteration++) {
    beyond = false;
    if (lambda0 + swing > limit) {
      lambda0 = limit - swing;
      beyond = true;
    }
    if (lambda0 < -limit) {
      lambda0 = -limit;
      beyond = true;
    }
    const lambda1 = lambda0 + swing;
    const g1 = curve.currentIntegral(lambda1);
    const i1 = curve.current(lambda1);
    const g0 = curve.currentIntegral(lambda0);
    const i0 = curve.current(lambda0);
    const error = (g1 - g0) / swing - il;
    if (Math.abs(error) <= RELATIVE_TOLERANCE * scale) break;
    // Clamped at the end of the curve and the root lies further out: the core is past saturation.
    if (beyond && ((lambda1 >= limit && error < 0) || (lambda0 <= -limit && error > 0))) break;
    const slope = (i1 - i0) / swing;
    if (!(slope > 0)) break;
    const step = error / slope;
    lambda0 -= step;
    // Newton converges quadratically: once the step is this small the remaining error is far smaller.
    if (Math.abs(step) <= STEP_TOLERANCE * (Math.abs(lambda0) + swing)) break;
  }
  return { lambda0, beyond };
}

/** Peak flux p with G(p) = target (G is convex and increasing for p > 0; Newton with G' = i). */
function peakFluxForIntegral(curve: FluxCurve, target: number): { peak: number; beyond: boolean } {
  // G(p) = p²/(2·L) for constant L; for roll-off G(p) ≥ p²/(2·L0) because L never exceeds L0,
  // so this start is at or beyond the root and Newton descends monotonically.
  let peak = Math.sqrt(2 * curve.inductance * target);
  if (curve.constant) return { peak, beyond: false };
  const limit = curve.lambdaLimit;
  if (peak > limit) peak = limit;
  for (let iteration = 0; iteration < NEWTON_ITERATIONS; iteration++) {
    const g = curve.currentIntegral(peak);
    const i = curve.current(peak);
    const error = g - target;
    if (Math.abs(error) <= RELATIVE_TOLERANCE * target || !(i > 0)) break;
    const step = error / i;
    peak -= step;
    if (peak >= limit) return { peak: limit, beyond: true };
    if (Math.abs(step) <= STEP_TOLERANCE * peak) break;
  }
  return { peak, beyond: peak >= limit && curve.currentIntegral(limit) < target };
}

function continuous(p: OperatingPoint, curve: FluxCurve, c: { duty: number; il: number; on: number; off: number }): WaveformSolution {
  const ts = 1 / p.fsw;
  const swing = c.on * c.duty * ts;
  const { lambda0, beyond } = valleyFlux(curve, c.il, swing);
  const lambda1 = lambda0 + swing;
  const ipk = curve.current(lambda1);
  const ivalley = curve.current(lambda0);
  const ripple = ipk - ivalley;
  const meanSquare = (curve.squareIntegral(lambda1) - curve.squareIntegral(lambda0)) / swing;
  let mode: Mode;
  if (ivalley > BCM_TOLERANCE * ripple) mode = "ccm";
  else if (ivalley >= -BCM_TOLERANCE * ripple) mode = "bcm";
  else mode = "forced-continuous";
  return {
    mode,
    duty: c.duty,
    d2: 1 - c.duty,
    idle: 0,
    lambdaValley: lambda0,
    fluxSwing: swing,
    vOn: c.on,
    vOff: c.off,
    ipk,
    ivalley,
    iavg: c.il,
    meanSquare,
    negativeFraction: lambda0 < 0 ? Math.min(1, -lambda0 / swing) : 0,
    beyondCurve: beyond,
    unreachable: false,
  };
}

/**
 * Diode rectifier with the current resting at zero: the on ramp takes λ from 0 to p, the
 * rectifier ramp back to 0. Buck: Iout = (D + D2)·G(p)/p with D = p/(von·Ts), D2 = p/(|voff|·Ts),
 * so G(p) = Iout·Ts/(1/von + 1/|voff|); boost and inverting: Iout = D2·G(p)/p, so
 * G(p) = Iout·|voff|·Ts. With constant L these are the DCM relations of Erickson & Maksimović ch. 5.
 */
function discontinuous(p: OperatingPoint, curve: FluxCurve, ilStart: number): WaveformSolution {
  const ts = 1 / p.fsw;
  let il = ilStart;
  let result: WaveformSolution | null = null;
  for (let iteration = 0; iteration < DUTY_ITERATIONS; iteration++) {
    const v = segmentVoltages(p.topology, p.vin, p.vout, il, p.drops);
    if (!(v.on > 0) || !(v.off < 0)) return unreachable(0);
    const target = p.topology === "buck" ? (p.iout * ts) / (1 / v.on - 1 / v.off) : p.iout * -v.off * ts;
    const { peak, beyond } = peakFluxForIntegral(curve, target);
    const duty = peak / (v.on * ts);
    const d2 = peak / (-v.off * ts);
    const g = curve.currentIntegral(peak);
    const conducting = duty + d2;
    const nextIl = (conducting * g) / peak;
    result = {
      mode: 1 - conducting <= BCM_TOLERANCE ? "bcm" : "dcm",
      duty,
      d2,
      idle: Math.max(0, 1 - conducting),
      lambdaValley: 0,
      fluxSwing: peak,
      vOn: v.on,
      vOff: v.off,
      ipk: curve.current(peak),
      ivalley: 0,
      iavg: nextIl,
      meanSquare: (conducting * curve.squareIntegral(peak)) / peak,
      negativeFraction: 0,
      beyondCurve: beyond,
      unreachable: false,
    };
    const settled = Math.abs(nextIl - il) <= RELATIVE_TOLERANCE * Math.max(1, nextIl);
    il = nextIl;
    if (settled) break;
  }
  return result ?? unreachable(0);
}

/** Steady-state inductor current for one operating point and one flux curve. */
export function solveWaveform(p: OperatingPoint, curve: FluxCurve): WaveformSolution {
  const c = continuousDuty(p);
  if (c === null) return unreachable(1);
  if (p.rectifier === "diode") {
    // The mean over a ramp rises with its starting flux, so the continuous valley would be
    // negative exactly when a ramp from λ = 0 already averages more than IL: then the diode
    // blocks and the current rests at zero.
    const swing = (c.on * c.duty) / p.fsw;
    if (curve.currentIntegral(swing) / swing > c.il) return discontinuous(p, curve, c.il);
  }
  return continuous(p, curve, c);
}
