import type { Part, ResultStatus, Spec } from "./types.ts";
import { effectiveTolerance, inputVoltagePoints } from "./cornerPoints.ts";
import { CornerSolver, preparePart } from "./evaluateCorner.ts";
import { CornerAccumulator } from "./cornerAccumulator.ts";
import { partChecks } from "./partChecks.ts";
import { minimumMargin, statusOf } from "./evaluatePart.ts";
import { scoreParts } from "./scoreParts.ts";
import { paretoFront } from "./paretoFront.ts";
import { rankOrder } from "./rankOrder.ts";

/**
 * Verdicts and headline figures of every part, in typed arrays indexed like the input list,
 * plus the rank order. Built for large lists: it keeps no corners and writes no reasons;
 * evaluatePart gives the full story of any one part, with the same numbers.
 */
export interface Screening extends PartFigures {
  count: number;
  score: Float64Array;
  pareto: Uint8Array;
  /** order[k] = index of the part ranked k + 1. */
  order: Int32Array;
}

export interface ScreenOptions {
  /** Called every `progressEvery` parts with the number done (for progress bars). */
  onProgress?: (done: number, total: number) => void;
  progressEvery?: number;
}

function volume(part: Part): number | null {
  return part.length !== null && part.width !== null && part.height !== null ? part.length * part.width * part.height : null;
}

/** Per-part verdicts and worst-case figures of a slice of the list, before scoring and ranking. */
export interface PartFigures {
  status: ResultStatus[];
  /** Number of failed checks. */
  failures: Uint8Array;
  /** Worst-case figures (NaN where no corner was reachable; tempRise NaN when not modelled). */
  peak: Float64Array;
  irms: Float64Array;
  totalLoss: Float64Array;
  tempRise: Float64Array;
  /** Smallest current margin (saturation or heating), NaN when unknown. */
  minMargin: Float64Array;
  /** 1 when some corner cannot reach the output. */
  unreachable: Uint8Array;
}

/**
 * Evaluates parts[from, to) at every corner (same order as cornerPoints). Slices can be
 * computed apart (in several workers) and joined with joinFigures before rankFigures.
 */
export function screenFigures(spec: Spec, parts: readonly Part[], from = 0, to = parts.length, options: ScreenOptions = {}): PartFigures {
  const n = Math.max(0, Math.min(to, parts.length) - from);
  const status: ResultStatus[] = new Array<ResultStatus>(n);
  const failures = new Uint8Array(n);
  const peak = new Float64Array(n);
  const irms = new Float64Array(n);
  const totalLoss = new Float64Array(n);
  const tempRise = new Float64Array(n);
  const minMargin = new Float64Array(n);
  const unreachable = new Uint8Array(n);
  const solver = new CornerSolver(spec);
  const vins = inputVoltagePoints(spec).map((v) => v.vin);
  const loads = spec.iout.min === spec.iout.max ? [spec.iout.max] : [spec.iout.min, spec.iout.max];
  const every = options.progressEvery ?? 1000;
  for (let p = 0; p < n; p++) {
    const part = parts[from + p]!;
    const prepared = preparePart(part);
    const tolerance = effectiveTolerance(spec, part);
    const factors = tolerance > 0 ? [1 - tolerance, 1, 1 + tolerance] : [1];
    const acc = new CornerAccumulator(spec, part.isat);
    solver.startPart();
    let index = 0;
    for (const vin of vins) {
      for (const iout of loads) {
        for (const f of factors) {
          solver.solve(prepared, vin, iout, part.inductance * f);
          acc.add(solver.solution, solver, vin, iout, index++);
        }
      }
    }
    const checks = partChecks(spec, part, acc, null);
    status[p] = statusOf(checks);
    let failed = 0;
    for (const c of checks) if (c.status === "fail") failed++;
    failures[p] = failed;
    peak[p] = acc.peakAt < 0 ? NaN : acc.peak;
    irms[p] = acc.irmsAt < 0 ? NaN : acc.irms;
    totalLoss[p] = acc.totalLossAt < 0 ? NaN : acc.totalLoss;
    tempRise[p] = acc.tempRiseAt < 0 ? NaN : acc.tempRise;
    minMargin[p] = minimumMargin(checks) ?? NaN;
    unreachable[p] = acc.firstUnreachable >= 0 ? 1 : 0;
    if (options.onProgress !== undefined && (p + 1) % every === 0) options.onProgress(p + 1, n);
  }
  return { status, failures, peak, irms, totalLoss, tempRise, minMargin, unreachable };
}

/** Joins slices computed in list order. */
export function joinFigures(slices: readonly PartFigures[]): PartFigures {
  const cat = <T extends Float64Array | Uint8Array>(pick: (f: PartFigures) => T, make: (n: number) => T): T => {
    const out = make(slices.reduce((n, f) => n + pick(f).length, 0));
    let at = 0;
    for (const f of slices) {
      out.set(pick(f), at);
      at += pick(f).length;
    }
    return out;
  };
  return {
    status: slices.flatMap((f) => f.status),
    failures: cat((f) => f.failures, (n) => new Uint8Array(n)),
    peak: cat((f) => f.peak, (n) => new Float64Array(n)),
    irms: cat((f) => f.irms, (n) => new Float64Array(n)),
    totalLoss: cat((f) => f.totalLoss, (n) => new Float64Array(n)),
    tempRise: cat((f) => f.tempRise, (n) => new Float64Array(n)),
    minMargin: cat((f) => f.minMargin, (n) => new Float64Array(n)),
    unreachable: cat((f) => f.unreachable, (n) => new Uint8Array(n)),
  };
}

/** Scores, Pareto flags and rank order of a whole list from its figures. */
export function rankFigures(spec: Spec, parts: readonly Part[], figures: PartFigures): Screening {
  const { status, totalLoss, minMargin, unreachable, failures } = figures;
  const anyPass = status.some((s) => s === "pass");
  const reference = status.map((s) => (anyPass ? s === "pass" : true));
  const known = (x: number) => (Number.isFinite(x) ? x : null);
  const score = Float64Array.from(
    scoreParts(
      parts.map((part, i) => ({
        // A part that cannot reach the output at some corner has no meaningful loss figure.
        loss: unreachable[i] ? null : known(totalLoss[i]!),
        footprint: part.length !== null && part.width !== null ? part.length * part.width : null,
        height: part.height,
        price: part.price,
        margin: known(minMargin[i]!),
      })),
      reference,
      spec.weights,
    ),
  );
  // The trade-off front is drawn among the parts that did not fail.
  const front = paretoFront(
    parts.map((_, i) => (status[i] !== "fail" ? known(totalLoss[i]!) : null)),
    parts.map((part, i) => (status[i] !== "fail" ? volume(part) : null)),
  );
  const order = rankOrder(status, score, failures);
  return { count: parts.length, ...figures, score, pareto: Uint8Array.from(front, (f) => (f ? 1 : 0)), order };
}

/** Evaluates every part at every corner and ranks them. */
export function screenParts(spec: Spec, parts: readonly Part[], options: ScreenOptions = {}): Screening {
  const figures = screenFigures(spec, parts, 0, parts.length, options);
  options.onProgress?.(parts.length, parts.length);
  return rankFigures(spec, parts, figures);
}
