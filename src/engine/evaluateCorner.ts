import type { CornerPoint, CornerResult, Part, Spec } from "./types.ts";
import { ConstantInductance, type FluxCurve, RollOffCurve, knee } from "./fluxCurve.ts";
import { emptySolution, type OperatingPoint, solveWaveform, type WaveformSolution } from "./solveWaveform.ts";
import { copperResistance, resistanceFrom20 } from "./copper.ts";
import { RUNAWAY_TEMPERATURE, type ThermalBalance, isatAtTemperature, isatFromSlope, isatSlopePerKelvin, ratedHeatingPower, settleTemperature } from "./thermal.ts";
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

/** Where a corner is: a CornerPoint, or a screener's reused record of one. */
export interface CornerAt {
  vin: number;
  iout: number;
  inductance: number;
}

/** Per-part constants shared by all of a part's corners. */
export interface PreparedPart {
  part: Part;
  /** DCR used for losses (lossDcr) referred to 20 °C, where IEC 60028 states α20. */
  dcr20: number | null;
  ratedPower: number | null;
  /** 1/ratedPower (1 when unrated), formed once per part. */
  inverseRatedPower: number;
  /** dIsat/dT above 25 °C (0 without a hot rating), see isatAtTemperature. */
  isatSlope: number;
  /** Ik/Isat of the roll-off law (NaN without an Isat): Ik scales with Isat, hot or not. */
  kneePerIsat: number;
  /** Isat at 25 °C, NaN without one: as a number, the solver's reads of it box nothing. */
  isat: number;
}

/** DCR used for losses: the maximum where given (worst case), else the typical. */
export function lossDcr(part: Part): number | null {
  return part.dcrMax ?? part.dcrTyp;
}

/** The per-part constants, into `out` when given (a ranking reuses one rather than making one per part). */
export function preparePart(part: Part, out?: PreparedPart): PreparedPart {
  const dcrRef = lossDcr(part);
  const ratedPower = ratedHeatingPower(part);
  const dcr20 = dcrRef === null ? null : copperResistance(dcrRef, part.dcrTemp, 20);
  const inverseRatedPower = ratedPower === null ? 1 : 1 / ratedPower;
  const isatSlope = isatSlopePerKelvin(part);
  const kneePerIsat = part.isat === null ? NaN : knee(1, part.isatDrop, part.rollOffExponent);
  const isat = part.isat ?? NaN;
  if (out === undefined) return { part, dcr20, ratedPower, inverseRatedPower, isatSlope, kneePerIsat, isat };
  out.part = part;
  out.dcr20 = dcr20;
  out.ratedPower = ratedPower;
  out.inverseRatedPower = inverseRatedPower;
  out.isatSlope = isatSlope;
  out.kneePerIsat = kneePerIsat;
  out.isat = isat;
  return out;
}

/** Flux curve of a part at one inductance corner and temperature (constant L when Isat is unknown). */
export function partCurve(part: Part, inductance: number, temperature: number): FluxCurve {
  const isat = isatAtTemperature(part, temperature);
  if (isat === null) return new ConstantInductance(inductance);
  // Ik scales with Isat, so a hot Isat only rescales the knee; the same product as the solver's.
  return new RollOffCurve(inductance, knee(1, part.isatDrop, part.rollOffExponent) * isat, part.rollOffExponent);
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
 * Solves corners one after another, reusing its curves and scratch objects so that ranking a
 * large list allocates nothing per corner. The figures of the last solve are its fields.
 */
export class CornerSolver {
  readonly solution: WaveformSolution = emptySolution();
  temperature = 0;
  // Kept as plain numbers (NaN for none), with number | null getters for CornerResult: storing a
  // double into a field that may also hold null makes V8 box it, an allocation at every corner.
  /** Temperature rise, K, NaN when not modelled (see tempRise). */
  riseK = NaN;
  /** Isat at the corner's temperature, A, NaN without an Isat (see isatAtTemp). */
  isatHot = NaN;
  private dcrHotOhm = NaN;
  /** Temperature rise, null when the part has no thermal model or the corner is unreachable. */
  get tempRise(): number | null {
    const rise = this.riseK;
    return rise === rise ? rise : null;
  }
  /** Winding resistance at the corner's temperature, null without a DCR. */
  get dcrHot(): number | null {
    const r = this.dcrHotOhm;
    return r === r ? r : null;
  }
  dcrLoss = 0;
  acLoss = 0;
  coreLoss: number | null = null;
  totalLoss = 0;
  /** Isat at the corner's temperature, null without an Isat. */
  get isatAtTemp(): number | null {
    const isat = this.isatHot;
    return isat === isat ? isat : null;
  }
  irms = 0;
  ripple = 0;
  /** Ripple over |average inductor current| (Infinity at zero average), worked out when read. */
  get rippleRatio(): number {
    return this.solution.iavg !== 0 ? this.ripple / Math.abs(this.solution.iavg) : Infinity;
  }
  private curve: FluxCurve;
  private readonly constantCurve = new ConstantInductance(1);
  private readonly rollOffCurve = new RollOffCurve(1, 1, 2);
  private readonly op: OperatingPoint;
  private readonly balance: ThermalBalance;
  // Warm start: the temperature of this part's last corner at each of the two most recent loads;
  // the next corner at the same load starts its thermal solution there.
  private guessPart: Part | null = null;
  private readonly guessIout = [NaN, NaN];
  private readonly guessTemperature = [0, 0];

  private spec: Spec;

  constructor(spec: Spec) {
    this.spec = spec;
    this.curve = this.constantCurve;
    this.op = {
      topology: spec.topology,
      rectifier: spec.rectifier,
      vin: 0,
      vout: spec.vout,
      iout: 0,
      fsw: spec.fsw,
      drops: {
        switchResistance: spec.switchResistance,
        switchDrop: spec.switchDrop,
        rectifierDrop: spec.rectifierDrop,
        rectifierResistance: spec.rectifierResistance,
        dcr: 0,
      },
    };
    this.balance = {
      ambient: spec.ambient,
      copperLossAt20: 0,
      otherLoss: 0,
      inverseRatedPower: 1,
      ratedRise: 40,
      exponent: spec.thermalExponent,
      temperature: spec.ambient,
    };
  }

  /** Re-aims the solver at another spec, keeping its objects (see PartScreener.aim). */
  setSpec(spec: Spec): void {
    if (spec === this.spec) return;
    this.spec = spec;
    const { op, balance } = this;
    op.topology = spec.topology;
    op.rectifier = spec.rectifier;
    op.vout = spec.vout;
    op.fsw = spec.fsw;
    op.drops.switchResistance = spec.switchResistance;
    op.drops.switchDrop = spec.switchDrop;
    op.drops.rectifierDrop = spec.rectifierDrop;
    op.drops.rectifierResistance = spec.rectifierResistance;
    balance.ambient = spec.ambient;
    balance.exponent = spec.thermalExponent;
    this.startPart();
  }

  /** The curve at one inductance corner, with Isat at the corner's temperature (NaN: constant L). */
  private setCurve(prepared: PreparedPart, inductance: number, isat: number): void {
    const part = prepared.part;
    if (isat !== isat) {
      this.curve = this.constantCurve.set(inductance);
    } else {
      this.curve = this.rollOffCurve.set(inductance, prepared.kneePerIsat * isat, part.rollOffExponent);
    }
  }

  /**
   * One operating corner: the waveform, losses and temperature, with the winding resistance,
   * the saturation current and the temperature solved together as a fixed point.
   */
  solve(prepared: PreparedPart, point: CornerAt): void {
    const { spec, op, balance } = this;
    const { vin, iout, inductance } = point;
    const { part, dcr20, ratedPower } = prepared;
    const thermal = ratedPower !== null && dcr20 !== null;
    balance.inverseRatedPower = prepared.inverseRatedPower;
    balance.ratedRise = part.irmsRise;
    balance.otherLoss = 0;
    balance.temperature = spec.ambient;
    let temperature = spec.ambient;
    const slot = iout === this.guessIout[0] ? 0 : iout === this.guessIout[1] ? 1 : -1;
    if (thermal && part === this.guessPart && slot >= 0) {
      temperature = this.guessTemperature[slot]!;
    } else if (thermal) {
      this.coldStart(vin, iout, dcr20);
      temperature = balance.temperature;
    }
    // The calls below are skipped in the common case (no hot Isat, no core-loss data, Fr = 1, where
    // they return Isat, null and the plain I²R term exactly): V8 inlines only so much into one
    // function, and this one is at that limit.
    let isatSolved = prepared.isatSlope === 0 ? prepared.isat : isatFromSlope(prepared.isat, prepared.isatSlope, temperature);
    this.setCurve(prepared, inductance, isatSolved);
    op.vin = vin;
    op.iout = iout;
    op.drops.dcr = dcr20 === null ? 0 : resistanceFrom20(dcr20, temperature);
    const solution = solveWaveform(op, this.curve, this.solution);
    // NaN without a DCR: a local that may hold null would box every double stored in it.
    let dcrHot = dcr20 === null ? NaN : op.drops.dcr;
    let core = part.coreLoss === null ? null : coreLossOf(part, solution, spec.fsw);
    // Settle the temperature for this waveform's RMS current and core loss (copper loss ∝ R(T));
    // solve again only while that temperature still moves the winding drop or Isat noticeably.
    for (let iteration = 0; thermal && !solution.unreachable && iteration < THERMAL_ITERATIONS; iteration++) {
      balance.copperLossAt20 = part.acFactor === 1 ? solution.meanSquare * dcr20 : windingLoss(solution, dcr20, part.acFactor);
      balance.otherLoss = core ?? 0;
      balance.temperature = temperature;
      settleTemperature(balance);
      temperature = balance.temperature;
      dcrHot = resistanceFrom20(dcr20, temperature);
      if (temperature >= RUNAWAY_TEMPERATURE) break;
      const isatNow = prepared.isatSlope === 0 ? prepared.isat : isatFromSlope(prepared.isat, prepared.isatSlope, temperature);
      // 0 also without an Isat (NaN).
      const isatShift = isatNow === isatSolved || !(isatSolved > 0) ? 0 : Math.abs(isatNow - isatSolved) / isatSolved;
      const dropShift = Math.abs(dcrHot - op.drops.dcr) * Math.abs(solution.iavg);
      if (dropShift <= DROP_TOLERANCE * Math.min(solution.vOn, -solution.vOff) && isatShift <= ISAT_TOLERANCE) break;
      if (isatShift > 0) {
        this.setCurve(prepared, inductance, isatNow);
        isatSolved = isatNow;
      }
      op.drops.dcr = dcrHot;
      solveWaveform(op, this.curve, solution);
      core = part.coreLoss === null ? null : coreLossOf(part, solution, spec.fsw);
    }
    const ripple = solution.ipk - solution.ivalley;
    if (part !== this.guessPart) this.startPart();
    this.guessPart = part;
    const keep = slot >= 0 ? slot : Number.isNaN(this.guessIout[0]!) ? 0 : 1;
    this.guessIout[keep] = iout;
    this.guessTemperature[keep] = temperature;
    this.temperature = temperature;
    this.riseK = thermal && !solution.unreachable ? temperature - spec.ambient : NaN;
    this.dcrHotOhm = dcrHot;
    this.dcrLoss = dcr20 === null ? 0 : solution.meanSquare * dcrHot;
    this.acLoss = dcr20 === null || part.acFactor === 1 ? 0 : acLossFactor(solution, part.acFactor) * dcrHot;
    this.coreLoss = core;
    this.totalLoss = this.dcrLoss + this.acLoss + (core ?? 0);
    this.isatHot = prepared.isatSlope === 0 ? prepared.isat : isatFromSlope(prepared.isat, prepared.isatSlope, temperature);
    this.irms = Math.sqrt(solution.meanSquare);
    this.ripple = ripple;
  }

  /**
   * First temperature guess of a part at a load: the rise that the DC part of the inductor
   * current alone would cause. Apart from solve() because it runs at two corners in eighteen,
   * and V8 inlines a limited amount into one function: the hot path gets that budget. Leaves
   * the guess in balance.temperature.
   */
  private coldStart(vin: number, iout: number, dcr20: number): void {
    const { spec, balance } = this;
    const il = inductorCurrentCcm(spec.topology, iout, idealDuty(spec.topology, vin, spec.vout));
    balance.copperLossAt20 = il * il * dcr20;
    settleTemperature(balance);
  }

  /** Forgets the warm start, so that a part's corners come out the same whichever part came before. */
  startPart(): void {
    this.guessPart = null;
    this.guessIout[0] = NaN;
    this.guessIout[1] = NaN;
  }

  /** The last solve as a plain CornerResult. */
  result(point: CornerPoint): CornerResult {
    const s = this.solution;
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
      irms: this.irms,
      ripple: this.ripple,
      rippleRatio: this.rippleRatio,
      fluxSwing: s.fluxSwing,
      // Only the detail view needs it, so it is worked out here rather than in every solve.
      inductanceAtPeak: this.curve.inductanceAt(s.ipk > -s.ivalley ? s.ipk : -s.ivalley),
      dcrLoss: this.dcrLoss,
      acLoss: this.acLoss,
      coreLoss: this.coreLoss,
      totalLoss: this.totalLoss,
      tempRise: this.tempRise,
      temperature: this.temperature,
      dcrHot: this.dcrHot,
      isatAtTemp: this.isatAtTemp,
      beyondCurve: s.beyondCurve,
      unreachable: s.unreachable,
    };
  }
}

/** One operating corner of one part (see CornerSolver.solve). */
export function evaluateCorner(spec: Spec, part: Part, point: CornerPoint, prepared: PreparedPart = preparePart(part)): CornerResult {
  const solver = new CornerSolver(spec);
  solver.solve(prepared, point);
  return solver.result(point);
}
