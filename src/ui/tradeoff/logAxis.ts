import { niceTicks } from "../common/niceTicks.ts";

/** A base-10 log axis over [min, max] mapped to pixels [a, b], with 1-2-5 tick labels per decade. */
export interface LogAxis {
  toPixel(v: number): number;
  ticks: { value: number; major: boolean }[];
}

export function logAxis(min: number, max: number, a: number, b: number): LogAxis {
  let lo = Math.log10(min);
  let hi = Math.log10(max);
  if (!(hi - lo > 0.3)) {
    const mid = (lo + hi) / 2;
    lo = mid - 0.3;
    hi = mid + 0.3;
  }
  lo -= 0.05 * (hi - lo);
  hi += 0.05 * (hi - lo);
  const toPixel = (v: number) => a + ((Math.log10(v) - lo) / (hi - lo)) * (b - a);
  const ticks: { value: number; major: boolean }[] = [];
  for (let d = Math.floor(lo); d <= Math.ceil(hi); d++) {
    for (const m of [1, 2, 5]) {
      const value = m * 10 ** d;
      const l = Math.log10(value);
      if (l >= lo && l <= hi) ticks.push({ value, major: m === 1 });
    }
  }
  if (ticks.filter((t) => t.major).length < 2) {
    // Less than a decade: label a linear 1-2-5 set inside it instead.
    const inside = niceTicks(10 ** lo, 10 ** hi, 5).filter((v) => v > 0 && Math.log10(v) >= lo && Math.log10(v) <= hi);
    return { toPixel, ticks: inside.map((value) => ({ value, major: true })) };
  }
  return { toPixel, ticks };
}
