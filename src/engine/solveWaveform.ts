import type { Mode, Rectifier, Topology } from "./types.ts";
import type { FluxCurve } from "./fluxCurve.ts";
import { type Drops, inductorCurrentCcm, segmentVoltages, type SegmentVoltages } from "./segmentVoltages.ts";

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
/**
 * Newton stops once a step is this small relative to the flux scale: convergence is quadratic,
 * so the error left is of the order of its square times the curvature, far below 1e-8.
 */
const STEP_TOLERANCE = 1e-5;
/** The average current that sets the drops in DCM is settled to this relative change. */
const DROP_CURRENT_TOLERANCE = 1e-9;

export function emptySolution(): WaveformSolution {
  return {
    mode: "ccm",
    duty: 0,
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
    unreachable: false,
  };
}

function markUnreachable(out: WaveformSolution, duty: number): WaveformSolution {
  out.mode = "ccm";
  out.duty = duty;
  out.d2 = 0;
  out.idle = 0;
  out.lambdaValley = 0;
  out.fluxSwing = 0;
  out.vOn = 0;
  out.vOff = 0;
  out.ipk = 0;
  out.ivalley = 0;
  out.iavg = 0;
  out.meanSquare = 0;
  out.negativeFraction = 0;
  out.beyondCurve = false;
  out.unreachable = true;
  return out;
}

/** Scratch of one solve, reused so the hot path allocates nothing. */
interface Scratch {
  v: SegmentVoltages;
  duty: number;
  il: number;
  beyond: boolean;
  /** The continuous ramp found by valleyFlux: λ at its ends, i and ∫i²dλ there. */
  lambda0: number;
  i0: number;
  i1: number;
  h0: number;
  h1: number;
  /** The discontinuous ramp found by peakFluxForIntegral: its peak flux, G, i and H there. */
  peak: number;
  gPeak: number;
  iPeak: number;
  hPeak: number;
}
const scratch: Scratch = {
  v: { on: 0, off: 0 },
  duty: 0,
  il: 0,
  beyond: false,
  lambda0: 0,
  i0: 0,
  i1: 0,
  h0: 0,
  h1: 0,
  peak: 0,
  gPeak: 0,
  iPeak: 0,
  hPeak: 0,
};

/**
 * Duty and average inductor current in continuous conduction: volt-second balance
 * D·von + (1 − D)·voff = 0 with the drops at the average current, solved by fixed-point iteration
 * (for the boost it converges to the physical root of a·D'² − b·D' + c = 0; no root = unreachable).
 * Leaves duty, il and the segment voltages in the scratch; false when unreachable.
 */
function continuousDuty(p: OperatingPoint, s: Scratch): boolean {
  let il = p.iout;
  for (let iteration = 0; iteration < DUTY_ITERATIONS; iteration++) {
    const v = segmentVoltages(p.topology, p.vin, p.vout, il, p.drops, s.v);
    if (!(v.on > 0) || !(v.off < 0)) return false;
    const duty = -v.off / (v.on - v.off);
    const next = inductorCurrentCcm(p.topology, p.iout, duty);
    if (!(duty < 1) || !Number.isFinite(next)) return false;
    if (next === il) {
      // The drops were taken at this very current (always so for a buck): v and duty are final.
      s.duty = duty;
      s.il = il;
      return true;
    }
    const settled = Math.abs(next - il) <= RELATIVE_TOLERANCE * Math.max(1, Math.abs(next));
    il = next;
    if (settled || p.topology === "buck") {
      const w = segmentVoltages(p.topology, p.vin, p.vout, il, p.drops, s.v);
      s.duty = -w.off / (w.on - w.off);
      s.il = il;
      return true;
    }
  }
  return false;
}

/**
 * λ0 so that the mean current over the ramp λ0 → λ0 + Δλ equals il. Time is linear in λ on
 * each ramp and both ramps span the same λ range, so mean = (G(λ0+Δλ) − G(λ0))/Δλ; Newton with
 * the exact derivative (i(λ0+Δλ) − i(λ0))/Δλ from a second-order first guess. Leaves λ0 and the
 * current and ∫i²dλ at both ends in the scratch; sets s.beyond when the curve's end is reached.
 */
function valleyFlux(curve: FluxCurve, il: number, swing: number, s: Scratch): void {
  s.beyond = false;
  // Constant L: mean = (λ0 + λ0 + Δλ)/(2L), so λ0 = L·IL − Δλ/2 exactly (the textbook valley).
  let lambda0 = curve.rampCentre(il, swing) - 0.5 * swing;
  if (curve.constant) {
    rampEnds(curve, lambda0, swing, s);
    return;
  }
  const limit = curve.lambdaLimit;
  const scale = Math.max(Math.abs(il), 1e-30);
  for (let iteration = 0; iteration < NEWTON_ITERATIONS; iteration++) {
    // Which end was clamped is kept as a flag: limit − Δλ + Δλ need not round back to limit.
    const atTop = lambda0 + swing > limit;
    const atBottom = lambda0 < -limit;
    if (atTop) lambda0 = limit - swing;
    if (atBottom) lambda0 = -limit;
    s.beyond = atTop || atBottom;
    const lambda1 = lambda0 + swing;
    curve.sample(lambda1);
    const g1 = curve.sampleIntegral;
    const i1 = curve.sampleCurrent;
    const h1 = curve.sampleSquare;
    const d1 = curve.sampleSlope;
    curve.sample(lambda0);
    const g0 = curve.sampleIntegral;
    const i0 = curve.sampleCurrent;
    const h0 = curve.sampleSquare;
    const d0 = curve.sampleSlope;
    s.lambda0 = lambda0;
    s.i0 = i0;
    s.i1 = i1;
    s.h0 = h0;
    s.h1 = h1;
    // The mean's error times Δλ: (G1 − G0) − IL·Δλ; Newton's step is that over (i1 − i0).
    const error = g1 - g0 - il * swing;
    if (Math.abs(error) <= RELATIVE_TOLERANCE * scale * swing) return;
    // Clamped at the end of the curve and the root lies further out: the core is past saturation.
    if ((atTop && error < 0) || (atBottom && error > 0)) return;
    const rise = i1 - i0;
    if (!(rise > 0)) return;
    const step = error / rise;
    const next = lambda0 - step;
    // Newton converges quadratically: once the step is this small the error left is of the
    // order of its square, and so is that of carrying the end values to the new λ0 along their
    // tangents (i' from the curve, (∫i²)' = i²), which saves evaluating them again.
    if (Math.abs(step) <= STEP_TOLERANCE * (Math.abs(next) + swing) && next + swing <= limit && next >= -limit) {
      s.lambda0 = next;
      s.i1 = i1 - step * d1;
      s.i0 = i0 - step * d0;
      s.h1 = h1 - step * i1 * i1;
      s.h0 = h0 - step * i0 * i0;
      return;
    }
    lambda0 = next;
  }
}

/** The end values of the ramp from λ0 over Δλ, evaluated on the curve. */
function rampEnds(curve: FluxCurve, lambda0: number, swing: number, s: Scratch): void {
  s.lambda0 = lambda0;
  curve.sample(lambda0 + swing);
  s.i1 = curve.sampleCurrent;
  s.h1 = curve.sampleSquare;
  curve.sample(lambda0);
  s.i0 = curve.sampleCurrent;
  s.h0 = curve.sampleSquare;
}

/**
 * Peak flux p with G(p) = target (G is convex and increasing for p > 0; Newton with G' = i).
 * Leaves p and G, i and H at p in the scratch.
 */
function peakFluxForIntegral(curve: FluxCurve, target: number, s: Scratch): void {
  s.beyond = false;
  // G(p) = p²/(2·L) for constant L; for roll-off G(p) ≥ p²/(2·L0) because L never exceeds L0,
  // so this start is at or beyond the root and Newton descends monotonically.
  let peak = Math.sqrt(2 * curve.inductance * target);
  if (!curve.constant) {
    const limit = curve.lambdaLimit;
    if (peak > limit) peak = limit;
    for (let iteration = 0; iteration < NEWTON_ITERATIONS; iteration++) {
      curve.sample(peak);
      const g = curve.sampleIntegral;
      const i = curve.sampleCurrent;
      const error = g - target;
      if (Math.abs(error) <= RELATIVE_TOLERANCE * target || !(i > 0)) break;
      const step = error / i;
      const next = peak - step;
      if (next >= limit) {
        s.beyond = true;
        peak = limit;
        break;
      }
      // As in valleyFlux: with a step this small, the values at the new peak follow along their
      // tangents (G' = i, H' = i²) to within the square of the step.
      if (Math.abs(step) <= STEP_TOLERANCE * next) {
        s.peak = next;
        s.gPeak = g - step * i;
        s.iPeak = i - step * curve.sampleSlope;
        s.hPeak = curve.sampleSquare - step * i * i;
        return;
      }
      peak = next;
    }
    if (!s.beyond) s.beyond = peak >= limit && curve.currentIntegral(limit) < target;
  }
  curve.sample(peak);
  s.peak = peak;
  s.gPeak = curve.sampleIntegral;
  s.iPeak = curve.sampleCurrent;
  s.hPeak = curve.sampleSquare;
}

function continuous(curve: FluxCurve, swing: number, s: Scratch, out: WaveformSolution): WaveformSolution {
  valleyFlux(curve, s.il, swing, s);
  const lambda0 = s.lambda0;
  const ipk = s.i1;
  const ivalley = s.i0;
  const ripple = ipk - ivalley;
  out.meanSquare = (s.h1 - s.h0) / swing;
  out.mode = ivalley > BCM_TOLERANCE * ripple ? "ccm" : ivalley >= -BCM_TOLERANCE * ripple ? "bcm" : "forced-continuous";
  out.duty = s.duty;
  out.d2 = 1 - s.duty;
  out.idle = 0;
  out.lambdaValley = lambda0;
  out.fluxSwing = swing;
  out.vOn = s.v.on;
  out.vOff = s.v.off;
  out.ipk = ipk;
  out.ivalley = ivalley;
  out.iavg = s.il;
  out.negativeFraction = lambda0 < 0 ? Math.min(1, -lambda0 / swing) : 0;
  out.beyondCurve = s.beyond;
  out.unreachable = false;
  return out;
}

/**
 * Diode rectifier with the current resting at zero: the on ramp takes λ from 0 to p, the
 * rectifier ramp back to 0. Buck: Iout = (D + D2)·G(p)/p with D = p/(von·Ts), D2 = p/(|voff|·Ts),
 * so G(p) = Iout·Ts/(1/von + 1/|voff|); boost and inverting: Iout = D2·G(p)/p, so
 * G(p) = Iout·|voff|·Ts. With constant L these are the DCM relations of Erickson & Maksimović ch. 5.
 */
function discontinuous(p: OperatingPoint, curve: FluxCurve, s: Scratch, out: WaveformSolution): WaveformSolution {
  const ts = 1 / p.fsw;
  let il = s.il;
  // Divisions are the slow step here; each quotient below is formed once.
  for (let iteration = 0; iteration < DUTY_ITERATIONS; iteration++) {
    const v = segmentVoltages(p.topology, p.vin, p.vout, il, p.drops, s.v);
    if (!(v.on > 0) || !(v.off < 0)) return markUnreachable(out, 0);
    const on = v.on;
    const off = -v.off;
    // Buck: Iout·Ts/(1/von + 1/|voff|) = Iout·Ts·von·|voff|/(von + |voff|).
    const target = p.topology === "buck" ? (p.iout * ts * on * off) / (on + off) : p.iout * off * ts;
    peakFluxForIntegral(curve, target, s);
    const peak = s.peak;
    // D = p/(von·Ts) and D2 = p/(|voff|·Ts) from one quotient q = p/(von·|voff|·Ts).
    const q = peak / (on * off * ts);
    const duty = q * off;
    const d2 = q * on;
    const conducting = duty + d2;
    const perPeak = conducting / peak;
    const nextIl = perPeak * s.gPeak;
    out.mode = 1 - conducting <= BCM_TOLERANCE ? "bcm" : "dcm";
    out.duty = duty;
    out.d2 = d2;
    out.idle = Math.max(0, 1 - conducting);
    out.lambdaValley = 0;
    out.fluxSwing = peak;
    out.vOn = v.on;
    out.vOff = v.off;
    out.ipk = s.iPeak;
    out.ivalley = 0;
    out.iavg = nextIl;
    out.meanSquare = perPeak * s.hPeak;
    out.negativeFraction = 0;
    out.beyondCurve = s.beyond;
    out.unreachable = false;
    // A buck's inductor carries Iout on average in any mode, so its drops are already final;
    // the others iterate the drops on the new average current.
    const settled = p.topology === "buck" || Math.abs(nextIl - il) <= DROP_CURRENT_TOLERANCE * Math.max(1e-9, nextIl);
    il = nextIl;
    if (settled) break;
  }
  return out;
}

/**
 * Steady-state inductor current for one operating point and one flux curve, written into `out`
 * (a fresh object when none is given) so that a hot loop can reuse one.
 */
export function solveWaveform(p: OperatingPoint, curve: FluxCurve, out: WaveformSolution = emptySolution()): WaveformSolution {
  const s = scratch;
  if (!continuousDuty(p, s)) return markUnreachable(out, 1);
  const swing = (s.v.on * s.duty) / p.fsw;
  if (p.rectifier === "diode") {
    // The mean over a ramp rises with its starting flux, so the continuous valley would be
    // negative exactly when a ramp from λ = 0 already averages more than IL: then the diode
    // blocks and the current rests at zero. Two bounds decide most points without the integral:
    // L never exceeds L0, so that mean is at least Δλ/(2·L0); and i rises with λ, so the mean
    // stays below IL while Δλ ≤ λ(IL).
    if (swing > 2 * curve.inductance * s.il) return discontinuous(p, curve, s, out);
    if (swing > curve.flux(s.il) && curve.currentIntegral(swing) > s.il * swing) return discontinuous(p, curve, s, out);
  }
  return continuous(curve, swing, s, out);
}
