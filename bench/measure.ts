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
