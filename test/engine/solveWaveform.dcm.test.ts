import { describe, expect, it } from "vitest";
import { solve } from "./helpers.ts";

// DCM with constant L: K = 2L/(R·Ts); M = Vo/Vin = 2/(1 + √(1 + 4K/D²)) (buck), (1 + √(1 + 4D²/K))/2
// (boost), D/√K (inverting) — Erickson & Maksimović ch. 5. Current forms by charge balance
// (REFERENCES.md §2); check values computed from them.
describe("solveWaveform in DCM with a diode rectifier", () => {
  it("solveWaveform(buck 12→5 V, 0.1 A, 500 kHz, 4.7 µH) meets the buck DCM conversion ratio", () => {
    const c = solve({ topology: "buck", vin: 12, vout: 5, iout: 0.1, fsw: 500e3 }, { inductance: 4.7e-6 });
    const k = (2 * 4.7e-6 * 500e3) / (5 / 0.1);
    expect(c.mode).toBe("dcm");
    expect(k).toBeCloseTo(0.094, 6);
    expect(5 / 12).toBeCloseTo(2 / (1 + Math.sqrt(1 + (4 * k) / c.duty ** 2)), 10);
    expect(c.duty).toBeCloseTo(0.1673, 4);
    expect(c.d2).toBeCloseTo(0.2342, 4);
    expect(c.idle).toBeCloseTo(0.5986, 4);
    expect(c.ipk).toBeCloseTo(0.4982, 4);
    expect(c.irms).toBeCloseTo(0.1822, 4);
    expect(c.ivalley).toBe(0);
  });

  it("solveWaveform(boost 5→12 V, 0.05 A, 1 MHz, 4.7 µH) meets the boost DCM conversion ratio", () => {
    const c = solve({ topology: "boost", vin: 5, vout: 12, iout: 0.05, fsw: 1e6 }, { inductance: 4.7e-6 });
    const k = (2 * 4.7e-6 * 1e6) / (12 / 0.05);
    expect(c.mode).toBe("dcm");
    expect(12 / 5).toBeCloseTo((1 + Math.sqrt(1 + (4 * c.duty ** 2) / k)) / 2, 10);
    expect(c.duty).toBeCloseTo(0.3628, 4);
    expect(c.d2).toBeCloseTo(0.2591, 4);
    expect(c.ipk).toBeCloseTo(0.3859, 4);
    expect(c.iavg).toBeCloseTo(0.12, 4);
    expect(c.irms).toBeCloseTo(0.1757, 4);
  });

  it("solveWaveform(inverting 12→−5 V, 0.1 A, 400 kHz, 10 µH) meets M = D/√K", () => {
    const c = solve({ topology: "buck-boost", vin: 12, vout: 5, iout: 0.1, fsw: 400e3 }, { inductance: 10e-6 });
    const k = (2 * 10e-6 * 400e3) / (5 / 0.1);
    expect(c.mode).toBe("dcm");
    expect(5 / 12).toBeCloseTo(c.duty / Math.sqrt(k), 10);
    expect(c.duty).toBeCloseTo(0.1667, 4);
    expect(c.d2).toBeCloseTo(0.4, 4);
    expect(c.idle).toBeCloseTo(0.4333, 4);
    expect(c.ipk).toBeCloseTo(0.5, 4);
    expect(c.iavg).toBeCloseTo(0.1417, 4);
    expect(c.irms).toBeCloseTo(0.2173, 4);
  });
});

// Forced-continuous (REFERENCES.md §3, derived): CCM relations at every load, ripple independent of load.
describe("solveWaveform with a synchronous rectifier", () => {
  it("solveWaveform(buck 12→3.3 V, 0.2 A, synchronous) goes negative: valley −0.3090 A, 30.36 % of the period below zero", () => {
    const c = solve({ topology: "buck", rectifier: "synchronous", vin: 12, vout: 3.3, iout: 0.2, fsw: 500e3 }, { inductance: 4.7e-6 });
    expect(c.mode).toBe("forced-continuous");
    expect(c.ivalley).toBeCloseTo(-0.309, 4);
    expect(c.ipk).toBeCloseTo(0.709, 4);
    expect(c.irms).toBeCloseTo(0.3555, 4);
    expect(c.negativeFraction).toBeCloseTo(0.3036, 4);
    expect(c.idle).toBe(0);
  });

  it("solveWaveform(synchronous) keeps the ripple independent of load", () => {
    const light = solve({ topology: "boost", rectifier: "synchronous", vin: 5, vout: 12, iout: 0.01, fsw: 1e6 }, { inductance: 4.7e-6 });
    const heavy = solve({ topology: "boost", rectifier: "synchronous", vin: 5, vout: 12, iout: 0.5, fsw: 1e6 }, { inductance: 4.7e-6 });
    expect(light.ripple).toBeCloseTo(heavy.ripple, 10);
    expect(light.duty).toBeCloseTo(heavy.duty, 12);
  });
});
