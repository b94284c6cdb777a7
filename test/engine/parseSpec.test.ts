import { describe, expect, it } from "vitest";
import { parseSpec } from "../../src/engine/parseSpec.ts";

const valid = { topology: "buck", vin: { min: 10.8, nom: 12, max: 13.2 }, vout: 3.3, iout: { min: 0.2, max: 3 }, fsw: 500000 };
const keysOf = (input: unknown) => {
  const r = parseSpec(input);
  return r.ok ? [] : r.errors.map((e) => e.key);
};

describe("parseSpec", () => {
  it("parseSpec accepts the documented example and fills defaults", () => {
    const r = parseSpec(valid);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.spec.rectifier).toBe("diode");
      expect(r.spec.targets.saturationMargin).toBe(0.2);
      expect(r.spec.ambient).toBe(25);
    }
  });

  it("parseSpec takes single numbers for vin and iout as one operating point", () => {
    const r = parseSpec({ ...valid, vin: 12, iout: 2 });
    expect(r.ok && r.spec.vin).toEqual({ min: 12, nom: 12, max: 12 });
    expect(r.ok && r.spec.iout).toEqual({ min: 2, max: 2 });
  });

  it("parseSpec fills a missing vin.nom with the midpoint", () => {
    const r = parseSpec({ ...valid, vin: { min: 10, max: 14 } });
    expect(r.ok && r.spec.vin.nom).toBe(12);
  });

  it("parseSpec refuses vout ≥ vin for a buck naming vout", () => {
    expect(keysOf({ ...valid, vout: 11 })).toEqual(["vout"]);
  });

  it("parseSpec refuses vout ≤ vin for a boost naming vout", () => {
    expect(keysOf({ ...valid, topology: "boost", vout: 12 })).toEqual(["vout"]);
  });

  it("parseSpec refuses zero fsw, negative currents and unknown keys, naming each key", () => {
    expect(keysOf({ ...valid, fsw: 0 })).toEqual(["fsw"]);
    expect(keysOf({ ...valid, iout: { min: -1, max: 3 } })).toEqual(["iout.min"]);
    expect(keysOf({ ...valid, colour: "red" })).toEqual(["colour"]);
    expect(keysOf({ ...valid, targets: { ripple: 0.3 } })).toEqual(["targets.ripple"]);
    expect(keysOf({ ...valid, topology: "flyback" })).toEqual(["topology"]);
  });

  it("parseSpec refuses min above max", () => {
    expect(keysOf({ ...valid, vin: { min: 14, nom: 12, max: 13 } })).toContain("vin");
    expect(keysOf({ ...valid, targets: { rippleRatio: { min: 0.5, max: 0.3 } } })).toEqual(["targets.rippleRatio"]);
  });
});
