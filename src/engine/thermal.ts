import type { Part } from "./types.ts";
import { copperResistance } from "./copper.ts";

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
  if (part.isat === null) return null;
  if (part.isatHot === null || part.isatHotTemp === null || part.isatHotTemp <= 25) return part.isat;
  if (tC <= 25) return part.isat;
  const slope = (part.isatHot - part.isat) / (part.isatHotTemp - 25);
  return Math.max(part.isat * 0.05, part.isat + slope * (tC - 25));
}
