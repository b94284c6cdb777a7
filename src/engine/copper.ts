/**
 * Annealed copper: 0.017241 Ω·mm²/m at 20 °C and α20 = 0.00393 /K = 1/254.5 (IEC 60028).
 */
export const COPPER_ALPHA20 = 0.00393;
export const COPPER_RESISTIVITY20 = 0.017241e-6;
const MU0 = 4e-7 * Math.PI;

/** Resistance at tC of a copper winding that measures rRef at tRefC: R ∝ 1 + α20·(T − 20). */
export function copperResistance(rRef: number, tRefC: number, tC: number): number {
  return resistanceFrom20(rRef / (1 + COPPER_ALPHA20 * (tRefC - 20)), tC);
}

/** Resistance at tC of a copper winding that measures r20 at 20 °C, where α20 is stated. */
export function resistanceFrom20(r20: number, tC: number): number {
  return r20 * (1 + COPPER_ALPHA20 * (tC - 20));
}

/** Skin depth δ = √(ρ/(π·f·µ0)) in m (textbook, from memory), at the copper temperature tC. */
export function skinDepth(frequencyHz: number, tC = 20): number {
  const rho = COPPER_RESISTIVITY20 * (1 + COPPER_ALPHA20 * (tC - 20));
  return Math.sqrt(rho / (Math.PI * frequencyHz * MU0));
}
