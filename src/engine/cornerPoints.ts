import type { CornerPoint, InductanceCorner, Part, Spec } from "./types.ts";

/** Tolerance used for a part: its own, or the spec's assumption when the list gives none. */
export function effectiveTolerance(spec: Spec, part: Part): number {
  return part.tolerance ?? spec.assumedTolerance;
}

/**
 * Input voltages to evaluate. A boost's ripple Vin·(1 − Vin/Vo)/(fsw·L) peaks at Vin = Vo/2, so
 * that point is added when it lies inside the range (derived from the CCM ripple of
 * Erickson & Maksimović ch. 2). Repeated values are evaluated once.
 */
export function inputVoltagePoints(spec: Spec): { vin: number; label: CornerPoint["vinCorner"] }[] {
  const points: { vin: number; label: CornerPoint["vinCorner"] }[] = [];
  const add = (vin: number, label: CornerPoint["vinCorner"]) => {
    if (!points.some((p) => p.vin === vin)) points.push({ vin, label });
  };
  add(spec.vin.min, "min");
  add(spec.vin.nom, "nom");
  add(spec.vin.max, "max");
  if (spec.topology === "boost") {
    const peak = spec.vout / 2;
    if (peak > spec.vin.min && peak < spec.vin.max) add(peak, "peak-ripple");
  }
  return points;
}

/** Every combination of input voltage, load (min, max) and inductance (−tol, nominal, +tol). */
export function cornerPoints(spec: Spec, part: Part): CornerPoint[] {
  const tolerance = effectiveTolerance(spec, part);
  const inductances: { corner: InductanceCorner; value: number }[] =
    tolerance > 0
      ? [
          { corner: "min", value: part.inductance * (1 - tolerance) },
          { corner: "nom", value: part.inductance },
          { corner: "max", value: part.inductance * (1 + tolerance) },
        ]
      : [{ corner: "nom", value: part.inductance }];
  const loads: { iout: number; corner: "min" | "max" }[] =
    spec.iout.min === spec.iout.max
      ? [{ iout: spec.iout.max, corner: "max" }]
      : [
          { iout: spec.iout.min, corner: "min" },
          { iout: spec.iout.max, corner: "max" },
        ];
  const points: CornerPoint[] = [];
  for (const v of inputVoltagePoints(spec)) {
    for (const load of loads) {
      for (const l of inductances) {
        points.push({
          vin: v.vin,
          iout: load.iout,
          vinCorner: v.label,
          ioutCorner: load.corner,
          inductanceCorner: l.corner,
          inductance: l.value,
        });
      }
    }
  }
  return points;
}

/** Readable name of a corner, e.g. "Vin 13.2 V, Iout 3 A, L −20 %". */
export function describeCorner(point: CornerPoint, tolerance: number): string {
  const l =
    point.inductanceCorner === "nom"
      ? "L nominal"
      : `L ${point.inductanceCorner === "min" ? "−" : "+"}${round(tolerance * 100)} %`;
  return `Vin ${round(point.vin)} V, Iout ${round(point.iout)} A, ${l}`;
}

function round(x: number): string {
  return String(Number(x.toPrecision(4)));
}
