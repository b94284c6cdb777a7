import type { Mode, Part, ResultStatus, Spec } from "./types.ts";
import { effectiveTolerance, inputVoltagePoints } from "./cornerPoints.ts";
import { type CornerAt, CornerSolver, preparePart, type PreparedPart } from "./evaluateCorner.ts";
import { CornerAccumulator } from "./cornerAccumulator.ts";
import { CheckBuffer, judgeChecks } from "./partChecks.ts";
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

/** The verdict and headline figures of one part, as screenFigures and the ranking worker store them. */
export interface PartVerdict {
  status: ResultStatus;
  failures: number;
  /** Worst-case figures, NaN where no corner was reachable (tempRise NaN when not modelled). */
  peak: number;
  irms: number;
  totalLoss: number;
  tempRise: number;
  /** Smallest current margin, and the saturation and heating margins apart; NaN when unknown. */
  minMargin: number;
  saturationMargin: number;
  heatingMargin: number;
  unreachable: boolean;
  /** Mode of the first non-CCM corner at minimum load, "ccm" when all are, null when none was reachable. */
  lightLoadMode: Mode | null;
}

let lastGridSpec: Spec | null = null;
let lastGrid = { vins: [] as number[], loads: [] as number[] };

/** Input voltages and loads of a spec in the order of cornerPoints (kept for the spec last asked about). */
function cornerGrid(spec: Spec): { vins: number[]; loads: number[] } {
  if (spec !== lastGridSpec) {
    lastGrid = {
      vins: inputVoltagePoints(spec).map((p) => p.vin),
      loads: spec.iout.min === spec.iout.max ? [spec.iout.max] : [spec.iout.min, spec.iout.max],
    };
    lastGridSpec = spec;
  }
  return lastGrid;
}

/**
 * Judges parts one at a time at every corner (the order of cornerPoints), without reasons: the
 * single loop behind screenFigures and the browser's ranking worker, so both give evaluatePart's
 * numbers. It keeps one solver, accumulator and verdict for all parts, and screen() returns the
 * same verdict object every time, to be read before the next call.
 *
 * Keep one screener per thread and aim() it at each new spec rather than making one per list or
 * per step: V8 embeds the objects of a hot loop's screener in the optimised code, and when such
 * a screener died every hot function was deoptimised at the next full collection (hundreds of
 * "weak objects" deoptimisations a run, about half the speed).
 */
export class PartScreener {
  private spec: Spec;
  private readonly solver: CornerSolver;
  private readonly acc: CornerAccumulator;
  private readonly checks = new CheckBuffer();
  private prepared: PreparedPart | undefined;
  // The corner being solved, handed over by reference: V8 boxes each double passed to a call it
  // does not inline (solve and add are too large), while this record's fields are updated in place.
  private readonly at: CornerAt = { vin: 0, iout: 0, inductance: 0 };
  private readonly verdict: PartVerdict = {
    status: "pass",
    failures: 0,
    peak: 0,
    irms: 0,
    totalLoss: 0,
    tempRise: 0,
    minMargin: 0,
    saturationMargin: 0,
    heatingMargin: 0,
    unreachable: false,
    lightLoadMode: null,
  };

  constructor(spec: Spec) {
    this.spec = spec;
    this.solver = new CornerSolver(spec);
    this.acc = new CornerAccumulator(spec, null);
  }

  /** Judges the next parts against `spec`; cheap when it is the spec already aimed at. */
  aim(spec: Spec): this {
    if (spec !== this.spec) {
      this.spec = spec;
      this.solver.setSpec(spec);
    }
    return this;
  }

  screen(part: Part): PartVerdict {
    const { spec, solver, acc, verdict } = this;
    const prepared = (this.prepared = preparePart(part, this.prepared));
    const tolerance = effectiveTolerance(spec, part);
    acc.reset(part.isat, spec);
    const { vins, loads } = cornerGrid(spec);
    const at = this.at;
    solver.startPart();
    let index = 0;
    let lightReachable = false;
    for (const vin of vins) {
      for (const iout of loads) {
        for (let k = tolerance > 0 ? -1 : 0; k <= (tolerance > 0 ? 1 : 0); k++) {
          at.vin = vin;
          at.iout = iout;
          at.inductance = part.inductance * (1 + k * tolerance);
          solver.solve(prepared, at);
          if (iout === spec.iout.min && !solver.solution.unreachable) lightReachable = true;
          acc.add(solver.solution, solver, at, index++);
        }
      }
    }
    judgeChecks(spec, part, acc, this.checks);
    const { items: checks, length: count } = this.checks;
    let failures = 0;
    let saturationMargin = NaN;
    let heatingMargin = NaN;
    for (let k = 0; k < count; k++) {
      const c = checks[k]!;
      if (c.status === "fail") failures++;
      if (c.status !== "unchecked" && c.margin !== null) {
        if (c.name === "saturation") saturationMargin = c.margin;
        else if (c.name === "heating") heatingMargin = c.margin;
      }
    }
    verdict.status = statusOf(checks, count);
    verdict.failures = failures;
    verdict.peak = acc.peakAt < 0 ? NaN : acc.peak;
    verdict.irms = acc.irmsAt < 0 ? NaN : acc.irms;
    verdict.totalLoss = acc.totalLossAt < 0 ? NaN : acc.totalLoss;
    verdict.tempRise = acc.tempRiseAt < 0 ? NaN : acc.tempRise;
    verdict.minMargin = minimumMargin(checks, count) ?? NaN;
    verdict.saturationMargin = saturationMargin;
    verdict.heatingMargin = heatingMargin;
    verdict.unreachable = acc.firstUnreachable >= 0;
    verdict.lightLoadMode = !lightReachable ? null : acc.lightLoadAt < 0 ? "ccm" : acc.lightLoadMode;
    return verdict;
  }
}

/** Figures for n parts, to be filled in (status entries unset). */
export function emptyFigures(n: number): PartFigures {
  return {
    status: new Array<ResultStatus>(n),
    failures: new Uint8Array(n),
    peak: new Float64Array(n),
    irms: new Float64Array(n),
    totalLoss: new Float64Array(n),
    tempRise: new Float64Array(n),
    minMargin: new Float64Array(n),
    unreachable: new Uint8Array(n),
  };
}

/**
 * Evaluates parts[from, to) at every corner. Slices can be computed apart (in several workers)
 * and joined with joinFigures before rankFigures.
 */
export function screenFigures(spec: Spec, parts: readonly Part[], from = 0, to = parts.length, options: ScreenOptions = {}): PartFigures {
  const figures = emptyFigures(Math.max(0, Math.min(to, parts.length) - from));
  // One screener for the thread (see PartScreener); a call from within onProgress gets its own.
  const screener = idleScreener?.aim(spec) ?? new PartScreener(spec);
  idleScreener = null;
  try {
    fillFigures(screener, parts, from, figures, options);
  } finally {
    idleScreener = screener;
  }
  return figures;
}

let idleScreener: PartScreener | null = null;

function fillFigures(screener: PartScreener, parts: readonly Part[], from: number, out: PartFigures, options: ScreenOptions): void {
  const n = out.failures.length;
  const every = options.progressEvery ?? 1000;
  for (let p = 0; p < n; p++) {
    const v = screener.screen(parts[from + p]!);
    out.status[p] = v.status;
    out.failures[p] = v.failures;
    out.peak[p] = v.peak;
    out.irms[p] = v.irms;
    out.totalLoss[p] = v.totalLoss;
    out.tempRise[p] = v.tempRise;
    out.minMargin[p] = v.minMargin;
    out.unreachable[p] = v.unreachable ? 1 : 0;
    if (options.onProgress !== undefined && (p + 1) % every === 0) options.onProgress(p + 1, n);
  }
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

/** The figures of a list that do not depend on the spec (NaN where unknown). */
interface PartColumns {
  footprint: Float64Array;
  height: Float64Array;
  price: Float64Array;
  volume: Float64Array;
}

/**
 * Kept per list: a list is re-ranked at every spec change, and reading 100 000 parts again costs
 * more than scoring them. Lists are not edited in place once ranked (the app builds a new array
 * for every change of its catalog); a list that grew is read again.
 */
const columnsOfList = new WeakMap<readonly Part[], PartColumns>();

function partColumns(parts: readonly Part[]): PartColumns {
  const known = columnsOfList.get(parts);
  if (known !== undefined && known.volume.length === parts.length) return known;
  const n = parts.length;
  const columns = { footprint: new Float64Array(n), height: new Float64Array(n), price: new Float64Array(n), volume: new Float64Array(n) };
  for (let i = 0; i < n; i++) {
    const part = parts[i]!;
    columns.footprint[i] = part.length !== null && part.width !== null ? part.length * part.width : NaN;
    columns.height[i] = part.height ?? NaN;
    columns.price[i] = part.price ?? NaN;
    columns.volume[i] = volume(part) ?? NaN;
  }
  columnsOfList.set(parts, columns);
  return columns;
}

/** Scores, Pareto flags and rank order of a whole list from its figures. */
export function rankFigures(spec: Spec, parts: readonly Part[], figures: PartFigures): Screening {
  const { status, totalLoss, minMargin, unreachable, failures } = figures;
  const n = parts.length;
  const { footprint, height, price, volume: partVolume } = partColumns(parts);
  let anyPass = false;
  for (let i = 0; i < n && !anyPass; i++) anyPass = status[i] === "pass";
  const reference = new Uint8Array(n);
  const loss = new Float64Array(n);
  // The trade-off front is drawn among the parts that did not fail.
  const frontLoss = new Float64Array(n);
  const frontVolume = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const s = status[i];
    reference[i] = !anyPass || s === "pass" ? 1 : 0;
    // A part that cannot reach the output at some corner has no meaningful loss figure.
    loss[i] = unreachable[i] ? NaN : totalLoss[i]!;
    const counted = s !== "fail";
    frontLoss[i] = counted ? totalLoss[i]! : NaN;
    frontVolume[i] = counted ? partVolume[i]! : NaN;
  }
  const score = scoreParts({ loss, footprint, height, price, margin: minMargin }, reference, spec.weights);
  const front = paretoFront(frontLoss, frontVolume);
  const order = rankOrder(status, score, failures);
  const pareto = new Uint8Array(n);
  for (let i = 0; i < n; i++) if (front[i]) pareto[i] = 1;
  return { count: n, ...figures, score, pareto, order };
}

/** Evaluates every part at every corner and ranks them. */
export function screenParts(spec: Spec, parts: readonly Part[], options: ScreenOptions = {}): Screening {
  const figures = screenFigures(spec, parts, 0, parts.length, options);
  options.onProgress?.(parts.length, parts.length);
  return rankFigures(spec, parts, figures);
}
