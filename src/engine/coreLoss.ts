/**
 * Core loss by the improved generalised Steinmetz equation (iGSE):
 * Pv = (1/T)∫ ki·|dB/dt|^α·ΔB^(β−α) dt, ki = k / ((2π)^(α−1)·∫₀^2π |cos θ|^α dθ·2^(β−α))
 * (Venkatachalam, Sullivan, Abdallah, Tacca, IEEE COMPEL 2002, eqs. 9–11).
 */

/** Lanczos approximation of Γ (g = 7, n = 9; Numerical Recipes-style coefficients, from memory). */
export function gamma(z: number): number {
  const c = [
    0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
    12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
  ];
  if (z < 0.5) return Math.PI / (Math.sin(Math.PI * z) * gamma(1 - z));
  const x = z - 1;
  let a = c[0]!;
  const t = x + 7.5;
  for (let i = 1; i < 9; i++) a += c[i]! / (x + i);
  return Math.sqrt(2 * Math.PI) * Math.pow(t, x + 0.5) * Math.exp(-t) * a;
}

/** ∫₀^2π |cos θ|^α dθ = 2√π·Γ((α+1)/2)/Γ(α/2 + 1) (textbook identity, from memory). */
export function cosinePowerIntegral(alpha: number): number {
  return (2 * Math.sqrt(Math.PI) * gamma((alpha + 1) / 2)) / gamma(alpha / 2 + 1);
}

export function igseCoefficient(k: number, alpha: number, beta: number): number {
  return k / (Math.pow(2 * Math.PI, alpha - 1) * cosinePowerIntegral(alpha) * Math.pow(2, beta - alpha));
}

/** Classic Steinmetz Pv = k·f^α·B̂^β for a sinusoid of peak B̂ (Li, Abdallah, Sullivan, IEEE IAS 2001). */
export function steinmetz(k: number, alpha: number, beta: number, frequencyHz: number, peakFluxT: number): number {
  return k * Math.pow(frequencyHz, alpha) * Math.pow(peakFluxT, beta);
}

/**
 * iGSE for a piecewise-linear flux that rises by ΔB in a fraction `rise` of the period and falls
 * back in a fraction `fall` (the rest, if any, flat): each ramp contributes
 * ki·(ΔB/(d·T))^α·ΔB^(β−α)·d, so Pv = ki·ΔB^β·f^α·(rise^(1−α) + fall^(1−α)).
 */
export function igseTwoRamp(
  k: number,
  alpha: number,
  beta: number,
  frequencyHz: number,
  swingT: number,
  rise: number,
  fall: number,
): number {
  if (swingT <= 0 || rise <= 0 || fall <= 0) return 0;
  const ki = igseCoefficient(k, alpha, beta);
  return ki * Math.pow(swingT, beta) * Math.pow(frequencyHz, alpha) * (Math.pow(rise, 1 - alpha) + Math.pow(fall, 1 - alpha));
}
