import type { Weights } from "./types.ts";

/** The figures a score is built from, one entry per part; NaN where a figure is unknown. */
export interface ScoreColumns {
  /** Worst-case total loss, W. */
  loss: ArrayLike<number>;
  /** Length × width, m². */
  footprint: ArrayLike<number>;
  height: ArrayLike<number>;
  price: ArrayLike<number>;
  /** Smallest current margin, fraction. */
  margin: ArrayLike<number>;
}

/** Margins above this add nothing to the score: 100 % headroom is already ample. */
export const MARGIN_CAP = 1;

/** Smallest (or largest) finite value among the reference parts, NaN when there is none. */
function bestOf(values: ArrayLike<number>, reference: ArrayLike<number>, smallest: boolean, clamp = false): number {
  let best = NaN;
  for (let i = 0; i < values.length; i++) {
    if (reference[i] !== 1) continue;
    let v = values[i]!;
    if (!Number.isFinite(v)) continue;
    if (clamp) v = clampMargin(v);
    if (Number.isNaN(best) || (smallest ? v < best : v > best)) best = v;
  }
  return best;
}

function clampMargin(m: number): number {
  return Math.min(Math.max(m, 0), MARGIN_CAP);
}

/** Cost figure relative to the best: best/x in (0, 1], 0 when unknown. */
function costShare(x: number, best: number): number {
  if (!Number.isFinite(x) || Number.isNaN(best)) return 0;
  if (x <= best || x <= 0) return 1;
  return best <= 0 ? 0 : best / x;
}

/**
 * Score 0–100 (higher is better): the weighted mean of each figure relative to the best value
 * among the reference parts (reference[i] = 1: the passing ones, or all when none pass). Cost
 * figures score best/x; the margin scores min(m, 1)/best. A missing figure scores 0 for that
 * term, so missing data never helps a part.
 */
export function scoreParts(columns: ScoreColumns, reference: ArrayLike<number>, weights: Weights): Float64Array {
  const n = columns.loss.length;
  const scores = new Float64Array(n);
  const total = weights.loss + weights.footprint + weights.height + weights.price + weights.margin;
  if (!(total > 0)) return scores;
  const bestLoss = bestOf(columns.loss, reference, true);
  const bestFootprint = bestOf(columns.footprint, reference, true);
  const bestHeight = bestOf(columns.height, reference, true);
  const bestPrice = bestOf(columns.price, reference, true);
  const bestMargin = bestOf(columns.margin, reference, false, true);
  for (let i = 0; i < n; i++) {
    const raw = columns.margin[i]!;
    const m = Number.isFinite(raw) ? clampMargin(raw) : NaN;
    const marginShare =
      Number.isNaN(m) || Number.isNaN(bestMargin) ? 0 : bestMargin <= 0 ? (m >= bestMargin ? 1 : 0) : Math.min(1, m / bestMargin);
    const sum =
      weights.loss * costShare(columns.loss[i]!, bestLoss) +
      weights.footprint * costShare(columns.footprint[i]!, bestFootprint) +
      weights.height * costShare(columns.height[i]!, bestHeight) +
      weights.price * costShare(columns.price[i]!, bestPrice) +
      weights.margin * marginShare;
    scores[i] = (100 * sum) / total;
  }
  return scores;
}
