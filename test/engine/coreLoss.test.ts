import { describe, expect, it } from "vitest";
import { cosinePowerIntegral, gamma, igseCoefficient, igseTwoRamp, steinmetz } from "../../src/engine/coreLoss.ts";
import { solve } from "./helpers.ts";

const k = 1.5;
const alpha = 1.4;
const beta = 2.5;

/** The iGSE's defining integral (1/T)∫ ki·|dB/dt|^α·ΔB^(β−α) dt by the midpoint rule on samples of B(t). */
function igseByIntegration(b: (t: number) => number, period: number, steps: number): number {
  const ki = igseCoefficient(k, alpha, beta);
  let bMin = Infinity;
  let bMax = -Infinity;
  for (let s = 0; s <= steps; s++) {
    const v = b((s / steps) * period);
    bMin = Math.min(bMin, v);
    bMax = Math.max(bMax, v);
  }
  const swing = bMax - bMin;
  const dt = period / steps;
  let sum = 0;
  for (let s = 0; s < steps; s++) {
    const dbdt = (b((s + 1) * dt) - b(s * dt)) / dt;
    sum += ki * Math.pow(Math.abs(dbdt), alpha) * Math.pow(swing, beta - alpha) * dt;
  }
  return sum / period;
}

// Venkatachalam, Sullivan, Abdallah, Tacca, "Accurate Prediction of Ferrite Core Loss with
// Nonsinusoidal Waveforms Using Only Steinmetz Parameters", IEEE COMPEL 2002.
describe("iGSE", () => {
  it("gamma matches known values Γ(0.5) = √π, Γ(5) = 24", () => {
    expect(gamma(0.5)).toBeCloseTo(Math.sqrt(Math.PI), 12);
    expect(gamma(5)).toBeCloseTo(24, 10);
  });

  it("cosinePowerIntegral(α) equals a numerical ∫₀^2π |cos θ|^α dθ", () => {
    const n = 200000;
    let sum = 0;
    for (let i = 0; i < n; i++) sum += Math.pow(Math.abs(Math.cos(((i + 0.5) / n) * 2 * Math.PI)), alpha);
    expect(cosinePowerIntegral(alpha)).toBeCloseTo((sum * 2 * Math.PI) / n, 8);
  });

  it("igseCoefficient(1.5, 1.4, 2.5) is 0.09366", () => {
    expect(igseCoefficient(k, alpha, beta)).toBeCloseTo(0.09366, 5);
  });

  it("iGSE of a sine returns the Steinmetz value 4.743e4 W/m³ at 100 kHz, 0.1 T", () => {
    const f = 100e3;
    const byIntegral = igseByIntegration((t) => 0.1 * Math.sin(2 * Math.PI * f * t), 1 / f, 200000);
    expect(steinmetz(k, alpha, beta, f, 0.1)).toBeCloseTo(4.743e4, -1);
    expect(byIntegral / steinmetz(k, alpha, beta, f, 0.1)).toBeCloseTo(1, 5);
  });

  for (const [d, expected] of [
    [0.5, 4.421e4],
    [0.25, 4.797e4],
    [0.1, 5.956e4],
  ] as const) {
    it(`igseTwoRamp(ΔB 0.2 T, 100 kHz, D = ${d}) is ${expected} W/m³ and matches the defining integral`, () => {
      const f = 100e3;
      const period = 1 / f;
      const triangle = (t: number) => {
        const x = (t % period) / period;
        return x < d ? (0.2 * x) / d : 0.2 * (1 - (x - d) / (1 - d));
      };
      const closed = igseTwoRamp(k, alpha, beta, f, 0.2, d, 1 - d);
      expect(closed / expected).toBeCloseTo(1, 3);
      expect(igseByIntegration(triangle, period, 100000) / closed).toBeCloseTo(1, 5);
    });
  }

  it("igseTwoRamp with an idle interval sums only the two ramps (flat flux costs nothing)", () => {
    const f = 100e3;
    const period = 1 / f;
    const waveform = (t: number) => {
      const x = (t % period) / period;
      return x < 0.2 ? x / 0.2 : x < 0.5 ? 1 - (x - 0.2) / 0.3 : 0;
    };
    expect(igseByIntegration((t) => 0.15 * waveform(t), period, 100000) / igseTwoRamp(k, alpha, beta, f, 0.15, 0.2, 0.3)).toBeCloseTo(1, 5);
  });
});

describe("core loss in a corner", () => {
  const base = { topology: "buck" as const, vin: 12, vout: 3.3, fsw: 500e3 };
  const coreLoss = { k: 1.5, alpha: 1.4, beta: 2.5, bPerAmp: 0.05, volume: 2e-7 };

  it("evaluateCorner uses the iGSE with ΔB = Δλ·(B per amp)/L0 over the on and rectifier ramps (CCM)", () => {
    const c = solve({ ...base, iout: 2 }, { inductance: 4.7e-6, coreLoss });
    // Constant L: Δλ = L·ΔI, so ΔB = ΔI·(B per amp) (McLyman, ΔB = L·ΔI/(N·Ae), from memory).
    const swing = c.ripple * 0.05;
    expect(c.coreLoss!).toBeCloseTo(igseTwoRamp(1.5, 1.4, 2.5, 500e3, swing, c.duty, 1 - c.duty) * 2e-7, 12);
    expect(c.totalLoss).toBeCloseTo(c.dcrLoss + c.acLoss + c.coreLoss!, 15);
  });

  it("evaluateCorner in DCM counts the two ramps and nothing for the idle interval", () => {
    const c = solve({ ...base, iout: 0.1 }, { inductance: 4.7e-6, coreLoss });
    expect(c.mode).toBe("dcm");
    expect(c.coreLoss!).toBeCloseTo(igseTwoRamp(1.5, 1.4, 2.5, 500e3, c.ipk * 0.05, c.duty, c.d2) * 2e-7, 12);
  });

  it("evaluateCorner reports core loss as null (not modelled) when the part has no core-loss data", () => {
    expect(solve({ ...base, iout: 2 }, { inductance: 4.7e-6 }).coreLoss).toBeNull();
  });
});
