import { describe, expect, it } from "vitest";
import { ConstantInductance, type FluxCurve, RollOffCurve, knee, rollOffRatio } from "../../src/engine/fluxCurve.ts";
import { solve } from "./helpers.ts";

// Rational roll-off L(I) = L0/(1 + (I/I0)^n), I0 = Isat·(x/(1 − x))^(−1/n) (REFERENCES.md §7;
// fits from textbook material, from memory). Check values computed from the formula.
describe("roll-off law", () => {
  it("knee(6 A, 20 %, n) gives I0 = 12.00 A for n = 2 and 7.560 A for n = 6", () => {
    expect(knee(6, 0.2, 2)).toBeCloseTo(12, 10);
    expect(knee(6, 0.2, 6)).toBeCloseTo(7.56, 3);
  });

  it("rollOffRatio reproduces L(3 A) and L(8 A) of a 4.7 µH, 6 A-at-20 % part", () => {
    expect(4.7 * rollOffRatio(3, knee(6, 0.2, 2), 2)).toBeCloseTo(4.424, 3);
    expect(4.7 * rollOffRatio(8, knee(6, 0.2, 2), 2)).toBeCloseTo(3.254, 3);
    expect(4.7 * rollOffRatio(3, knee(6, 0.2, 6), 6)).toBeCloseTo(4.682, 3);
    expect(4.7 * rollOffRatio(8, knee(6, 0.2, 6), 6)).toBeCloseTo(1.955, 3);
    expect(rollOffRatio(6, knee(6, 0.2, 6), 6)).toBeCloseTo(0.8, 12);
  });
});

// For n = 2 the tables have a closed form: λ = L0·Ik·atan(i/Ik), so i(λ) = Ik·tan(y),
// G = L0·Ik²·(−ln cos y) and H = L0·Ik³·(tan y − y), y = λ/(L0·Ik) (calculus, common practice).
describe("RollOffCurve(n = 2) against the closed form", () => {
  const l0 = 4.7e-6;
  const ik = 12;
  const curve = new RollOffCurve(l0, ik, 2);
  const ys = [0, 0.01, 0.3, 0.77, 1.0, 1.3, 1.5, -0.4, -1.2];
  for (const y of ys) {
    it(`RollOffCurve at y = ${y} matches tan, −ln cos and tan − y`, () => {
      const lambda = y * l0 * ik;
      expect(curve.current(lambda)).toBeCloseTo(ik * Math.tan(y), 7);
      expect(curve.currentIntegral(lambda)).toBeCloseTo(l0 * ik * ik * -Math.log(Math.cos(y)), 12);
      expect(curve.squareIntegral(lambda) / (l0 * ik ** 3)).toBeCloseTo(Math.tan(y) - y, 7);
      expect(curve.flux(ik * Math.tan(y))).toBeCloseTo(lambda, 14);
    });
  }

  it("RollOffCurve.current is monotone in λ and inverts flux (saturation curve monotone)", () => {
    for (const n of [1.5, 2, 3, 6, 8, 12]) {
      const c = new RollOffCurve(1e-6, 5, n);
      let previous = -Infinity;
      for (let k = 0; k <= 2000; k++) {
        const lambda = ((k - 1000) / 1000) * c.lambdaLimit * 0.999;
        const i = c.current(lambda);
        expect(i).toBeGreaterThan(previous);
        previous = i;
      }
      for (const i of [0.1, 1, 4, 5, 6]) expect(c.current(c.flux(i))).toBeCloseTo(i, 5);
    }
  });

  it("ConstantInductance reduces every table to the linear forms λ/L, λ²/2L and λ³/3L²", () => {
    const c = new ConstantInductance(2e-6);
    expect(c.current(4e-6)).toBe(2);
    expect(c.currentIntegral(4e-6)).toBeCloseTo(4e-6, 18);
    expect(c.squareIntegral(4e-6)).toBeCloseTo((64e-18 / 3) / 4e-12, 18);
  });
});

// sample(λ) against the n = 2 closed form above (i = Ik·tan y, G = L0·Ik²·(−ln cos y),
// H = L0·Ik³·(tan y − y), di/dλ = (1 + tan² y)/L0; calculus, common practice).
describe("RollOffCurve.sample against the closed form (n = 2)", () => {
  const l0 = 4.7e-6;
  const ik = 12;
  const curve = new RollOffCurve(l0, ik, 2);
  for (const y of [0.02, 0.6, 1.1, 1.45, -0.9]) {
    it(`sample at y = ${y} gives i, ∫i dλ, ∫i² dλ and di/dλ of the closed form`, () => {
      curve.sample(y * l0 * ik);
      const t = Math.tan(y);
      expect(curve.sampleCurrent / (ik * t)).toBeCloseTo(1, 6);
      expect(curve.sampleIntegral / (l0 * ik * ik * -Math.log(Math.cos(y)))).toBeCloseTo(1, 6);
      expect(curve.sampleSquare / (l0 * ik ** 3 * (t - y))).toBeCloseTo(1, 5);
      // Linear between nodes: within a part in 1e5 where the slope stays below 64.
      expect(curve.sampleSlope / ((1 + t * t) / l0)).toBeCloseTo(1, 4);
    });
  }

  it("ConstantInductance.sample gives λ/L, λ²/2L, λ³/3L² and 1/L", () => {
    const c = new ConstantInductance(2e-6);
    c.sample(3e-6);
    expect(c.sampleCurrent).toBeCloseTo(1.5, 12);
    expect(c.sampleIntegral).toBeCloseTo(2.25e-6, 18);
    expect(c.sampleSquare).toBeCloseTo(2.25e-6, 18);
    expect(c.sampleSlope).toBeCloseTo(5e5, 6);
  });
});

// The mean of i over a ramp centred on λc is i(λc) + i''(λc)·Δλ²/24 + O(Δλ⁴) (Taylor, common
// practice), so rampCentre's point is closer to the ramp that averages I than λ(I) is.
describe("RollOffCurve.rampCentre", () => {
  it("rampCentre puts the mean of a ramp nearer the target current than λ(I) does", () => {
    const l0 = 4.7e-6;
    const ik = 12;
    const curve = new RollOffCurve(l0, ik, 2);
    const mean = (centre: number, swing: number) =>
      (curve.currentIntegral(centre + swing / 2) - curve.currentIntegral(centre - swing / 2)) / swing;
    for (const [current, swing] of [
      [8, 3e-6],
      [14, 2e-5],
    ] as const) {
      const naive = Math.abs(mean(curve.flux(current), swing) - current);
      const second = Math.abs(mean(curve.rampCentre(current, swing), swing) - current);
      expect(second).toBeLessThan(naive / 10);
    }
  });

  it("a reused RollOffCurve gives a fresh curve's flux and ramp centre after set() to another L0, Ik or n", () => {
    // The curve keeps y(I/Ik) of the last current across set() while Ik and n stay the same.
    const reused = new RollOffCurve(4.7e-6, 12, 2);
    const settings: [number, number, number][] = [
      [3.76e-6, 12, 2],
      [5.64e-6, 12, 2],
      [5.64e-6, 9, 2],
      [5.64e-6, 9, 6],
      [4.7e-6, 12, 2],
    ];
    for (const [l0, ik, n] of settings) {
      reused.set(l0, ik, n);
      const fresh = new RollOffCurve(l0, ik, n);
      for (const [current, swing] of [
        [8, 3e-6],
        [-5, 1e-6],
        [400, 1e-6],
        // Last here and first after the next set(): the kept value is the one asked again.
        [8, 3e-6],
      ] as const) {
        expect(reused.flux(current)).toBe(fresh.flux(current));
        expect(reused.rampCentre(current, swing)).toBe(fresh.rampCentre(current, swing));
      }
    }
  });

  it("rampCentre is λ = L·I for constant L", () => {
    const curve: FluxCurve = new ConstantInductance(2e-6);
    expect(curve.rampCentre(3, 1e-6)).toBeCloseTo(6e-6, 18);
  });
});

describe("solver with roll-off", () => {
  it("solveWaveform(buck 12→3.3 V, 5 A, n = 2, I0 = 12 A) gives the nonlinear ripple 1.195 A from ∫L di = V·t", () => {
    const c = solve(
      { topology: "buck", vin: 12, vout: 3.3, iout: 5, fsw: 500e3 },
      { inductance: 4.7e-6, isat: 12, isatDrop: 0.5, rollOffExponent: 2 },
    );
    // REFERENCES.md §7 quotes ΔI ≈ 1.195 A (against 1.018 A with L0); the closed form below gives 1.19568.
    expect(Math.abs(c.ripple - 1.195) / 1.195).toBeLessThan(1e-3);
    expect(c.iavg).toBeCloseTo(5, 10);
    // Exact check by the closed form: λ1 − λ0 = (Vin − Vo)·D·Ts with λ = L0·Ik·atan(i/Ik).
    const swing = (12 - 3.3) * (3.3 / 12) / 500e3;
    expect(4.7e-6 * 12 * (Math.atan(c.ipk / 12) - Math.atan(c.ivalley / 12))).toBeCloseTo(swing, 12);
    const y0 = Math.atan(c.ivalley / 12);
    const y1 = Math.atan(c.ipk / 12);
    expect((12 * (Math.log(Math.cos(y0)) - Math.log(Math.cos(y1)))) / (y1 - y0)).toBeCloseTo(5, 8);
  });

  it("solveWaveform flags a core driven past the modelled curve", () => {
    const c = solve(
      { topology: "buck", vin: 12, vout: 3.3, iout: 20, fsw: 500e3 },
      { inductance: 4.7e-6, isat: 2, isatDrop: 0.3, rollOffExponent: 8 },
    );
    expect(c.beyondCurve).toBe(true);
  });
});
