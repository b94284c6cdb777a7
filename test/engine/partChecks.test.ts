import { describe, expect, it } from "vitest";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { evaluatePart } from "../../src/engine/evaluatePart.ts";

const spec = makeSpec({
  topology: "buck",
  vin: { min: 10.8, nom: 12, max: 13.2 },
  vout: 3.3,
  iout: { min: 0.2, max: 3 },
  fsw: 500e3,
  ambient: 40,
});

const good = completePart({
  partNumber: "GOOD",
  // Inside the ripple band of this spec (about 5.0–6.6 µH nominal for ±20 %).
  inductance: 5.6e-6,
  tolerance: 0.2,
  dcrTyp: 0.02,
  dcrMax: 0.024,
  isat: 7,
  irms: 5,
  srf: 40e6,
  length: 5e-3,
  width: 5e-3,
  height: 3e-3,
  price: 0.3,
});

const checkOf = (e: ReturnType<typeof evaluatePart>, name: string) => e.checks.find((c) => c.name === name)!;

describe("partChecks", () => {
  it("evaluatePart passes a part with margin on every check", () => {
    const e = evaluatePart(spec, good);
    expect(e.failures).toEqual([]);
    expect(e.status).toBe("pass");
  });

  it("evaluatePart fails saturation with a reason naming the corner and the Isat needed", () => {
    const e = evaluatePart(spec, { ...good, isat: 3.4 });
    const c = checkOf(e, "saturation");
    expect(c.status).toBe("fail");
    expect(c.reason).toMatch(/Vin 13\.2 V, Iout 3 A, L −20 %/);
    expect(c.reason).toMatch(/needs Isat ≥/);
    expect(e.status).toBe("fail");
  });

  it("evaluatePart reports missing Isat, rating and SRF as not checked, never as a pass", () => {
    const e = evaluatePart(spec, { ...good, isat: null, irms: null, srf: null });
    expect(checkOf(e, "saturation").status).toBe("unchecked");
    expect(checkOf(e, "saturation").reason).toMatch(/not checked \(no data\)/);
    expect(checkOf(e, "heating").status).toBe("unchecked");
    expect(checkOf(e, "srf").reason).toMatch(/not rated/);
    expect(e.status).toBe("incomplete");
    expect(e.unchecked.length).toBeGreaterThanOrEqual(3);
  });

  it("evaluatePart fails the ripple window when L is too large for the minimum ripple ratio", () => {
    const e = evaluatePart(spec, { ...good, inductance: 22e-6 });
    expect(checkOf(e, "rippleRatio").status).toBe("fail");
    expect(checkOf(e, "rippleRatio").reason).toMatch(/outside 0\.2–0\.4/);
  });

  it("evaluatePart with lightLoadMode ccm fails a part that enters DCM at minimum load and names the corner", () => {
    const strict = makeSpec({ ...spec, targets: { lightLoadMode: "ccm" } });
    const c = checkOf(evaluatePart(strict, good), "lightLoadMode");
    expect(c.status).toBe("fail");
    expect(c.reason).toMatch(/DCM at Vin .* Iout 0\.2 A/);
  });

  it("evaluatePart fails heating when the rated current is below the RMS current", () => {
    expect(checkOf(evaluatePart(spec, { ...good, irms: 2 }), "heating").status).toBe("fail");
  });

  it("evaluatePart applies size and price limits only when set, and marks missing dimensions unchecked", () => {
    const limited = makeSpec({ ...spec, targets: { maxHeight: 2e-3, maxPrice: 1 } });
    expect(checkOf(evaluatePart(limited, good), "height").status).toBe("fail");
    expect(checkOf(evaluatePart(limited, good), "price").status).toBe("pass");
    expect(checkOf(evaluatePart(limited, { ...good, height: null }), "height").status).toBe("unchecked");
    expect(evaluatePart(spec, good).checks.some((c) => c.name === "height")).toBe(false);
  });

  it("evaluatePart fails SRF below k·fsw", () => {
    expect(checkOf(evaluatePart(spec, { ...good, srf: 3e6 }), "srf").status).toBe("fail");
  });

  it("evaluatePart uses the hot saturation current at the solved temperature", () => {
    const coolIsat = evaluatePart(spec, { ...good, isat: 4.4 });
    const hotIsat = evaluatePart(spec, { ...good, isat: 4.4, isatHot: 3.2, isatHotTemp: 100 });
    expect(checkOf(coolIsat, "saturation").status).toBe("pass");
    expect(checkOf(hotIsat, "saturation").status).toBe("fail");
    expect(checkOf(hotIsat, "saturation").reason).toMatch(/°C/);
  });
});
