import type { Spec } from "../engine/types.ts";
import { nominalInductanceRange, requiredInductance } from "../engine/requiredInductance.ts";
import { inputVoltagePoints } from "../engine/cornerPoints.ts";
import { idealDuty, inductorCurrentCcm } from "../engine/segmentVoltages.ts";
import { fmt } from "./fmt.ts";
import type { RequirementSummary } from "./types.ts";

/**
 * What any part must offer, before looking at parts: the inductance band of the ripple window
 * (src/engine/requiredInductance.ts) and current guides for a part at the band's lower edge,
 * where ripple and peak are largest. The guides use the lossless CCM duty and constant L
 * (Erickson & Maksimović ch. 2); the per-part checks use every corner and the roll-off.
 */
export function requirementSummary(spec: Spec): RequirementSummary {
  const band = requiredInductance(spec);
  const tolerance = spec.assumedTolerance;
  let il = { value: 0, vin: spec.vin.nom };
  for (const { vin } of inputVoltagePoints(spec)) {
    const value = inductorCurrentCcm(spec.topology, spec.iout.max, idealDuty(spec.topology, vin, spec.vout));
    if (value > il.value) il = { value, vin };
  }
  const t = spec.targets;
  const r = t.rippleRatio.max;
  const limits: string[] = [];
  if (t.maxTemperature !== null) limits.push(`hot spot ≤ ${fmt.n(t.maxTemperature)} °C`);
  if (t.maxLength !== null) limits.push(`length ≤ ${fmt.mm(t.maxLength)}`);
  if (t.maxWidth !== null) limits.push(`width ≤ ${fmt.mm(t.maxWidth)}`);
  if (t.maxHeight !== null) limits.push(`height ≤ ${fmt.mm(t.maxHeight)}`);
  if (t.maxFootprint !== null) limits.push(`footprint ≤ ${fmt.n(t.maxFootprint * 1e6, 4)} mm²`);
  if (t.maxPrice !== null) limits.push(`price ≤ ${fmt.n(t.maxPrice, 4)}`);
  if (t.lightLoadMode === "ccm") limits.push("continuous conduction at minimum load");
  return {
    band,
    nominalRange: band === null ? null : nominalInductanceRange(band, tolerance),
    assumedTolerance: tolerance,
    inductorCurrent: il,
    isatGuide: (1 + t.saturationMargin) * il.value * (1 + r / 2),
    // Triangle ripple: Irms² = IL² + ΔI²/12 with ΔI = r·IL (Erickson & Maksimović ch. 2).
    heatingGuide: (1 + t.heatingMargin) * il.value * Math.sqrt(1 + (r * r) / 12),
    srfMin: t.srfFactor * spec.fsw,
    limits,
  };
}
