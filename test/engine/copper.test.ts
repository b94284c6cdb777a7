import { describe, expect, it } from "vitest";
import { COPPER_ALPHA20, copperResistance, skinDepth } from "../../src/engine/copper.ts";

// IEC 60028 (annealed copper): α20 = 0.00393 /K = 1/254.5; R(T) = R20·(1 + α20·(T − 20)).
describe("copperResistance", () => {
  it("copperResistance(20 mΩ at 20 °C) is 26.29 mΩ at 100 °C", () => {
    expect(copperResistance(0.02, 20, 100)).toBeCloseTo(0.02629, 5);
  });
  it("copperResistance at 25 °C reference follows R25·(234.5 + T)/259.5: R100/R25 = 1.289", () => {
    expect(copperResistance(1, 25, 100)).toBeCloseTo(1.289, 3);
    expect(copperResistance(1, 25, 100)).toBeCloseTo((234.5 + 100) / 259.5, 3);
    expect(1 / COPPER_ALPHA20).toBeCloseTo(254.5, 0);
  });
  it("copperResistance is the identity at its reference temperature", () => {
    expect(copperResistance(0.123, 25, 25)).toBeCloseTo(0.123, 15);
  });
});

// δ = √(ρ/(π·f·µ0)) (textbook, from memory); check values from REFERENCES.md §4.
describe("skinDepth", () => {
  it("skinDepth of copper at 20 °C is 0.2090 mm at 100 kHz and 0.09346 mm at 500 kHz", () => {
    expect(skinDepth(100e3) * 1e3).toBeCloseTo(0.209, 4);
    expect(skinDepth(500e3) * 1e3).toBeCloseTo(0.09346, 5);
  });
});
