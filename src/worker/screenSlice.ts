import type { Part, Spec } from "../engine/types.ts";
import { effectiveTolerance, inputVoltagePoints } from "../engine/cornerPoints.ts";
import { CornerSolver, preparePart } from "../engine/evaluateCorner.ts";
import { CornerAccumulator } from "../engine/cornerAccumulator.ts";
import { partChecks } from "../engine/partChecks.ts";
import { minimumMargin, statusOf } from "../engine/evaluatePart.ts";
import { MODE_UNKNOWN, modeCode, statusCode } from "./codes.ts";

/**
 * Figures of parts[from, to): the engine's screenFigures plus what the ranking table also shows
 * (mode at minimum load, the saturation and heating margins apart). It drives the same
 * CornerSolver and CornerAccumulator in the same corner order as screenFigures, so the numbers
 * are the engine's; test/worker/screenSlice.test.ts holds the two side by side. Once the
 * engine's PartFigures carries these three fields this becomes a call to screenFigures.
 */
export interface SliceFigures {
  from: number;
  /** Status codes (see codes.ts). */
  status: Uint8Array;
  failures: Uint8Array;
  peak: Float64Array;
  irms: Float64Array;
  totalLoss: Float64Array;
  tempRise: Float64Array;
  minMargin: Float64Array;
  unreachable: Uint8Array;
  /** Mode code of the first non-CCM corner at minimum load, CCM when all are, MODE_UNKNOWN when none was reachable. */
  lightLoad: Uint8Array;
  /** Isat(T)/max|i| − 1 and Irated/Irms − 1 at the deciding corners, NaN when not checked. */
  satMargin: Float64Array;
  heatMargin: Float64Array;
}

export function emptySlice(from: number, n: number): SliceFigures {
  return {
    from,
    status: new Uint8Array(n),
    failures: new Uint8Array(n),
    peak: new Float64Array(n),
    irms: new Float64Array(n),
    totalLoss: new Float64Array(n),
    tempRise: new Float64Array(n),
    minMargin: new Float64Array(n),
    unreachable: new Uint8Array(n),
    lightLoad: new Uint8Array(n),
    satMargin: new Float64Array(n),
    heatMargin: new Float64Array(n),
  };
}

/** The typed arrays of a slice, for postMessage's transfer list. */
export function sliceBuffers(s: SliceFigures): ArrayBuffer[] {
  return [s.status, s.failures, s.peak, s.irms, s.totalLoss, s.tempRise, s.minMargin, s.unreachable, s.lightLoad, s.satMargin, s.heatMargin].map(
    (a) => a.buffer as ArrayBuffer,
  );
}

/**
 * Screens parts[from, to) into `out` at offset `from − out.from`, so that a worker can fill one
 * slice in several short steps and stay responsive to a newer request in between.
 */
export function screenInto(spec: Spec, parts: readonly Part[], from: number, to: number, out: SliceFigures): void {
  const solver = new CornerSolver(spec);
  const vins = inputVoltagePoints(spec).map((v) => v.vin);
  const loads = spec.iout.min === spec.iout.max ? [spec.iout.max] : [spec.iout.min, spec.iout.max];
  for (let i = from; i < to; i++) {
    const part = parts[i]!;
    const p = i - out.from;
    const prepared = preparePart(part);
    const tolerance = effectiveTolerance(spec, part);
    const factors = tolerance > 0 ? [1 - tolerance, 1, 1 + tolerance] : [1];
    const acc = new CornerAccumulator(spec, part.isat);
    solver.startPart();
    let index = 0;
    let lightReachable = false;
    for (const vin of vins) {
      for (const iout of loads) {
        for (const f of factors) {
          solver.solve(prepared, vin, iout, part.inductance * f);
          if (iout === spec.iout.min && !solver.solution.unreachable) lightReachable = true;
          acc.add(solver.solution, solver, vin, iout, index++);
        }
      }
    }
    const checks = partChecks(spec, part, acc, null);
    out.status[p] = statusCode(statusOf(checks));
    let failed = 0;
    let sat = NaN;
    let heat = NaN;
    for (const c of checks) {
      if (c.status === "fail") failed++;
      if (c.status !== "unchecked" && c.margin !== null) {
        if (c.name === "saturation") sat = c.margin;
        else if (c.name === "heating") heat = c.margin;
      }
    }
    out.failures[p] = failed;
    out.peak[p] = acc.peakAt < 0 ? NaN : acc.peak;
    out.irms[p] = acc.irmsAt < 0 ? NaN : acc.irms;
    out.totalLoss[p] = acc.totalLossAt < 0 ? NaN : acc.totalLoss;
    out.tempRise[p] = acc.tempRiseAt < 0 ? NaN : acc.tempRise;
    out.minMargin[p] = minimumMargin(checks) ?? NaN;
    out.unreachable[p] = acc.firstUnreachable >= 0 ? 1 : 0;
    out.lightLoad[p] = !lightReachable ? MODE_UNKNOWN : acc.lightLoadAt < 0 ? modeCode("ccm") : modeCode(acc.lightLoadMode);
    out.satMargin[p] = sat;
    out.heatMargin[p] = heat;
  }
}

/** Screens a whole slice in one go (tests, small lists). */
export function screenSlice(spec: Spec, parts: readonly Part[], from = 0, to = parts.length): SliceFigures {
  const out = emptySlice(from, Math.max(0, to - from));
  screenInto(spec, parts, from, to, out);
  return out;
}
