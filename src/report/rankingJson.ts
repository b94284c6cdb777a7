import type { Result, Spec } from "../engine/types.ts";

export interface RankingJsonInput {
  spec: Spec;
  results: readonly Result[];
  /** Rejected rows, each naming its file or list. */
  rejected: readonly unknown[];
  duplicates: readonly unknown[];
}

/**
 * Ranked results as JSON in the shape of `rank --json` (DESIGN.md: spec, results in rank order,
 * rejected rows), so that a script reads the browser's export and the CLI's output alike.
 * Numbers the engine could not compute (NaN) are written as null.
 */
export function rankingJson(input: RankingJsonInput): string {
  return JSON.stringify({ spec: input.spec, results: input.results, rejected: input.rejected, duplicates: input.duplicates }, null, 2);
}
