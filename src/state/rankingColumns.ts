import type { Part } from "../engine/types.ts";
import type { Ranking } from "../worker/finishRanking.ts";

/** A sort key: numbers sort numerically, strings by locale; null (no data) always sorts last. */
export type SortKey = (index: number, parts: readonly Part[], r: Ranking) => number | string | null;

const num = (x: number | null | undefined) => (x === null || x === undefined || Number.isNaN(x) ? null : x);
const volume = (p: Part) => (p.length !== null && p.width !== null && p.height !== null ? p.length * p.width * p.height : null);

/** Sort keys of the ranking table's columns, by column id. */
export const SORT_KEYS: Readonly<Record<string, SortKey>> = {
  rank: (i, _p, r) => r.rankOf[i] ?? null,
  part: (i, p) => p[i]?.partNumber ?? null,
  maker: (i, p) => p[i]?.maker ?? null,
  inductance: (i, p) => num(p[i]?.inductance),
  dcr: (i, p) => num(p[i]?.dcrMax ?? p[i]?.dcrTyp),
  isat: (i, p) => num(p[i]?.isat),
  rated: (i, p) => num(p[i]?.irms),
  size: (i, p) => (p[i] === undefined ? null : volume(p[i])),
  peak: (i, _p, r) => num(r.peak[i]),
  rms: (i, _p, r) => num(r.irms[i]),
  loss: (i, _p, r) => num(r.totalLoss[i]),
  rise: (i, _p, r) => num(r.tempRise[i]),
  satMargin: (i, _p, r) => num(r.satMargin[i]),
  heatMargin: (i, _p, r) => num(r.heatMargin[i]),
  lightLoad: (i, _p, r) => (r.lightLoad[i] === 255 ? null : (r.lightLoad[i] ?? null)),
  score: (i, _p, r) => num(r.score[i]),
  result: (i, _p, r) => (r.status[i] ?? 2) * 100 + (r.failures[i] ?? 0),
};
