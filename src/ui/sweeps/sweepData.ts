import type { CornerPoint, InductanceCorner, Part, Spec } from "../../engine/types.ts";
import { effectiveTolerance } from "../../engine/cornerPoints.ts";
import { evaluateCorner, preparePart } from "../../engine/evaluateCorner.ts";

export interface SweepPoint {
  x: number;
  /** Largest |i|, A. */
  peak: number | null;
  ripple: number | null;
  loss: number | null;
  rise: number | null;
}

export const STEPS = 25;
/** The load sweep runs past full load, to show the headroom. */
export const LOAD_OVERRUN = 1.25;

function inductanceAt(spec: Spec, part: Part, corner: InductanceCorner): number {
  const t = effectiveTolerance(spec, part);
  return corner === "min" ? part.inductance * (1 - t) : corner === "max" ? part.inductance * (1 + t) : part.inductance;
}

function grid(from: number, to: number, steps: number): number[] {
  if (!(to > from)) return [from];
  return Array.from({ length: steps }, (_, k) => from + ((to - from) * k) / (steps - 1));
}

function solve(spec: Spec, part: Part, points: { x: number; point: CornerPoint }[]): SweepPoint[] {
  const prepared = preparePart(part);
  return points.map(({ x, point }) => {
    const c = evaluateCorner(spec, part, point, prepared);
    if (c.unreachable) return { x, peak: null, ripple: null, loss: null, rise: null };
    return { x, peak: Math.max(c.ipk, -c.ivalley), ripple: c.ripple, loss: c.totalLoss, rise: c.tempRise };
  });
}

/** Peak and ripple across the input range at one load and inductance corner. */
export function vinSweep(spec: Spec, part: Part, inductance: InductanceCorner, load: "min" | "max", steps = STEPS): SweepPoint[] {
  const iout = load === "min" ? spec.iout.min : spec.iout.max;
  const l = inductanceAt(spec, part, inductance);
  return solve(
    spec,
    part,
    grid(spec.vin.min, spec.vin.max, steps).map((vin) => ({ x: vin, point: { vin, iout, vinCorner: "nom", ioutCorner: load, inductanceCorner: inductance, inductance: l } })),
  );
}

/** Loss and temperature rise from light load to past full load at one input voltage. */
export function loadSweep(spec: Spec, part: Part, inductance: InductanceCorner, vinCorner: "min" | "nom" | "max", steps = STEPS): SweepPoint[] {
  const vin = spec.vin[vinCorner];
  const l = inductanceAt(spec, part, inductance);
  const from = spec.iout.min > 0 ? spec.iout.min : 0.02 * spec.iout.max;
  return solve(
    spec,
    part,
    grid(from, spec.iout.max * LOAD_OVERRUN, steps).map((iout) => ({ x: iout, point: { vin, iout, vinCorner, ioutCorner: "max", inductanceCorner: inductance, inductance: l } })),
  );
}
