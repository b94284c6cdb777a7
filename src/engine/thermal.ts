import type { Part } from "./types.ts";
import { COPPER_ALPHA20, copperResistance } from "./copper.ts";
import { powerTable } from "./powerTable.ts";

/** Common practice: makers rate heating current in a 25 °C ambient. */
export const RATING_AMBIENT = 25;

/**
 * Power-law temperature rise ΔT = ΔTrated·(P/Prated)^k (common practice; k = 1 is a fixed
 * thermal resistance, k ≈ 0.8 follows laminar natural convection, h ∝ ΔT^0.25, from memory).
 */
export function powerLawRise(powerW: number, ratedPowerW: number, ratedRiseK: number, exponent: number): number {
  if (powerW <= 0) return 0;
  return ratedRiseK * Math.pow(powerW / ratedPowerW, exponent);
}

/**
 * Loss at the rated heating current: the winding sat at the rating ambient plus the rated rise
 * while it was measured, so the DCR is taken hot. A part carrying exactly its rated DC current in
 * a 25 °C ambient is then predicted to rise exactly its rated rise.
 */
export function ratedHeatingPower(part: Part): number | null {
  const dcr = part.dcrTyp ?? part.dcrMax;
  if (part.irms === null || dcr === null) return null;
  return part.irms * part.irms * copperResistance(dcr, part.dcrTemp, RATING_AMBIENT + part.irmsRise);
}

/**
 * Saturation current at tC: linear between (25 °C, Isat) and (hot temperature, hot Isat), held at
 * Isat below 25 °C and extrapolated above the hot point (ferrite's saturation flux falls roughly
 * linearly with temperature, from memory), never below a twentieth of Isat.
 */
export function isatAtTemperature(part: Part, tC: number): number | null {
  return part.isat === null ? null : isatFromSlope(part.isat, isatSlopePerKelvin(part), tC);
}

/** dIsat/dT above 25 °C from the hot rating, 0 when the list gives none. */
export function isatSlopePerKelvin(part: Part): number {
  if (part.isat === null || part.isatHot === null || part.isatHotTemp === null || part.isatHotTemp <= 25) return 0;
  return (part.isatHot - part.isat) / (part.isatHotTemp - 25);
}

/**
 * isatAtTemperature from Isat at 25 °C and its slope; NaN (no Isat) gives NaN. Kept small and
 * free of null: it sits on the ranking's hot path.
 */
export function isatFromSlope(isat: number, slopePerKelvin: number, tC: number): number {
  if (slopePerKelvin === 0 || tC <= 25) return isat;
  return Math.max(isat * 0.05, isat + slopePerKelvin * (tC - 25));
}

const NEWTON_STEP_K = 1;

/** A winding this hot has run away thermally; the solution stops there and says so. */
export const RUNAWAY_TEMPERATURE = 1000;

export interface ThermalBalance {
  ambient: number;
  /** Winding loss of the present waveform with the winding resistance taken at 20 °C, W. */
  copperLossAt20: number;
  /** Loss that does not scale with copper resistance (core), W. */
  otherLoss: number;
  /** 1/(loss at the rated heating current), W⁻¹, formed once per part by the caller. */
  inverseRatedPower: number;
  ratedRise: number;
  exponent: number;
  /**
   * In: where Newton starts, °C. Out: the settled temperature (RUNAWAY_TEMPERATURE at most).
   * Returned through the object rather than as a value: a double returned by a call V8 does not
   * inline is boxed, at every corner of a ranking.
   */
  temperature: number;
}

/**
 * Temperature T with T = Ta + ΔTrated·(P(T)/Prated)^k, where the copper part of P grows as
 * R(T) = R20·(1 + α20(T − 20)) (IEC 60028). Newton on h(T) = T − Ta − rise(P(T)); for k = 1
 * this is the self-consistent form ΔT = Rth·P20·(…)/(1 − Rth·P20·α20), which runs away when
 * Rth·P20·α20 ≥ 1.
 */
export function settleTemperature(b: ThermalBalance): void {
  // P(T) = base + slope·T.
  const slope = b.copperLossAt20 * COPPER_ALPHA20;
  const base = b.copperLossAt20 - slope * 20 + b.otherLoss;
  const power = powerTable(b.exponent);
  const inverseRated = b.inverseRatedPower;
  const k = b.exponent;
  let t = b.temperature;
  for (let iteration = 0; iteration < 50; iteration++) {
    const p = base + slope * t;
    let step: number;
    if (p > 0) {
      const rise = b.ratedRise * power.pow(p * inverseRated);
      // h'(T) = 1 − k·rise·slope/P; multiplied through by P so that the step takes one division.
      const dhTimesP = p - k * rise * slope;
      if (!(dhTimesP > 0)) {
        b.temperature = RUNAWAY_TEMPERATURE;
        return;
      }
      step = ((t - b.ambient - rise) * p) / dhTimesP;
    } else {
      step = t - b.ambient;
    }
    const next = Math.max(t - step, b.ambient);
    if (!(next < RUNAWAY_TEMPERATURE)) {
      b.temperature = RUNAWAY_TEMPERATURE;
      return;
    }
    t = next;
    // Newton's error after a step e is about |h''/(2h')|·e², and h'' = k(1 − k)·rise·(slope/P)² is
    // of the order of 1e-4 /K (copper adds about 0.4 %/K): after a step under 1 K the error left
    // is below 1e-4 K.
    if (Math.abs(step) < NEWTON_STEP_K) break;
  }
  b.temperature = t;
}
