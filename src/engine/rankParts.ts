import type { Part, Result, Spec } from "./types.ts";
import { evaluatePart } from "./evaluatePart.ts";
import { CornerSolver } from "./evaluateCorner.ts";
import { screenParts, type Screening } from "./screenParts.ts";

/** Full results (corners, checks with reasons) in rank order for the ranks in [from, to). */
export function rankedResults(spec: Spec, parts: readonly Part[], screening: Screening, from = 0, to = screening.count): Result[] {
  const solver = new CornerSolver(spec);
  const results: Result[] = [];
  for (let k = from; k < Math.min(to, screening.count); k++) {
    const index = screening.order[k]!;
    const e = evaluatePart(spec, parts[index]!, solver);
    results.push({
      partNumber: e.part.partNumber,
      rank: k + 1,
      pass: e.status === "pass",
      status: e.status,
      failures: e.failures,
      unchecked: e.unchecked,
      checks: e.checks,
      score: screening.score[index]!,
      pareto: screening.pareto[index] === 1,
      minMargin: e.minMargin,
      worst: e.worst,
      corners: e.corners,
    });
  }
  return results;
}

/** Evaluates and ranks every part against the spec, passing parts first, with full results. */
export function rankParts(spec: Spec, parts: readonly Part[]): Result[] {
  return rankedResults(spec, parts, screenParts(spec, parts));
}
