/** Bench helpers: median of timed runs after a warm-up, each after a forced GC and a pause (DESIGN.md §Benchmarks). */
const gc = (globalThis as { gc?: () => void }).gc;

export async function settle(ms = 400): Promise<void> {
  gc?.();
  await new Promise((resolve) => setTimeout(resolve, ms));
}

export async function medianMs(run: () => unknown, runs = 5, warmups = 1): Promise<number> {
  for (let w = 0; w < warmups; w++) run();
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    await settle();
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}

export function gcAvailable(): boolean {
  return gc !== undefined;
}

/** Small deterministic generator (mulberry32), so every run ranks the same list. */
export function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
