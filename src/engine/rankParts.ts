import type { Part, Result, Spec } from "./types.ts";
import { evaluatePart, type PartEvaluation } from "./evaluatePart.ts";
import { scoreParts } from "./scoreParts.ts";
import { paretoFront } from "./paretoFront.ts";
import { rankOrder } from "./rankOrder.ts";

function volume(part: Part): number | null {
  return part.length !== null && part.width !== null && part.height !== null ? part.length * part.width * part.height : null;
}

/** Scores, Pareto flags and rank order for evaluated parts. */
export function rankEvaluations(spec: Spec, evaluations: PartEvaluation[]): Result[] {
  const anyPass = evaluations.some((e) => e.status === "pass");
  const reference = evaluations.map((e) => (anyPass ? e.status === "pass" : true));
  const scores = scoreParts(
    evaluations.map((e) => ({
      // A part that cannot reach the output at some corner has no meaningful loss figure.
      loss: Number.isFinite(e.worst.totalLoss.value) && !e.corners.some((c) => c.unreachable) ? e.worst.totalLoss.value : null,
      footprint: e.part.length !== null && e.part.width !== null ? e.part.length * e.part.width : null,
      height: e.part.height,
      price: e.part.price,
      margin: e.minMargin,
    })),
    reference,
    spec.weights,
  );
  // The trade-off front is drawn among the parts that did not fail.
  const usable = evaluations.map((e) => e.status !== "fail");
  const pareto = paretoFront(
    evaluations.map((e, i) => (usable[i] ? e.worst.totalLoss.value : null)),
    evaluations.map((e, i) => (usable[i] ? volume(e.part) : null)),
  );
  const order = rankOrder(
    evaluations.map((e) => e.status),
    scores,
    evaluations.map((e) => e.failures.length),
  );
  const results: Result[] = [];
  order.forEach((index, position) => {
    const e = evaluations[index]!;
    results.push({
      partNumber: e.part.partNumber,
      rank: position + 1,
      pass: e.status === "pass",
      status: e.status,
      failures: e.failures,
      unchecked: e.unchecked,
      checks: e.checks,
      score: scores[index]!,
      pareto: pareto[index]!,
      minMargin: e.minMargin,
      worst: e.worst,
      corners: e.corners,
    });
  });
  return results;
}

/** Evaluates and ranks every part against the spec, passing parts first. */
export function rankParts(spec: Spec, parts: Part[]): Result[] {
  return rankEvaluations(
    spec,
    parts.map((p) => evaluatePart(spec, p)),
  );
}
