import type { Check, CornerResult, Part, ResultStatus, Spec, Worst } from "./types.ts";
import { cornerPoints, describeCorner, effectiveTolerance } from "./cornerPoints.ts";
import { CornerSolver, preparePart } from "./evaluateCorner.ts";
import { CornerAccumulator } from "./cornerAccumulator.ts";
import { partChecks } from "./partChecks.ts";

export interface PartEvaluation {
  part: Part;
  status: ResultStatus;
  failures: string[];
  unchecked: string[];
  checks: Check[];
  minMargin: number | null;
  worst: Worst;
  corners: CornerResult[];
}

/** Smallest current margin: saturation or heating headroom as a fraction, null when neither is known. */
/** Over the first `count` checks (all of them, or a CheckBuffer's current ones). */
export function minimumMargin(checks: readonly Check[], count = checks.length): number | null {
  let smallest: number | null = null;
  for (let k = 0; k < count; k++) {
    const c = checks[k]!;
    if ((c.name === "saturation" || c.name === "heating") && c.margin !== null && c.status !== "unchecked") {
      smallest = smallest === null ? c.margin : Math.min(smallest, c.margin);
    }
  }
  return smallest;
}

/** pass only when every check ran and passed; incomplete when nothing failed but some could not run (first `count` checks). */
export function statusOf(checks: readonly Check[], count = checks.length): ResultStatus {
  let unchecked = false;
  for (let k = 0; k < count; k++) {
    const c = checks[k]!;
    if (c.status === "fail") return "fail";
    if (c.status === "unchecked") unchecked = true;
  }
  return unchecked ? "incomplete" : "pass";
}

/** Every corner, check and worst case of one part against the spec, with readable reasons. */
export function evaluatePart(spec: Spec, part: Part, solver: CornerSolver = new CornerSolver(spec)): PartEvaluation {
  const points = cornerPoints(spec, part);
  const prepared = preparePart(part);
  const acc = new CornerAccumulator(spec, part.isat);
  solver.startPart();
  const corners = points.map((p, index) => {
    solver.solve(prepared, p);
    acc.add(solver.solution, solver, p, index);
    return solver.result(p);
  });
  const tolerance = effectiveTolerance(spec, part);
  const checks = partChecks(spec, part, acc, (index) => describeCorner(points[index]!, tolerance));
  return {
    part,
    status: statusOf(checks),
    failures: checks.filter((c) => c.status === "fail").map((c) => `${c.name}: ${c.reason}`),
    unchecked: checks.filter((c) => c.status === "unchecked").map((c) => c.reason),
    checks,
    minMargin: minimumMargin(checks),
    worst: acc.worst(),
    corners,
  };
}
