import type { Check, CheckName, CornerResult, Part, Spec, Worst, WorstCase } from "./types.ts";
import { describeCorner, effectiveTolerance } from "./cornerPoints.ts";
import { formatPercent, formatQuantity } from "./formatQuantity.ts";

function worstBy(corners: CornerResult[], value: (c: CornerResult) => number | null, largest: boolean): WorstCase | null {
  let best: WorstCase | null = null;
  corners.forEach((c, index) => {
    const v = value(c);
    if (v === null || Number.isNaN(v)) return;
    if (best === null || (largest ? v > best.value : v < best.value)) best = { value: v, cornerIndex: index };
  });
  return best;
}

const peakMagnitude = (c: CornerResult) => Math.max(Math.abs(c.ipk), Math.abs(c.ivalley));

/** Worst value of each figure over the corners, with the corner that produced it. */
export function worstCase(corners: CornerResult[]): Worst {
  const need = (w: WorstCase | null): WorstCase => w ?? { value: NaN, cornerIndex: -1 };
  return {
    ipk: need(worstBy(corners, (c) => c.ipk, true)),
    ivalley: need(worstBy(corners, (c) => c.ivalley, false)),
    irms: need(worstBy(corners, (c) => c.irms, true)),
    ripple: need(worstBy(corners, (c) => c.ripple, true)),
    totalLoss: need(worstBy(corners, (c) => c.totalLoss, true)),
    dcrLoss: need(worstBy(corners, (c) => c.dcrLoss, true)),
    coreLoss: worstBy(corners, (c) => c.coreLoss, true),
    tempRise: worstBy(corners, (c) => c.tempRise, true),
    peakMagnitude: need(worstBy(corners, peakMagnitude, true)),
  };
}

function check(name: CheckName, status: Check["status"], reason: string, margin: number | null = null, cornerIndex: number | null = null): Check {
  return { name, status, reason, margin, cornerIndex };
}

const A = (x: number | null) => formatQuantity(x, "A");
const K = (x: number) => `${Number(x.toPrecision(3))} K`;

/**
 * Every check of one part over its corners. Each reason names the corner that decided it;
 * missing data gives "not checked (no data)" rather than a pass.
 */
export function partChecks(spec: Spec, part: Part, corners: CornerResult[]): Check[] {
  const t = spec.targets;
  const tolerance = effectiveTolerance(spec, part);
  const at = (index: number) => describeCorner(corners[index]!, tolerance);
  const checks: Check[] = [];

  const unreachable = corners.findIndex((c) => c.unreachable);
  checks.push(
    unreachable >= 0
      ? check("operatingPoint", "fail", `output cannot be reached at ${at(unreachable)} (drops too large or duty at its limit)`, null, unreachable)
      : check("operatingPoint", "pass", "every corner reaches the output", null, null),
  );

  // Saturation: Isat at the corner's temperature against the corner's largest |i|.
  if (part.isat === null) {
    checks.push(check("saturation", "unchecked", "saturation not checked (no data)"));
  } else {
    let worst = -1;
    let worstMargin = Infinity;
    corners.forEach((c, index) => {
      if (c.unreachable) return;
      const margin = c.beyondCurve ? -1 : (c.isatAtTemp ?? part.isat!) / peakMagnitude(c) - 1;
      if (margin < worstMargin) {
        worstMargin = margin;
        worst = index;
      }
    });
    if (worst >= 0) {
      const c = corners[worst]!;
      const needed = (1 + t.saturationMargin) * peakMagnitude(c);
      const hot = c.isatAtTemp !== null && c.isatAtTemp !== part.isat ? ` (${A(c.isatAtTemp)} at ${Math.round(c.temperature)} °C)` : "";
      if (c.beyondCurve) {
        checks.push(check("saturation", "fail", `driven past saturation at ${at(worst)}: the current leaves the modelled curve`, worstMargin, worst));
      } else if (worstMargin >= t.saturationMargin) {
        checks.push(check("saturation", "pass", `peak ${A(peakMagnitude(c))} at ${at(worst)}; Isat ${A(part.isat)}${hot}, margin ${formatPercent(worstMargin)}`, worstMargin, worst));
      } else {
        checks.push(
          check(
            "saturation",
            "fail",
            `peak ${A(peakMagnitude(c))} at ${at(worst)} needs Isat ≥ ${A(needed)} (${formatPercent(t.saturationMargin)} margin); part has ${A(part.isat)}${hot}`,
            worstMargin,
            worst,
          ),
        );
      }
    }
  }

  const irmsWorst = worstBy(corners, (c) => (c.unreachable ? null : c.irms), true);
  if (part.irms === null) {
    checks.push(check("heating", "unchecked", "heating current not checked (no data)"));
  } else if (irmsWorst !== null) {
    const margin = part.irms / irmsWorst.value - 1;
    const needed = (1 + t.heatingMargin) * irmsWorst.value;
    checks.push(
      margin >= t.heatingMargin
        ? check("heating", "pass", `RMS ${A(irmsWorst.value)} at ${at(irmsWorst.cornerIndex)}; rated ${A(part.irms)}, margin ${formatPercent(margin)}`, margin, irmsWorst.cornerIndex)
        : check("heating", "fail", `RMS ${A(irmsWorst.value)} at ${at(irmsWorst.cornerIndex)} needs a rated current ≥ ${A(needed)}; part has ${A(part.irms)}`, margin, irmsWorst.cornerIndex),
    );
  }

  const rise = worstBy(corners, (c) => (c.unreachable ? null : c.tempRise), true);
  if (rise === null) {
    checks.push(check("temperatureRise", "unchecked", "temperature rise not checked (no rated heating current or DCR)"));
  } else {
    const margin = (t.maxTempRise - rise.value) / t.maxTempRise;
    checks.push(
      rise.value <= t.maxTempRise
        ? check("temperatureRise", "pass", `rise ${K(rise.value)} at ${at(rise.cornerIndex)} (limit ${K(t.maxTempRise)})`, margin, rise.cornerIndex)
        : check("temperatureRise", "fail", `rise ${K(rise.value)} at ${at(rise.cornerIndex)} exceeds ${K(t.maxTempRise)}`, margin, rise.cornerIndex),
    );
    if (t.maxTemperature !== null) {
      const hottest = spec.ambient + rise.value;
      checks.push(
        hottest <= t.maxTemperature
          ? check("temperature", "pass", `${Math.round(hottest)} °C at ${at(rise.cornerIndex)} (limit ${t.maxTemperature} °C)`, null, rise.cornerIndex)
          : check("temperature", "fail", `${Math.round(hottest)} °C at ${at(rise.cornerIndex)} exceeds ${t.maxTemperature} °C`, null, rise.cornerIndex),
      );
    }
  }
  if (rise === null && t.maxTemperature !== null) {
    checks.push(check("temperature", "unchecked", "temperature not checked (no rated heating current or DCR)"));
  }

  // Ripple window at nominal input and full load, across the tolerance corners.
  const window = corners
    .map((c, index) => ({ c, index }))
    .filter(({ c }) => c.vin === spec.vin.nom && c.iout === spec.iout.max && !c.unreachable);
  if (window.length > 0) {
    const outside = window.find(({ c }) => c.rippleRatio < t.rippleRatio.min || c.rippleRatio > t.rippleRatio.max);
    const ratios = window.map(({ c }) => c.rippleRatio);
    const span = `${Number(Math.min(...ratios).toPrecision(3))}–${Number(Math.max(...ratios).toPrecision(3))}`;
    const target = `${t.rippleRatio.min}–${t.rippleRatio.max}`;
    checks.push(
      outside === undefined
        ? check("rippleRatio", "pass", `ripple ratio ${span} at nominal Vin and full load (target ${target})`, null, window[0]!.index)
        : check("rippleRatio", "fail", `ripple ratio ${Number(outside.c.rippleRatio.toPrecision(3))} at ${at(outside.index)} is outside ${target}`, null, outside.index),
    );
  }

  if (t.lightLoadMode === "ccm") {
    const light = corners.map((c, index) => ({ c, index })).filter(({ c }) => c.iout === spec.iout.min && !c.unreachable);
    const offending = light.find(({ c }) => c.mode !== "ccm");
    checks.push(
      offending === undefined
        ? check("lightLoadMode", "pass", "continuous conduction at minimum load in every corner")
        : check("lightLoadMode", "fail", `${offending.c.mode.toUpperCase()} at ${at(offending.index)}; continuous conduction required at minimum load`, null, offending.index),
    );
  }

  if (part.srf === null) {
    checks.push(check("srf", "unchecked", "SRF not checked (not rated)"));
  } else {
    const needed = t.srfFactor * spec.fsw;
    const margin = part.srf / needed - 1;
    checks.push(
      part.srf >= needed
        ? check("srf", "pass", `SRF ${formatQuantity(part.srf, "Hz")} ≥ ${t.srfFactor}·fsw`, margin)
        : check("srf", "fail", `SRF ${formatQuantity(part.srf, "Hz")} is below ${t.srfFactor}·fsw = ${formatQuantity(needed, "Hz")}`, margin),
    );
  }

  const limit = (name: CheckName, label: string, value: number | null, max: number | null, unit: string, scale: number) => {
    if (max === null) return;
    const show = (x: number) => `${Number((x * scale).toPrecision(4))} ${unit}`;
    if (value === null) checks.push(check(name, "unchecked", `${label} not checked (no data)`));
    else if (value <= max) checks.push(check(name, "pass", `${label} ${show(value)} within ${show(max)}`));
    else checks.push(check(name, "fail", `${label} ${show(value)} exceeds ${show(max)}`));
  };
  limit("length", "length", part.length, t.maxLength, "mm", 1e3);
  limit("width", "width", part.width, t.maxWidth, "mm", 1e3);
  limit("height", "height", part.height, t.maxHeight, "mm", 1e3);
  limit("footprint", "footprint", part.length !== null && part.width !== null ? part.length * part.width : null, t.maxFootprint, "mm²", 1e6);
  limit("price", "price", part.price, t.maxPrice, "", 1);
  return checks;
}
