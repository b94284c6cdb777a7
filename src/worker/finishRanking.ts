import type { Part, Spec } from "../engine/types.ts";
import { rankFigures } from "../engine/screenParts.ts";
import { emptySlice, sliceBuffers, type SliceFigures } from "./screenSlice.ts";
import { STATUS_CODES, statusOfCode } from "./codes.ts";

/** A whole list screened and ranked: every figure indexed like the merged part list. */
export interface Ranking extends Omit<SliceFigures, "from"> {
  count: number;
  score: Float64Array;
  pareto: Uint8Array;
  /** order[k] = index of the part ranked k + 1. */
  order: Int32Array;
  /** rankOf[index] = k, the inverse of order. */
  rankOf: Int32Array;
  passCount: number;
}

/** Joins slices (any order, together covering [0, count)) into one set of figures. */
export function joinSlices(slices: readonly SliceFigures[], count: number): SliceFigures {
  const all = emptySlice(0, count);
  for (const s of slices) {
    all.status.set(s.status, s.from);
    all.failures.set(s.failures, s.from);
    all.peak.set(s.peak, s.from);
    all.irms.set(s.irms, s.from);
    all.totalLoss.set(s.totalLoss, s.from);
    all.tempRise.set(s.tempRise, s.from);
    all.minMargin.set(s.minMargin, s.from);
    all.unreachable.set(s.unreachable, s.from);
    all.lightLoad.set(s.lightLoad, s.from);
    all.satMargin.set(s.satMargin, s.from);
    all.heatMargin.set(s.heatMargin, s.from);
  }
  return all;
}

/**
 * Scores and ranks the joined figures with the engine's rankFigures: scores are relative to the
 * best passing part of the whole list, so they can only be computed once every slice is in.
 */
export function finishRanking(spec: Spec, parts: readonly Part[], slices: readonly SliceFigures[]): Ranking {
  const all = joinSlices(slices, parts.length);
  const status = Array.from(all.status, statusOfCode);
  const ranked = rankFigures(spec, parts, {
    status,
    failures: all.failures,
    peak: all.peak,
    irms: all.irms,
    totalLoss: all.totalLoss,
    tempRise: all.tempRise,
    minMargin: all.minMargin,
    unreachable: all.unreachable,
  });
  const rankOf = new Int32Array(parts.length);
  const order = ranked.order;
  for (let k = 0; k < order.length; k++) rankOf[order[k]!] = k;
  let passCount = 0;
  const pass = STATUS_CODES.indexOf("pass");
  for (const code of all.status) if (code === pass) passCount++;
  const { from: _from, ...figures } = all;
  return { ...figures, count: parts.length, score: ranked.score, pareto: ranked.pareto, order: ranked.order, rankOf, passCount };
}

/** The typed arrays of a ranking, for postMessage's transfer list. */
export function rankingBuffers(r: Ranking): ArrayBuffer[] {
  return [...sliceBuffers({ ...r, from: 0 }), r.score.buffer as ArrayBuffer, r.pareto.buffer as ArrayBuffer, r.order.buffer as ArrayBuffer, r.rankOf.buffer as ArrayBuffer];
}
