import { describe, expect, it } from "vitest";
import { nominalInductanceRange, requiredInductance } from "../../src/engine/requiredInductance.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";

describe("requiredInductance", () => {
  it("requiredInductance(buck 12→3.3 V, 2 A, 500 kHz, r 0.2–0.4) is (Vin − Vo)·D/(fsw·IL·r) at each end", () => {
    const band = requiredInductance(makeSpec({ topology: "buck", vin: 12, vout: 3.3, iout: 2, fsw: 500e3 }))!;
    // Erickson & Maksimović ch. 2: ΔI = (Vin − Vo)·D/(fsw·L), r = ΔI/IL.
    const c = ((12 - 3.3) * (3.3 / 12)) / (500e3 * 2);
    expect(band.min).toBeCloseTo(c / 0.4, 12);
    expect(band.max).toBeCloseTo(c / 0.2, 12);
    // 4.7 µH gives r = 1.018/2 = 0.509, outside; the band is about 6.0–12.0 µH.
    expect(band.min * 1e6).toBeCloseTo(5.981, 3);
  });

  it("nominalInductanceRange keeps the whole ±tolerance span inside the band, or says none fits", () => {
    expect(nominalInductanceRange({ min: 6e-6, max: 12e-6, vin: 12, iout: 2 }, 0.2)).toEqual({ min: 7.5e-6, max: 1e-5 });
    expect(nominalInductanceRange({ min: 6e-6, max: 7e-6, vin: 12, iout: 2 }, 0.2)).toBeNull();
  });
});
