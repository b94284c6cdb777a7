import type { Weights } from "./types.ts";

export interface ScoreInputs {
  /** Worst-case total loss, W. */
  loss: number | null;
  /** Length × width, m². */
  footprint: number | null;
  height: number | null;
  price: number | null;
  /** Smallest current margin, fraction. */
  margin: number | null;
}

/** Margins above this add nothing to the score: 100 % headroom is already ample. */
export const MARGIN_CAP = 1;

function bestOf(values: (number | null)[], reference: boolean[], smallest: boolean): number | null {
  let best: number | null = null;
  values.forEach((v, i) => {
    if (!reference[i] || v === null || !Number.isFinite(v)) return;
    if (best === null || (smallest ? v < best : v > best)) best = v;
  });
  return best;
}

/** Cost figure relative to the best: best/x in (0, 1], 0 when unknown. */
function costShare(x: number | null, best: number | null): number {
  if (x === null || !Number.isFinite(x) || best === null) return 0;
  if (x <= best || x <= 0) return 1;
  return best <= 0 ? 0 : best / x;
}

/**
 * Score 0–100 (higher is better): the weighted mean of each figure relative to the best value
 * among the reference parts (the passing ones, or all when none pass). Cost figures score best/x;
 * the margin scores min(m, 1)/best. A missing figure scores 0 for that term, so missing data
 * never helps a part.
 */
export function scoreParts(items: ScoreInputs[], reference: boolean[], weights: Weights): number[] {
  const margins = items.map((it) => (it.margin === null ? null : Math.min(Math.max(it.margin, 0), MARGIN_CAP)));
  const best = {
    loss: bestOf(items.map((it) => it.loss), reference, true),
    footprint: bestOf(items.map((it) => it.footprint), reference, true),
    height: bestOf(items.map((it) => it.height), reference, true),
    price: bestOf(items.map((it) => it.price), reference, true),
    margin: bestOf(margins, reference, false),
  };
  const total = weights.loss + weights.footprint + weights.height + weights.price + weights.margin;
  if (!(total > 0)) return items.map(() => 0);
  return items.map((it, i) => {
    const m = margins[i] ?? null;
    const marginShare = m === null || best.margin === null ? 0 : best.margin <= 0 ? (m >= best.margin ? 1 : 0) : Math.min(1, m / best.margin);
    const sum =
      weights.loss * costShare(it.loss, best.loss) +
      weights.footprint * costShare(it.footprint, best.footprint) +
      weights.height * costShare(it.height, best.height) +
      weights.price * costShare(it.price, best.price) +
      weights.margin * marginShare;
    return (100 * sum) / total;
  });
}
