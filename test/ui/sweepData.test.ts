import { describe, expect, it } from "vitest";
import { evaluatePart } from "../../src/engine/evaluatePart.ts";
import { loadSweep, vinSweep, LOAD_OVERRUN, STEPS } from "../../src/ui/sweeps/sweepData.ts";
import { demoSpec, part } from "./fixtures.ts";

const p = part("HV-DRS12060-6U8");

describe("sweepData", () => {
  it("vinSweep(−tol, full load) spans the input range and meets the part's own corners at its ends", () => {
    const points = vinSweep(demoSpec, p, "min", "max");
    expect(points).toHaveLength(STEPS);
    expect(points[0]!.x).toBe(demoSpec.vin.min);
    expect(points.at(-1)!.x).toBe(demoSpec.vin.max);
    const corner = evaluatePart(demoSpec, p).corners.find((c) => c.vinCorner === "max" && c.ioutCorner === "max" && c.inductanceCorner === "min")!;
    // Same corner; the thermal fixed point starts from another guess, so agreement is to its tolerance.
    expect(Math.abs(points.at(-1)!.ripple! / corner.ripple - 1)).toBeLessThan(1e-5);
    // A buck's ripple grows with the input voltage.
    expect(points.at(-1)!.ripple!).toBeGreaterThan(points[0]!.ripple!);
  });

  it("loadSweep runs from light load past full load, loss rising with the load", () => {
    const points = loadSweep(demoSpec, p, "nom", "nom");
    expect(points[0]!.x).toBe(demoSpec.iout.min);
    expect(points.at(-1)!.x).toBeCloseTo(demoSpec.iout.max * LOAD_OVERRUN, 12);
    expect(points.at(-1)!.loss!).toBeGreaterThan(points[0]!.loss!);
  });
});
