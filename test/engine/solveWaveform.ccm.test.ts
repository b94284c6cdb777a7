import { describe, expect, it } from "vitest";
import { solve } from "./helpers.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { evaluateCorner } from "../../src/engine/evaluateCorner.ts";
import { waveformSamples } from "../../src/engine/waveformSamples.ts";
import { point } from "./helpers.ts";

// Closed forms with constant L: Erickson & Maksimović, Fundamentals of Power Electronics, ch. 2
// (D, IL, ΔI, Ipk = IL + ΔI/2, Irms² = IL² + ΔI²/12). Check values computed from those formulas
// (shared REFERENCES.md §1, 4 s.f.).
describe("solveWaveform in CCM with constant L", () => {
  it("solveWaveform(buck 12→3.3 V, 2 A, 500 kHz, 4.7 µH) matches the textbook ripple, peak, valley and RMS", () => {
    const c = solve({ topology: "buck", vin: 12, vout: 3.3, iout: 2, fsw: 500e3 }, { inductance: 4.7e-6 });
    const d = 3.3 / 12;
    const ripple = ((12 - 3.3) * d) / (500e3 * 4.7e-6);
    expect(c.mode).toBe("ccm");
    expect(c.duty).toBeCloseTo(d, 12);
    expect(c.ripple).toBeCloseTo(ripple, 10);
    expect(c.ipk).toBeCloseTo(2 + ripple / 2, 10);
    expect(c.ivalley).toBeCloseTo(2 - ripple / 2, 10);
    expect(c.irms).toBeCloseTo(Math.sqrt(4 + (ripple * ripple) / 12), 10);
    expect(c.ripple).toBeCloseTo(1.018, 3);
    expect(c.irms).toBeCloseTo(2.021, 3);
  });

  it("waveformSamples(buck) rises at (Vin − Vout)/L while on and falls at −Vout/L while off (V = L·di/dt, common practice)", () => {
    const spec = makeSpec({ topology: "buck", vin: 12, vout: 3.3, iout: 2, fsw: 500e3 });
    const part = completePart({ partNumber: "P", inductance: 4.7e-6, tolerance: 0 });
    const c = evaluateCorner(spec, part, point(12, 2, 4.7e-6));
    const s = waveformSamples(spec, part, c, 1, 10);
    const rise = (s[5]!.i - s[0]!.i) / (s[5]!.t - s[0]!.t);
    const fall = (s[15]!.i - s[11]!.i) / (s[15]!.t - s[11]!.t);
    expect(rise).toBeCloseTo((12 - 3.3) / 4.7e-6, -2);
    expect(fall).toBeCloseTo(-3.3 / 4.7e-6, -2);
  });

  it("solveWaveform(boost 5→12 V, 0.5 A, 1 MHz, 4.7 µH) gives IL = Iout/(1 − D) and the textbook ripple", () => {
    const c = solve({ topology: "boost", vin: 5, vout: 12, iout: 0.5, fsw: 1e6 }, { inductance: 4.7e-6 });
    const d = 1 - 5 / 12;
    const ripple = (5 * d) / (1e6 * 4.7e-6);
    expect(c.duty).toBeCloseTo(d, 12);
    expect(c.iavg).toBeCloseTo(0.5 / (1 - d), 12);
    expect(c.ripple).toBeCloseTo(ripple, 10);
    expect(c.ipk).toBeCloseTo(1.51, 3);
    expect(c.ivalley).toBeCloseTo(0.8897, 4);
    expect(c.irms).toBeCloseTo(1.213, 3);
  });

  it("solveWaveform(inverting 12→−5 V, 1 A, 400 kHz, 10 µH) gives D = Vo/(Vin + Vo) and IL = Iout/(1 − D)", () => {
    const c = solve({ topology: "buck-boost", vin: 12, vout: 5, iout: 1, fsw: 400e3 }, { inductance: 10e-6 });
    const d = 5 / 17;
    expect(c.duty).toBeCloseTo(d, 12);
    expect(c.iavg).toBeCloseTo(1 / (1 - d), 12);
    expect(c.ripple).toBeCloseTo((12 * d) / (400e3 * 10e-6), 10);
    expect(c.ipk).toBeCloseTo(1.858, 3);
    expect(c.irms).toBeCloseTo(1.439, 3);
  });

  // Duty with drops by volt-second balance (REFERENCES.md §1, derived; buck form also in Maniktala).
  it("solveWaveform(buck) with switch drop 0.2 V, diode 0.4 V and 20 mΩ DCR shifts D to (Vo + VD + IL·RL)/(Vin − Vsw + VD)", () => {
    const c = solve(
      { topology: "buck", vin: 12, vout: 3.3, iout: 2, fsw: 500e3, switchDrop: 0.2, rectifierDrop: 0.4 },
      { inductance: 4.7e-6, dcrTyp: 0.02, dcrTemp: 25 },
    );
    expect(c.duty).toBeCloseTo((3.3 + 0.4 + 2 * 0.02) / (12 - 0.2 + 0.4), 12);
    expect(c.duty).toBeCloseTo(0.3066, 4);
  });

  it("solveWaveform(boost) with drops solves a·D'² − b·D' + c = 0 for the physical root", () => {
    const c = solve(
      { topology: "boost", vin: 5, vout: 12, iout: 0.5, fsw: 1e6, switchDrop: 0.1, rectifierDrop: 0.4 },
      { inductance: 4.7e-6, dcrTyp: 0.05, dcrTemp: 25 },
    );
    const a = 12 + 0.4 - 0.1;
    const b = 5 - 0.1;
    const cc = 0.5 * 0.05;
    const dPrime = (b + Math.sqrt(b * b - 4 * a * cc)) / (2 * a);
    expect(c.duty).toBeCloseTo(1 - dPrime, 10);
    expect(c.duty).toBeCloseTo(0.6068, 4);
    expect(c.iavg).toBeCloseTo(1.272, 3);
    expect(c.ripple).toBeCloseTo(0.6244, 4);
  });

  it("solveWaveform(inverting) with drops satisfies D = (Vo + VD + IL·RL)/(Vin − Vsw + Vo + VD) with IL = Iout/(1 − D)", () => {
    const c = solve(
      { topology: "buck-boost", vin: 12, vout: 5, iout: 1, fsw: 400e3, switchDrop: 0.15, rectifierDrop: 0.4 },
      { inductance: 10e-6, dcrTyp: 0.03, dcrTemp: 25 },
    );
    expect(c.duty).toBeCloseTo((5 + 0.4 + c.iavg * 0.03) / (12 - 0.15 + 5 + 0.4), 10);
    expect(c.iavg).toBeCloseTo(1 / (1 - c.duty), 10);
    expect(c.duty).toBeCloseTo(0.3156, 4);
    expect(c.iavg).toBeCloseTo(1.461, 3);
  });

  it("solveWaveform(boost) reports an output the losses cannot reach as unreachable", () => {
    const c = solve({ topology: "boost", vin: 5, vout: 12, iout: 5, fsw: 1e6 }, { inductance: 4.7e-6, dcrTyp: 1, dcrTemp: 25 });
    expect(c.unreachable).toBe(true);
  });
});

// Boundary: K = 2L/(R·Ts) against Kcrit (Erickson & Maksimović ch. 5): buck 1 − D, boost D(1 − D)², inverting (1 − D)².
describe("mode against the critical K", () => {
  const cases = [
    { topology: "buck" as const, vin: 12, vout: 3.3, fsw: 500e3, l: 4.7e-6, kcrit: (d: number) => 1 - d, duty: 3.3 / 12 },
    { topology: "boost" as const, vin: 5, vout: 12, fsw: 1e6, l: 4.7e-6, kcrit: (d: number) => d * (1 - d) ** 2, duty: 1 - 5 / 12 },
    { topology: "buck-boost" as const, vin: 12, vout: 5, fsw: 400e3, l: 10e-6, kcrit: (d: number) => (1 - d) ** 2, duty: 5 / 17 },
  ];
  for (const k of cases) {
    it(`solveWaveform(${k.topology}) is CCM above Kcrit and DCM below it`, () => {
      const kc = k.kcrit(k.duty);
      // Iout at which K = Kcrit: R = 2L·fsw/Kcrit, Iout = Vo/R.
      const ioutCrit = (k.vout * kc) / (2 * k.l * k.fsw);
      for (const [factor, mode] of [
        [1.3, "ccm"],
        [0.7, "dcm"],
      ] as const) {
        const c = solve({ topology: k.topology, vin: k.vin, vout: k.vout, iout: ioutCrit * factor, fsw: k.fsw }, { inductance: k.l });
        expect(c.mode).toBe(mode);
      }
      const boundary = solve({ topology: k.topology, vin: k.vin, vout: k.vout, iout: ioutCrit, fsw: k.fsw }, { inductance: k.l });
      expect(boundary.mode).toBe("bcm");
      // At the boundary Ipk = 2·IL and Irms = Ipk/√3 (REFERENCES.md §1).
      expect(boundary.ipk).toBeCloseTo(2 * boundary.iavg, 6);
      expect(boundary.irms).toBeCloseTo(boundary.ipk / Math.sqrt(3), 6);
    });
  }

  it("critical load current of the 12→3.3 V buck is ΔI/2 = 0.5090 A", () => {
    const c = solve({ topology: "buck", vin: 12, vout: 3.3, iout: 0.5090, fsw: 500e3 }, { inductance: 4.7e-6 });
    expect(Math.abs(c.ivalley)).toBeLessThan(1e-3);
  });
});
