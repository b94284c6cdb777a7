import type { Part, Result, Spec } from "./types.ts";
import { evaluatePart, type PartEvaluation } from "./evaluatePart.ts";
import { CornerSolver } from "./evaluateCorner.ts";
import { emptyFigures, rankFigures, type PartFigures, type Screening } from "./screenParts.ts";

/** Full results (corners, checks with reasons) in rank order for the ranks in [from, to). */
export function rankedResults(
  spec: Spec,
  parts: readonly Part[],
  screening: Screening,
  from = 0,
  to = screening.count,
  evaluated?: readonly PartEvaluation[],
): Result[] {
  const solver = new CornerSolver(spec);
  const results: Result[] = [];
  for (let k = from; k < Math.min(to, screening.count); k++) {
    const index = screening.order[k]!;
    const e = evaluated?.[index] ?? evaluatePart(spec, parts[index]!, solver);
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

/** The screening figures of parts already evaluated in full (the same solver, so the same numbers). */
function figuresOf(evaluations: readonly PartEvaluation[]): PartFigures {
  const figures = emptyFigures(evaluations.length);
  evaluations.forEach((e, i) => {
    figures.status[i] = e.status;
    figures.failures[i] = e.failures.length;
    figures.peak[i] = e.worst.peakMagnitude.value;
    figures.irms[i] = e.worst.irms.value;
    figures.totalLoss[i] = e.worst.totalLoss.value;
    figures.tempRise[i] = e.worst.tempRise?.value ?? NaN;
    figures.minMargin[i] = e.minMargin ?? NaN;
    figures.unreachable[i] = e.corners.some((c) => c.unreachable) ? 1 : 0;
  });
  return figures;
}

/**
 * Evaluates and ranks every part against the spec, passing parts first, with full results.
 * Each part is evaluated once: the ranking is built from the full evaluations.
 */
export function rankParts(spec: Spec, parts: readonly Part[]): Result[] {
  const solver = new CornerSolver(spec);
  const evaluations = parts.map((part) => evaluatePart(spec, part, solver));
  return rankedResults(spec, parts, rankFigures(spec, parts, figuresOf(evaluations)), 0, parts.length, evaluations);
}
