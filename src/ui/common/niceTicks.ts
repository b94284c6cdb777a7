/** Axis ticks on a 1-2-5 step that cover [low, high], about `count` of them. */
export function niceTicks(low: number, high: number, count = 6): number[] {
  if (!Number.isFinite(low) || !Number.isFinite(high)) return [0, 1];
  if (high <= low) high = low + (Math.abs(low) || 1);
  const raw = (high - low) / Math.max(1, count - 1);
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  // A step a little under the raw one is allowed: one or two extra ticks read better than a half-empty axis.
  const step = [1, 2, 2.5, 5, 10].map((m) => m * magnitude).find((s) => s >= 0.75 * raw) ?? 10 * magnitude;
  const first = Math.floor(low / step + 1e-9) * step;
  const ticks: number[] = [];
  for (let t = first; t <= high + step * 1e-9 + step; t += step) {
    ticks.push(Number(t.toPrecision(12)));
    if (t >= high - step * 1e-9) break;
  }
  return ticks;
}

export const tickText = (v: number) => String(Number(v.toPrecision(3)));
