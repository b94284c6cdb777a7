import type { CornerPoint, CornerResult, Part, Spec } from "./types.ts";
import { ConstantInductance, type FluxCurve, RollOffCurve, knee } from "./fluxCurve.ts";
import { solveWaveform, type WaveformSolution } from "./solveWaveform.ts";
import { copperResistance } from "./copper.ts";
import { isatAtTemperature, powerLawRise, ratedHeatingPower } from "./thermal.ts";
import { igseTwoRamp } from "./coreLoss.ts";

const THERMAL_ITERATIONS = 60;
/** The DCR–temperature fixed point is settled when the temperature moves less than this, K. */
const THERMAL_TOLERANCE = 1e-3;
/** A winding this hot has run away thermally; stop iterating and report it. */
const RUNAWAY_TEMPERATURE = 1000;

/** Flux curve of a part at one inductance corner and temperature (constant L when Isat is unknown). */
export function partCurve(part: Part, inductance: number, temperature: number): FluxCurve {
  const isat = isatAtTemperature(part, temperature);
  if (isat === null) return new ConstantInductance(inductance);
  return new RollOffCurve(inductance, knee(isat, part.isatDrop, part.rollOffExponent), part.rollOffExponent);
}

/** DCR used for losses: the maximum where given (worst case), else the typical. */
export function lossDcr(part: Part): number | null {
  return part.dcrMax ?? part.dcrTyp;
}

/** Core loss in W by iGSE, null when the part carries no core-loss data. */
export function coreLossOf(part: Part, solution: WaveformSolution, fsw: number): number | null {
  const c = part.coreLoss;
  if (c === null) return null;
  // B = λ/(N·Ae) and bPerAmp = L0/(N·Ae) at the nominal inductance, so ΔB = Δλ·bPerAmp/L0.
  const swingT = (solution.fluxSwing * c.bPerAmp) / part.inductance;
  const pv = igseTwoRamp(c.k, c.alpha, c.beta, fsw, swingT, solution.duty, solution.d2);
  return c.volume === null ? pv : pv * c.volume;
}

export interface CopperLoss {
  dcrLoss: number;
  acLoss: number;
}

/**
 * Winding loss split into the DC part and the ripple part with the AC-resistance factor Fr:
 * P = IL²·R + (Irms² − IL²)·R·Fr; dcrLoss is Irms²·R, acLoss the extra (Fr − 1)·(Irms² − IL²)·R.
 */
export function copperLoss(solution: WaveformSolution, dcrOhm: number, acFactor: number): CopperLoss {
  const rippleSquare = Math.max(0, solution.meanSquare - solution.iavg * solution.iavg);
  return { dcrLoss: solution.meanSquare * dcrOhm, acLoss: (acFactor - 1) * rippleSquare * dcrOhm };
}

/**
 * One operating corner of one part: the waveform, losses and temperature, with the winding
 * resistance, the saturation current and the temperature solved together as a fixed point.
 */
export function evaluateCorner(spec: Spec, part: Part, point: CornerPoint): CornerResult {
  const dcrRef = lossDcr(part);
  const ratedPower = ratedHeatingPower(part);
  let temperature = spec.ambient;
  let solution: WaveformSolution | null = null;
  let curve: FluxCurve = partCurve(part, point.inductance, temperature);
  let dcrHot = dcrRef === null ? null : copperResistance(dcrRef, part.dcrTemp, temperature);
  let copper: CopperLoss = { dcrLoss: 0, acLoss: 0 };
  let core: number | null = null;
  let tempRise: number | null = null;
  for (let iteration = 0; iteration < THERMAL_ITERATIONS; iteration++) {
    solution = solveWaveform(
      {
        topology: spec.topology,
        rectifier: spec.rectifier,
        vin: point.vin,
        vout: spec.vout,
        iout: point.iout,
        fsw: spec.fsw,
        drops: {
          switchResistance: spec.switchResistance,
          switchDrop: spec.switchDrop,
          rectifierDrop: spec.rectifierDrop,
          rectifierResistance: spec.rectifierResistance,
          dcr: dcrHot ?? 0,
        },
      },
      curve,
    );
    copper = dcrHot === null ? { dcrLoss: 0, acLoss: 0 } : copperLoss(solution, dcrHot, part.acFactor);
    core = coreLossOf(part, solution, spec.fsw);
    if (ratedPower === null || solution.unreachable) break;
    tempRise = powerLawRise(copper.dcrLoss + copper.acLoss + (core ?? 0), ratedPower, part.irmsRise, spec.thermalExponent);
    const next = spec.ambient + tempRise;
    const settled = Math.abs(next - temperature) < THERMAL_TOLERANCE;
    temperature = Math.min(next, RUNAWAY_TEMPERATURE);
    if (settled || temperature >= RUNAWAY_TEMPERATURE) break;
    dcrHot = dcrRef === null ? null : copperResistance(dcrRef, part.dcrTemp, temperature);
    curve = partCurve(part, point.inductance, temperature);
  }
  const s = solution as WaveformSolution;
  const ripple = s.ipk - s.ivalley;
  return {
    ...point,
    mode: s.mode,
    duty: s.duty,
    d2: s.d2,
    idle: s.idle,
    negativeFraction: s.negativeFraction,
    ipk: s.ipk,
    ivalley: s.ivalley,
    iavg: s.iavg,
    irms: Math.sqrt(s.meanSquare),
    ripple,
    rippleRatio: s.iavg !== 0 ? ripple / Math.abs(s.iavg) : Infinity,
    fluxSwing: s.fluxSwing,
    inductanceAtPeak: curve.inductanceAt(Math.max(Math.abs(s.ipk), Math.abs(s.ivalley))),
    dcrLoss: copper.dcrLoss,
    acLoss: copper.acLoss,
    coreLoss: core,
    totalLoss: copper.dcrLoss + copper.acLoss + (core ?? 0),
    tempRise,
    temperature,
    dcrHot,
    isatAtTemp: isatAtTemperature(part, temperature),
    beyondCurve: s.beyondCurve,
    unreachable: s.unreachable,
  };
}
