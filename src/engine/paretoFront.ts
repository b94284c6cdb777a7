/**
 * Flags the points not dominated on two costs to minimise (no other point is at least as good
 * on both and better on one). Points with a missing cost are never on the front. O(n log n).
 */
export function paretoFront(costA: ArrayLike<number | null>, costB: ArrayLike<number | null>): boolean[] {
  const n = costA.length;
  const flags = new Array<boolean>(n).fill(false);
  const order: number[] = [];
  for (let i = 0; i < n; i++) {
    const a = costA[i];
    const b = costB[i];
    if (a !== null && a !== undefined && b !== null && b !== undefined && Number.isFinite(a) && Number.isFinite(b)) order.push(i);
  }
  order.sort((p, q) => (costA[p] as number) - (costA[q] as number) || (costB[p] as number) - (costB[q] as number));
  let bestB = Infinity;
  for (let k = 0; k < order.length; k++) {
    const i = order[k]!;
    const b = costB[i] as number;
    const previous = k > 0 ? order[k - 1]! : -1;
    if (b < bestB) {
      flags[i] = true;
      bestB = b;
    } else if (previous >= 0 && flags[previous] && costA[previous] === costA[i] && costB[previous] === b) {
      // An identical point is as undominated as its twin.
      flags[i] = true;
    }
  }
  return flags;
}
