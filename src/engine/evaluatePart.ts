import type { Check, CornerResult, Part, ResultStatus, Spec, Worst } from "./types.ts";
import { cornerPoints } from "./cornerPoints.ts";
import { evaluateCorner } from "./evaluateCorner.ts";
import { partChecks, worstCase } from "./partChecks.ts";

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
export function minimumMargin(checks: Check[]): number | null {
  const margins = checks
    .filter((c) => (c.name === "saturation" || c.name === "heating") && c.margin !== null && c.status !== "unchecked")
    .map((c) => c.margin as number);
  return margins.length === 0 ? null : Math.min(...margins);
}

/** Every corner, check and worst case of one part against the spec. */
export function evaluatePart(spec: Spec, part: Part): PartEvaluation {
  const corners = cornerPoints(spec, part).map((point) => evaluateCorner(spec, part, point));
  const checks = partChecks(spec, part, corners);
  const failures = checks.filter((c) => c.status === "fail").map((c) => `${c.name}: ${c.reason}`);
  const unchecked = checks.filter((c) => c.status === "unchecked").map((c) => c.reason);
  const status: ResultStatus = failures.length > 0 ? "fail" : unchecked.length > 0 ? "incomplete" : "pass";
  return { part, status, failures, unchecked, checks, minMargin: minimumMargin(checks), worst: worstCase(corners), corners };
}
