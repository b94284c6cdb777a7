import type { CornerPoint, CornerResult, Part, Spec } from "./types.ts";
import { ConstantInductance, type FluxCurve, RollOffCurve, knee } from "./fluxCurve.ts";
import { type OperatingPoint, solveWaveform, type WaveformSolution } from "./solveWaveform.ts";
import { copperResistance } from "./copper.ts";
import { RUNAWAY_TEMPERATURE, type ThermalBalance, isatAtTemperature, ratedHeatingPower, settleTemperature } from "./thermal.ts";
import { idealDuty, inductorCurrentCcm } from "./segmentVoltages.ts";
import { igseTwoRamp } from "./coreLoss.ts";

const THERMAL_ITERATIONS = 20;
/**
 * The waveform is solved again when the settled temperature changes the winding drop by more
 * than this fraction of the smaller segment voltage (the duty would move by about as much), or
 * the saturation current by more than ISAT_TOLERANCE.
 */
const DROP_TOLERANCE = 1e-4;
const ISAT_TOLERANCE = 1e-3;

/** Per-part constants shared by all of a part's corners. */
export interface PreparedPart {
  part: Part;
  /** DCR used for losses, Ω at part.dcrTemp. */
  dcrRef: number | null;
  ratedPower: number | null;
  /** Knee current of the roll-off law at 25 °C, null for constant L. */
  knee25: number | null;
}

/** DCR used for losses: the maximum where given (worst case), else the typical. */
export function lossDcr(part: Part): number | null {
  return part.dcrMax ?? part.dcrTyp;
}

export function preparePart(part: Part): PreparedPart {
  return {
    part,
    dcrRef: lossDcr(part),
    ratedPower: ratedHeatingPower(part),
    knee25: part.isat === null ? null : knee(part.isat, part.isatDrop, part.rollOffExponent),
  };
}

/** Flux curve of a part at one inductance corner and temperature (constant L when Isat is unknown). */
export function partCurve(part: Part, inductance: number, temperature: number, knee25?: number | null): FluxCurve {
  const isat = isatAtTemperature(part, temperature);
  if (isat === null) return new ConstantInductance(inductance);
  // Ik scales with Isat, so a hot Isat only rescales the knee found at 25 °C.
  const k25 = knee25 ?? knee(part.isat as number, part.isatDrop, part.rollOffExponent);
  return new RollOffCurve(inductance, (k25 * isat) / (part.isat as number), part.rollOffExponent);
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

/**
 * Winding loss with the AC-resistance factor Fr on the ripple part:
 * P = IL²·R + (Irms² − IL²)·R·Fr = Irms²·R + (Fr − 1)·(Irms² − IL²)·R.
 */
export function windingLoss(solution: WaveformSolution, dcrOhm: number, acFactor: number): number {
  return solution.meanSquare * dcrOhm + acLossFactor(solution, acFactor) * dcrOhm;
}

/** (Fr − 1)·(Irms² − IL²): multiply by R for the AC loss above the DC-resistance loss. */
function acLossFactor(solution: WaveformSolution, acFactor: number): number {
  return (acFactor - 1) * Math.max(0, solution.meanSquare - solution.iavg * solution.iavg);
}

/**
 * One operating corner of one part: the waveform, losses and temperature, with the winding
 * resistance, the saturation current and the temperature solved together as a fixed point.
 */
export function evaluateCorner(spec: Spec, part: Part, point: CornerPoint, prepared: PreparedPart = preparePart(part)): CornerResult {
  const { dcrRef, ratedPower } = prepared;
  const thermal = ratedPower !== null && dcrRef !== null;
  const balance: ThermalBalance = {
    ambient: spec.ambient,
    copperLossAtReference: 0,
    referenceTemperature: part.dcrTemp,
    otherLoss: 0,
    ratedPower: ratedPower ?? 1,
    ratedRise: part.irmsRise,
    exponent: spec.thermalExponent,
    start: spec.ambient,
  };
  let temperature = spec.ambient;
  if (thermal) {
    // Start from the rise that the DC part of the inductor current alone would cause.
    const il = inductorCurrentCcm(spec.topology, point.iout, idealDuty(spec.topology, point.vin, spec.vout));
    balance.copperLossAtReference = il * il * dcrRef;
    temperature = Math.min(RUNAWAY_TEMPERATURE, settleTemperature(balance));
  }
  let curve: FluxCurve = partCurve(part, point.inductance, temperature, prepared.knee25);
  let isatSolved = isatAtTemperature(part, temperature);
  const op: OperatingPoint = {
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
      dcr: dcrRef === null ? 0 : copperResistance(dcrRef, part.dcrTemp, temperature),
    },
  };
  let solution = solveWaveform(op, curve);
  let dcrHot = dcrRef === null ? null : op.drops.dcr;
  let core = coreLossOf(part, solution, spec.fsw);
  // Settle the temperature for this waveform's RMS current and core loss (copper loss ∝ R(T));
  // solve again only while that temperature still moves the winding drop or Isat noticeably.
  for (let iteration = 0; thermal && !solution.unreachable && iteration < THERMAL_ITERATIONS; iteration++) {
    balance.copperLossAtReference = windingLoss(solution, dcrRef, part.acFactor);
    balance.otherLoss = core ?? 0;
    balance.start = temperature;
    temperature = Math.min(RUNAWAY_TEMPERATURE, settleTemperature(balance));
    dcrHot = copperResistance(dcrRef, part.dcrTemp, temperature);
    if (temperature >= RUNAWAY_TEMPERATURE) break;
    const isatNow = isatAtTemperature(part, temperature);
    const isatShift = isatNow === null || isatSolved === null ? 0 : Math.abs(isatNow - isatSolved) / isatSolved;
    const dropShift = Math.abs(dcrHot - op.drops.dcr) * Math.abs(solution.iavg);
    if (dropShift <= DROP_TOLERANCE * Math.min(solution.vOn, -solution.vOff) && isatShift <= ISAT_TOLERANCE) break;
    if (isatShift > 0) {
      curve = partCurve(part, point.inductance, temperature, prepared.knee25);
      isatSolved = isatNow;
    }
    op.drops.dcr = dcrHot;
    solution = solveWaveform(op, curve);
    core = coreLossOf(part, solution, spec.fsw);
  }
  const s = solution;
  const ripple = s.ipk - s.ivalley;
  const dcrLoss = dcrHot === null ? 0 : s.meanSquare * dcrHot;
  const acLoss = dcrHot === null ? 0 : acLossFactor(s, part.acFactor) * dcrHot;
  // Fields listed one by one: a spread followed by many properties makes V8 build slow dictionary objects.
  return {
    vin: point.vin,
    iout: point.iout,
    vinCorner: point.vinCorner,
    ioutCorner: point.ioutCorner,
    inductanceCorner: point.inductanceCorner,
    inductance: point.inductance,
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
    inductanceAtPeak: curve.inductanceAt(s.ipk > -s.ivalley ? s.ipk : -s.ivalley),
    dcrLoss,
    acLoss,
    coreLoss: core,
    totalLoss: dcrLoss + acLoss + (core ?? 0),
    tempRise: thermal && !s.unreachable ? temperature - spec.ambient : null,
    temperature,
    dcrHot,
    isatAtTemp: isatAtTemperature(part, temperature),
    beyondCurve: s.beyondCurve,
    unreachable: s.unreachable,
  };
}
