import { describe, expect, it } from "vitest";
import { isatAtTemperature, powerLawRise, ratedHeatingPower } from "../../src/engine/thermal.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { evaluateCorner } from "../../src/engine/evaluateCorner.ts";
import { copperResistance } from "../../src/engine/copper.ts";
import { point, solve } from "./helpers.ts";

// Power-law rise ΔT = ΔTrated·(P/Prated)^k, common practice (REFERENCES.md §6: k = 0.8 from laminar
// natural convection, from memory; McLyman's ψ^0.826 rule, from memory). Check values computed.
describe("powerLawRise", () => {
  it("powerLawRise(0.1120 W of 0.5 W rated at 40 K) is 8.957 K linear, 11.50 K at k = 0.833, 12.08 K at k = 0.8", () => {
    expect(powerLawRise(0.112, 0.5, 40, 1)).toBeCloseTo(8.96, 2);
    expect(powerLawRise(0.112, 0.5, 40, 0.833)).toBeCloseTo(11.5, 2);
    // 40·0.224^0.8 = 12.085; the reference table quotes it truncated to 12.08.
    expect(Math.abs(powerLawRise(0.112, 0.5, 40, 0.8) - 12.08) / 12.08).toBeLessThan(1e-3);
  });
  it("powerLawRise of zero power is zero", () => {
    expect(powerLawRise(0, 0.5, 40, 0.833)).toBe(0);
  });
});

describe("thermal fixed point", () => {
  it("evaluateCorner: a part carrying exactly its rated DC current in a 25 °C ambient rises its rated rise", () => {
    // Pure DC: a buck at vanishing ripple is approximated by a huge inductance.
    const part = completePart({ partNumber: "T", inductance: 1, tolerance: 0, dcrTyp: 0.02, dcrMax: 0.02, irms: 5, irmsRise: 40 });
    const spec = makeSpec({ topology: "buck", vin: 12, vout: 3.3, iout: 5, fsw: 500e3, ambient: 25 });
    const c = evaluateCorner(spec, part, point(12, 5, 1));
    expect(c.tempRise!).toBeCloseTo(40, 2);
    expect(c.dcrHot! / copperResistance(0.02, 25, 65)).toBeCloseTo(1, 5);
    expect(ratedHeatingPower(part)).toBeCloseTo(25 * copperResistance(0.02, 25, 65), 12);
  });

  it("evaluateCorner settles DCR and temperature self-consistently: loss = Irms²·R(T), rise = law(loss)", () => {
    const c = solve(
      { topology: "buck", vin: 12, vout: 3.3, iout: 2, fsw: 500e3, ambient: 40 },
      { inductance: 4.7e-6, dcrTyp: 0.02, dcrMax: 0.024, irms: 3, irmsRise: 40, acFactor: 1 },
    );
    const r = copperResistance(0.024, 25, c.temperature);
    expect(c.dcrLoss / (c.irms ** 2 * r)).toBeCloseTo(1, 5);
    const rated = 9 * copperResistance(0.02, 25, 65);
    expect(c.tempRise!).toBeCloseTo(powerLawRise(c.totalLoss, rated, 40, 0.833), 2);
  });

  // REFERENCES.md §4: buck check with 20 mΩ at 100 °C: Fr 3 → 0.1120 W, Fr 1 → 0.1074 W.
  it("copper loss splits DC and ripple: Fr = 3 gives 0.1120 W and Fr = 1 gives 0.1074 W (20 mΩ at 100 °C)", () => {
    const base = { topology: "buck" as const, vin: 12, vout: 3.3, iout: 2, fsw: 500e3, ambient: 100 };
    const fr3 = solve(base, { inductance: 4.7e-6, dcrTyp: 0.02, dcrTemp: 20, acFactor: 3 });
    const fr1 = solve(base, { inductance: 4.7e-6, dcrTyp: 0.02, dcrTemp: 20, acFactor: 1 });
    // Drops off: the winding's own IL·RL drop shifts the duty slightly; compare with a loose 0.3 %.
    expect(fr3.dcrLoss + fr3.acLoss).toBeCloseTo(0.112, 3);
    expect(fr1.dcrLoss + fr1.acLoss).toBeCloseTo(0.1074, 3);
  });

  it("isatAtTemperature interpolates between 25 °C and the hot rating", () => {
    const part = completePart({ partNumber: "H", inductance: 1e-6, isat: 10, isatHot: 8, isatHotTemp: 125 });
    expect(isatAtTemperature(part, 25)).toBe(10);
    expect(isatAtTemperature(part, 75)).toBeCloseTo(9, 12);
    expect(isatAtTemperature(part, 125)).toBeCloseTo(8, 12);
    expect(isatAtTemperature(part, 0)).toBe(10);
  });
});
