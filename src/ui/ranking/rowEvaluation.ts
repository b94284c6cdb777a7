import { useSyncExternalStore } from "react";
import type { Part, Spec } from "../../engine/types.ts";
import { evaluatePart, type PartEvaluation } from "../../engine/evaluatePart.ts";

/**
 * Full evaluations (with reasons) of the rows on screen. The screening behind the table writes
 * no reasons, so a row asks for its evaluation when it shows; they are computed just after the
 * frame is painted, newest requests first and a few milliseconds at a time, so a new ranking or
 * a fling through 100 000 rows paints first and the reasons follow. Each row re-renders only
 * when its own evaluation arrives.
 */
const BUDGET_MS = 8;
/** Rows asked for beyond this many have long scrolled out of view: they are not computed. */
const MAX_WANTED = 60;

let cacheFor = -1;
const cache = new Map<number, PartEvaluation>();
const wanted = new Map<number, { spec: Spec; part: Part }>();
const listeners = new Set<() => void>();
let scheduled = false;

function compute(): void {
  scheduled = false;
  const start = performance.now();
  const queue = [...wanted.entries()].reverse().slice(0, MAX_WANTED);
  wanted.clear();
  let k = 0;
  for (; k < queue.length && performance.now() - start < BUDGET_MS; k++) {
    const [index, { spec, part }] = queue[k]!;
    cache.set(index, evaluatePart(spec, part));
  }
  for (const [index, job] of queue.slice(k).reverse()) wanted.set(index, job);
  if (wanted.size > 0) schedule();
  for (const l of listeners) l();
}

function schedule(): void {
  if (scheduled) return;
  scheduled = true;
  // rAF runs before the next paint; the task it queues runs after it.
  requestAnimationFrame(() => setTimeout(compute, 0));
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

function request(serial: number, spec: Spec, part: Part, index: number): void {
  if (serial !== cacheFor) {
    cache.clear();
    wanted.clear();
    cacheFor = serial;
  }
  if (cache.has(index)) return;
  wanted.delete(index);
  wanted.set(index, { spec, part });
  schedule();
}

/** The row's evaluation once it is ready (null until then); asks for it if needed. */
export function useRowEvaluation(serial: number, spec: Spec, part: Part, index: number): PartEvaluation | null {
  request(serial, spec, part, index);
  return useSyncExternalStore(subscribe, () => (serial === cacheFor ? (cache.get(index) ?? null) : null));
}

/** The reasons of a verdict, one a line, for the row's tooltip. */
export function reasonLines(e: PartEvaluation): string[] {
  if (e.status === "pass") return ["✓ every check passed"];
  return [...e.failures.map((f) => `✗ ${f}`), ...e.unchecked.map((u) => `– ${u}`)];
}
