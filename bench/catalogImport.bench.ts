/**
 * Catalog import throughput: importPartList on a generated 100 000-row list (~10 MB) beside a
 * raw papaparse parse of the same text in the same run (the floor), median of 7 timed runs after
 * a warm-up. Each timed run follows a forced GC and a 500 ms pause: on 2-core machines a run
 * right after a collection can be several times slow. Figures only, never pass/fail.
 */
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import Papa from "papaparse";
import { importPartList } from "../src/catalog/importPartList.ts";
import { generateDemoParts, mainCsv } from "../sample-parts/generate.ts";

const ROWS = 100_000;
const RUNS = 7;
const PAUSE_MS = 500;

function makeList(rows: number): string {
  const demo = mainCsv(generateDemoParts()).trimEnd().split("\n");
  const header = demo[0] as string;
  const body = demo.slice(1);
  const lines: string[] = [header];
  for (let i = 0; i < rows; i++) {
    const line = body[i % body.length] as string;
    const comma = line.indexOf(",");
    // Unique part numbers, so the import keeps every row (no duplicate replacement).
    lines.push(`${line.slice(0, comma)}-${i}${line.slice(comma)}`);
  }
  return lines.join("\n") + "\n";
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

async function settle(): Promise<void> {
  (globalThis as { gc?: () => void }).gc?.();
  await new Promise((resolve) => setTimeout(resolve, PAUSE_MS));
}

function time(fn: () => unknown): number {
  const t0 = performance.now();
  fn();
  return performance.now() - t0;
}

export async function benchCatalogImport(): Promise<string[]> {
  const text = makeList(ROWS);
  const megabytes = Buffer.byteLength(text, "utf8") / 1e6;
  let parts = 0;
  const raw = () => Papa.parse<string[]>(text);
  const full = () => {
    parts = importPartList(text).parts.length;
  };
  raw();
  full();
  const rawMs: number[] = [];
  const importMs: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    await settle();
    rawMs.push(time(raw));
    await settle();
    importMs.push(time(full));
  }
  const r = median(rawMs);
  const m = median(importMs);
  const rate = (ms: number) => `${Math.round(ROWS / (ms / 1000)).toLocaleString("en-US")} rows/s, ${(megabytes / (ms / 1000)).toFixed(1)} MB/s`;
  return [
    `catalog import: ${ROWS.toLocaleString("en-US")} rows, ${megabytes.toFixed(1)} MB, median of ${RUNS} runs${(globalThis as { gc?: unknown }).gc === undefined ? " (no --expose-gc: runs not preceded by a forced GC)" : ""}`,
    `  importPartList   ${m.toFixed(0).padStart(6)} ms  ${rate(m)}  (${parts.toLocaleString("en-US")} parts)`,
    `  papaparse (raw)  ${r.toFixed(0).padStart(6)} ms  ${rate(r)}  (floor)`,
    `  ratio import / raw parse: ${(m / r).toFixed(2)}× (target ≤ 2×)`,
  ];
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  for (const line of await benchCatalogImport()) console.log(line);
}
