import { describe, expect, it } from "vitest";
import { cornerPoints } from "../../src/engine/cornerPoints.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { evaluatePart } from "../../src/engine/evaluatePart.ts";

const part = completePart({ partNumber: "P", inductance: 4.7e-6, tolerance: 0.2 });

describe("cornerPoints", () => {
  it("cornerPoints(buck with ranges) gives 3 vin × 2 loads × 3 inductances = 18 corners", () => {
    const spec = makeSpec({ topology: "buck", vin: { min: 9, nom: 12, max: 15 }, vout: 3.3, iout: { min: 0.2, max: 2 }, fsw: 500e3 });
    const corners = cornerPoints(spec, part);
    expect(corners).toHaveLength(18);
    expect(new Set(corners.map((c) => Math.round(c.inductance * 1e9)))).toEqual(new Set([3760, 4700, 5640]));
  });

  it("cornerPoints(single vin and iout, tolerance 0) evaluates one corner at nominal inductance", () => {
    const spec = makeSpec({ topology: "buck", vin: 12, vout: 3.3, iout: 2, fsw: 500e3 });
    const corners = cornerPoints(spec, completePart({ partNumber: "Z", inductance: 1e-6, tolerance: 0 }));
    expect(corners).toHaveLength(1);
    expect(corners[0]!.inductance).toBe(1e-6);
  });

  it("cornerPoints(boost) adds Vin = Vo/2, where the ripple peaks, when it lies inside the range", () => {
    const spec = makeSpec({ topology: "boost", vin: { min: 4, nom: 5, max: 9 }, vout: 12, iout: { min: 0.1, max: 0.5 }, fsw: 1e6 });
    const vins = new Set(cornerPoints(spec, part).map((c) => c.vin));
    expect(vins).toEqual(new Set([4, 5, 9, 6]));
  });
});

// Worst-case corners (REFERENCES.md §1, derived): buck 9–15 V → 3.3 V, 500 kHz, 4.7 µH ±20 %.
describe("worst case over corners", () => {
  it("evaluatePart(buck 9–15 V) finds the largest ripple and peak at Vin max and L −20 %", () => {
    const spec = makeSpec({ topology: "buck", rectifier: "synchronous", vin: { min: 9, nom: 12, max: 15 }, vout: 3.3, iout: { min: 0.2, max: 2 }, fsw: 500e3 });
    const e = evaluatePart(spec, part);
    const peak = e.corners[e.worst.ipk.cornerIndex]!;
    expect(peak.vin).toBe(15);
    expect(peak.inductanceCorner).toBe("min");
    expect(e.worst.ripple.value).toBeCloseTo(1.369, 3);
    expect(e.worst.ipk.value).toBeCloseTo(2.685, 3);
    expect(e.worst.ivalley.value).toBeCloseTo(-0.4846, 4);
    const at9 = e.corners.find((c) => c.vin === 9 && c.inductanceCorner === "max" && c.iout === 2)!;
    expect(at9.ripple).toBeCloseTo(0.7411, 4);
    expect(at9.ipk).toBeCloseTo(2.371, 3);
  });

  it("evaluatePart(boost 3–5.5 V → 12 V, 3.76 µH) has the largest IL at Vin min", () => {
    const spec = makeSpec({ topology: "boost", vin: { min: 3, nom: 4, max: 5.5 }, vout: 12, iout: 0.5, fsw: 1e6 });
    const e = evaluatePart(spec, completePart({ partNumber: "B", inductance: 3.76e-6, tolerance: 0 }));
    const at3 = e.corners.find((c) => c.vin === 3)!;
    const at55 = e.corners.find((c) => c.vin === 5.5)!;
    expect(at3.duty).toBeCloseTo(0.75, 4);
    expect(at3.iavg).toBeCloseTo(2, 4);
    expect(at3.ripple).toBeCloseTo(0.5984, 4);
    expect(at3.ipk).toBeCloseTo(2.299, 3);
    expect(at55.duty).toBeCloseTo(0.5417, 4);
    expect(at55.iavg).toBeCloseTo(1.091, 3);
    expect(at55.ripple).toBeCloseTo(0.7923, 4);
    expect(at55.ipk).toBeCloseTo(1.487, 3);
    expect(e.corners[e.worst.irms.cornerIndex]!.vin).toBe(3);
  });
});
