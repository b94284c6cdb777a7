import type { Check, CheckName, CheckStatus, Part, Spec, Targets } from "./types.ts";
import type { CornerAccumulator } from "./cornerAccumulator.ts";
import { formatPercent, formatQuantity } from "./formatQuantity.ts";
import { assertNever } from "./assertNever.ts";

/** Names a corner by its index; null skips the readable reasons (ranking a large list needs only the verdicts). */
export type DescribeCorner = ((index: number) => string) | null;

/**
 * The checks of one part as they are judged. Reusable: clear() keeps the Check objects, so
 * ranking a list makes them once rather than a dozen per part; `items[0, length)` are this part's.
 */
export class CheckBuffer {
  readonly items: Check[] = [];
  length = 0;

  clear(): void {
    this.length = 0;
  }

  add(name: CheckName, status: CheckStatus, margin: number | null = null, cornerIndex: number | null = null): void {
    const c = this.items[this.length];
    if (c === undefined) this.items.push({ name, status, reason: "", margin, cornerIndex });
    else {
      c.name = name;
      c.status = status;
      c.reason = "";
      c.margin = margin;
      c.cornerIndex = cornerIndex;
    }
    this.length++;
  }
}

function footprint(part: Part): number | null {
  return part.length !== null && part.width !== null ? part.length * part.width : null;
}

const LIMITS = [
  ["length", (p: Part) => p.length, "maxLength"],
  ["width", (p: Part) => p.width, "maxWidth"],
  ["height", (p: Part) => p.height, "maxHeight"],
  ["footprint", footprint, "maxFootprint"],
  ["price", (p: Part) => p.price, "maxPrice"],
] as const;

let limitsOf: Targets | null = null;
let limitsSet = false;

/**
 * Whether the targets set any size or price limit, worked out once per targets object: usually
 * none is, and the lookups by key of the loop over LIMITS are slow in a ranking's hot path.
 * Targets are not edited in place (a spec change makes a new spec, as parseSpec and the app do).
 */
function anyLimit(t: Targets): boolean {
  if (t !== limitsOf) {
    limitsOf = t;
    limitsSet = LIMITS.some(([, , key]) => t[key] !== null);
  }
  return limitsSet;
}

/**
 * Every check of one part from its accumulated corners: the verdicts first (cheap), then, when
 * a corner describer is given, a readable reason for each that names the deciding corner.
 * Missing data gives "not checked (no data)" rather than a pass.
 */
export function partChecks(spec: Spec, part: Part, acc: CornerAccumulator, describe: DescribeCorner): Check[] {
  const list = new CheckBuffer();
  judgeChecks(spec, part, acc, list);
  const checks = list.items;
  if (describe !== null) for (const c of checks) c.reason = reasonFor(c, spec, part, acc, describe);
  return checks;
}

/** The verdicts of partChecks, without reasons, into `checks` (cleared first). */
export function judgeChecks(spec: Spec, part: Part, acc: CornerAccumulator, checks: CheckBuffer): void {
  const t = spec.targets;
  checks.clear();
  if (acc.firstUnreachable >= 0) checks.add("operatingPoint", "fail", null, acc.firstUnreachable);
  else checks.add("operatingPoint", "pass");

  // Saturation: Isat at the corner's temperature against the corner's largest |i|.
  if (part.isat === null) checks.add("saturation", "unchecked");
  else if (acc.saturationAt >= 0) {
    const ok = !acc.saturationBeyond && acc.saturationMargin >= t.saturationMargin;
    checks.add("saturation", ok ? "pass" : "fail", acc.saturationMargin, acc.saturationAt);
  }

  if (part.irms === null) checks.add("heating", "unchecked");
  else if (acc.irmsAt >= 0) {
    const margin = part.irms / acc.irms - 1;
    checks.add("heating", margin >= t.heatingMargin ? "pass" : "fail", margin, acc.irmsAt);
  }

  if (acc.tempRiseAt < 0) {
    checks.add("temperatureRise", "unchecked");
    if (t.maxTemperature !== null) checks.add("temperature", "unchecked");
  } else {
    const margin = (t.maxTempRise - acc.tempRise) / t.maxTempRise;
    checks.add("temperatureRise", acc.tempRise <= t.maxTempRise ? "pass" : "fail", margin, acc.tempRiseAt);
    if (t.maxTemperature !== null) {
      checks.add("temperature", spec.ambient + acc.tempRise <= t.maxTemperature ? "pass" : "fail", null, acc.tempRiseAt);
    }
  }

  // Ripple window at nominal input and full load, across the tolerance corners.
  if (acc.windowCorners > 0) {
    if (acc.windowOutsideAt < 0) checks.add("rippleRatio", "pass", null, acc.windowFirst);
    else checks.add("rippleRatio", "fail", null, acc.windowOutsideAt);
  }

  if (t.lightLoadMode === "ccm") {
    if (acc.lightLoadAt < 0) checks.add("lightLoadMode", "pass");
    else checks.add("lightLoadMode", "fail", null, acc.lightLoadAt);
  }

  if (part.srf === null) checks.add("srf", "unchecked");
  else {
    const needed = t.srfFactor * spec.fsw;
    checks.add("srf", part.srf >= needed ? "pass" : "fail", part.srf / needed - 1);
  }

  if (!anyLimit(t)) return;
  for (const [name, value, key] of LIMITS) {
    const max = t[key];
    if (max === null) continue;
    const v = value(part);
    checks.add(name, v === null ? "unchecked" : v <= max ? "pass" : "fail");
  }
}

const A = (x: number | null) => formatQuantity(x, "A");
const K = (x: number) => `${Number(x.toPrecision(3))} K`;
const ratio = (x: number) => String(Number(x.toPrecision(3)));

/** The readable reason of one verdict. */
function reasonFor(c: Check, spec: Spec, part: Part, acc: CornerAccumulator, describe: (index: number) => string): string {
  const t = spec.targets;
  const at = (index: number | null) => (index === null ? "" : describe(index));
  const pass = c.status === "pass";
  switch (c.name) {
    case "operatingPoint":
      return pass ? "every corner reaches the output" : `output cannot be reached at ${at(c.cornerIndex)} (drops too large or duty at its limit)`;
    case "saturation": {
      if (c.status === "unchecked") return "saturation not checked (no data)";
      const hot =
        !Number.isNaN(acc.saturationIsat) && acc.saturationIsat !== part.isat ? ` (${A(acc.saturationIsat)} at ${Math.round(acc.saturationTemperature)} °C)` : "";
      if (acc.saturationBeyond) return `driven past saturation at ${at(c.cornerIndex)}: the current leaves the modelled curve`;
      if (pass) return `peak ${A(acc.saturationPeak)} at ${at(c.cornerIndex)}; Isat ${A(part.isat)}${hot}, margin ${formatPercent(c.margin)}`;
      const needed = (1 + t.saturationMargin) * acc.saturationPeak;
      return `peak ${A(acc.saturationPeak)} at ${at(c.cornerIndex)} needs Isat ≥ ${A(needed)} (${formatPercent(t.saturationMargin)} margin); part has ${A(part.isat)}${hot}`;
    }
    case "heating":
      if (c.status === "unchecked") return "heating current not checked (no data)";
      return pass
        ? `RMS ${A(acc.irms)} at ${at(c.cornerIndex)}; rated ${A(part.irms)}, margin ${formatPercent(c.margin)}`
        : `RMS ${A(acc.irms)} at ${at(c.cornerIndex)} needs a rated current ≥ ${A((1 + t.heatingMargin) * acc.irms)}; part has ${A(part.irms)}`;
    case "temperatureRise":
      if (c.status === "unchecked") return "temperature rise not checked (no rated heating current or DCR)";
      return pass
        ? `rise ${K(acc.tempRise)} at ${at(c.cornerIndex)} (limit ${K(t.maxTempRise)})`
        : `rise ${K(acc.tempRise)} at ${at(c.cornerIndex)} exceeds ${K(t.maxTempRise)}`;
    case "temperature": {
      if (c.status === "unchecked") return "temperature not checked (no rated heating current or DCR)";
      const hottest = Math.round(spec.ambient + acc.tempRise);
      return pass
        ? `${hottest} °C at ${at(c.cornerIndex)} (limit ${t.maxTemperature} °C)`
        : `${hottest} °C at ${at(c.cornerIndex)} exceeds ${t.maxTemperature} °C`;
    }
    case "rippleRatio": {
      const target = `${t.rippleRatio.min}–${t.rippleRatio.max}`;
      return pass
        ? `ripple ratio ${ratio(acc.windowMin)}–${ratio(acc.windowMax)} at nominal Vin and full load (target ${target})`
        : `ripple ratio ${ratio(acc.windowOutsideRatio)} at ${at(c.cornerIndex)} is outside ${target}`;
    }
    case "lightLoadMode":
      return pass
        ? "continuous conduction at minimum load in every corner"
        : `${acc.lightLoadMode.toUpperCase()} at ${at(c.cornerIndex)}; continuous conduction required at minimum load`;
    case "srf": {
      if (c.status === "unchecked" || part.srf === null) return "SRF not checked (not rated)";
      const needed = t.srfFactor * spec.fsw;
      return pass ? `SRF ${formatQuantity(part.srf, "Hz")} ≥ ${t.srfFactor}·fsw` : `SRF ${formatQuantity(part.srf, "Hz")} is below ${t.srfFactor}·fsw = ${formatQuantity(needed, "Hz")}`;
    }
    case "length":
    case "width":
    case "height":
    case "footprint":
    case "price": {
      const [, value, key] = LIMITS.find(([name]) => name === c.name)!;
      const v = value(part);
      const max = t[key] as number;
      const [unit, scale] = c.name === "footprint" ? [" mm²", 1e6] : c.name === "price" ? ["", 1] : [" mm", 1e3];
      const show = (x: number) => `${Number((x * scale).toPrecision(4))}${unit}`;
      if (v === null) return `${c.name} not checked (no data)`;
      return pass ? `${c.name} ${show(v)} within ${show(max)}` : `${c.name} ${show(v)} exceeds ${show(max)}`;
    }
    default:
      return assertNever(c.name);
  }
}
