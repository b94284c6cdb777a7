import type { ResultStatus } from "./types.ts";

const STATUS_ORDER: Record<ResultStatus, number> = { pass: 0, incomplete: 1, fail: 2 };
const INDEX_BITS = 2 ** 21;
const SCORE_STEPS = 2 ** 20 - 1;
/** Failing parts with fewer failed checks (near misses) come first; 15 or more count alike. */
const FAILURE_CLASSES = 16;

/**
 * Rank order by status (pass, incomplete, fail), then, among failing parts, the number of
 * failed checks (fewest first), then score (high first), ties in list order. Sorts one packed
 * numeric key per part (status · failures · score quantised to 1e-4 · index, 47 bits, exact in a
 * double) with the typed array's native numeric sort instead of a comparator over objects.
 * Lists beyond 2^21 parts fall back to a comparator.
 */
export function rankOrder(status: ArrayLike<ResultStatus>, score: ArrayLike<number>, failures?: ArrayLike<number>): Int32Array {
  const n = status.length;
  const order = new Int32Array(n);
  const failureClass = (i: number) => Math.min(FAILURE_CLASSES - 1, failures?.[i] ?? 0);
  if (n >= INDEX_BITS) {
    const idx = Array.from({ length: n }, (_, i) => i);
    idx.sort(
      (a, b) =>
        STATUS_ORDER[status[a]!] - STATUS_ORDER[status[b]!] || failureClass(a) - failureClass(b) || score[b]! - score[a]! || a - b,
    );
    order.set(idx);
    return order;
  }
  const keys = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const s = score[i]!;
    const q = Number.isFinite(s) ? Math.min(SCORE_STEPS, Math.max(0, Math.round((100 - s) * 1e4))) : SCORE_STEPS;
    // STATUS_ORDER and failureClass written out: a keyed lookup and a call per part cost more than the sort.
    const st = status[i];
    const statusRank = st === "pass" ? 0 : st === "incomplete" ? 1 : 2;
    const f = failures === undefined ? 0 : failures[i]!;
    const failureRank = f < FAILURE_CLASSES - 1 ? f : FAILURE_CLASSES - 1;
    keys[i] = ((statusRank * FAILURE_CLASSES + failureRank) * (SCORE_STEPS + 1) + q) * INDEX_BITS + i;
  }
  keys.sort();
  // The index is the key's low 21 bits; k − ⌊k/2^21⌋·2^21 is exact (k < 2^53) and much quicker than %.
  for (let i = 0; i < n; i++) {
    const k = keys[i]!;
    order[i] = k - Math.floor(k / INDEX_BITS) * INDEX_BITS;
  }
  return order;
}
