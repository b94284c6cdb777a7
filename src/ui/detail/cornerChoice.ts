import type { CornerResult } from "../../engine/types.ts";
import type { PartEvaluation } from "../../engine/evaluatePart.ts";
import type { CornerKey } from "../../state/extrasStore.ts";

export function keyOf(c: CornerResult): CornerKey {
  return { vin: c.vinCorner, iout: c.ioutCorner, inductance: c.inductanceCorner };
}

/** Index of the corner with these labels; a part without tolerance has only the nominal inductance. */
export function findCorner(corners: readonly CornerResult[], key: CornerKey): number {
  const exact = corners.findIndex((c) => c.vinCorner === key.vin && c.ioutCorner === key.iout && c.inductanceCorner === key.inductance);
  if (exact >= 0) return exact;
  return corners.findIndex((c) => c.vinCorner === key.vin && c.ioutCorner === key.iout);
}

/** The chosen corner, else the one with the worst peak current. */
export function chosenCorner(e: PartEvaluation, key: CornerKey | null): number {
  const found = key === null ? -1 : findCorner(e.corners, key);
  if (found >= 0) return found;
  const worst = e.worst.peakMagnitude.cornerIndex;
  return worst >= 0 ? worst : 0;
}

export const VIN_LABEL: Record<CornerKey["vin"], string> = { min: "minimum", nom: "nominal", max: "maximum", "peak-ripple": "Vout/2 (ripple peak)" };
export const IOUT_LABEL: Record<CornerKey["iout"], string> = { min: "minimum", max: "maximum" };
export const L_LABEL: Record<CornerKey["inductance"], string> = { min: "−tolerance", nom: "nominal", max: "+tolerance" };
