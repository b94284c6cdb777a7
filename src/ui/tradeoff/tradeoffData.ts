import type { Part } from "../../engine/types.ts";
import { paretoFront } from "../../engine/paretoFront.ts";
import type { Ranking } from "../../worker/finishRanking.ts";
import { volumeOf } from "../common/format.ts";

export interface TradePoint {
  index: number;
  /** m³ */
  volume: number;
  /** Worst-case total loss, W. */
  loss: number;
  pareto: boolean;
}

/**
 * Worst-case loss against volume for the passing parts (and the incomplete ones when asked),
 * with the front of that very set: a part is marked when no shown part is both smaller and
 * cooler.
 */
export function tradeoffPoints(r: Ranking, parts: readonly Part[], includeIncomplete: boolean): TradePoint[] {
  const points: TradePoint[] = [];
  for (let i = 0; i < r.count; i++) {
    const status = r.status[i];
    if (!(status === 0 || (includeIncomplete && status === 1)) || r.unreachable[i] === 1) continue;
    const loss = r.totalLoss[i]!;
    const volume = volumeOf(parts[i]!);
    if (volume === null || !Number.isFinite(loss) || volume <= 0 || loss <= 0) continue;
    points.push({ index: i, volume, loss, pareto: false });
  }
  const front = paretoFront(
    points.map((p) => p.loss),
    points.map((p) => p.volume),
  );
  points.forEach((p, k) => (p.pareto = front[k] === true));
  return points;
}
