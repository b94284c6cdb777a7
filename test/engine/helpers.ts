import type { CornerPoint, Spec } from "../../src/engine/types.ts";
import { makeSpec, type SpecInput } from "../../src/engine/specDefaults.ts";
import { completePart, type PartInput } from "../../src/engine/partDefaults.ts";
import { evaluateCorner } from "../../src/engine/evaluateCorner.ts";

/** A single operating point at nominal inductance. */
export function point(vin: number, iout: number, inductance: number): CornerPoint {
  return { vin, iout, vinCorner: "nom", ioutCorner: "max", inductanceCorner: "nom", inductance };
}

/** Solves one corner of a constant-L part (no Isat given) unless the part says otherwise. */
export function solve(specInput: SpecInput, partInput: Partial<PartInput> & { inductance: number }) {
  const spec: Spec = makeSpec(specInput);
  const part = completePart({ partNumber: "TEST-1", tolerance: 0, ...partInput });
  const vin = typeof specInput.vin === "number" ? specInput.vin : specInput.vin.nom;
  const iout = typeof specInput.iout === "number" ? specInput.iout : specInput.iout.max;
  return evaluateCorner(spec, part, point(vin, iout, partInput.inductance));
}

/** |actual − expected| ≤ rel·|expected|, for check values quoted to 4 significant figures. */
export function near(actual: number, expected: number, rel = 6e-4): boolean {
  return Math.abs(actual - expected) <= rel * Math.abs(expected);
}
