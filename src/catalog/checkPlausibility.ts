import type { Part } from "../engine/types.ts";
import { formatPercent, formatQuantity } from "../engine/formatQuantity.ts";
import { QUANTITIES } from "./quantities.ts";
import { SI_SYMBOL } from "./parseUnit.ts";
import type { Quantity, RowWarning } from "./types.ts";

/** One getter per checked field: monomorphic property reads, fast over 100 000 parts. */
const CHECKED: [Quantity, (p: Part) => number | null][] = [
  ["inductance", (p) => p.inductance],
  ["tolerance", (p) => p.tolerance],
  ["dcrTyp", (p) => p.dcrTyp],
  ["dcrMax", (p) => p.dcrMax],
  ["isat", (p) => p.isat],
  ["isatDrop", (p) => p.isatDrop],
  ["isatHot", (p) => p.isatHot],
  ["irms", (p) => p.irms],
  ["irmsRise", (p) => p.irmsRise],
  ["srf", (p) => p.srf],
  ["length", (p) => p.length],
  ["width", (p) => p.width],
  ["height", (p) => p.height],
  ["price", (p) => p.price],
];
/** A value this many times off the list's median is more likely a unit slip than a real part. */
const MEDIAN_FACTOR = 1000;

/** Enough values for a median that can only tell "a thousand times off" from normal. */
const MEDIAN_SAMPLE = 2001;

function median(values: number[]): number | null {
  if (values.length === 0) return null;
  const sorted = values.sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

function show(q: Quantity, v: number): string {
  const dimension = QUANTITIES[q].dimension;
  if (dimension === "fraction") return formatPercent(v, 4);
  const symbol = SI_SYMBOL[dimension];
  return symbol === "" ? String(Number(v.toPrecision(6))) : formatQuantity(v, symbol, 4);
}

/**
 * Warnings, never rejections, for values that are possible but unlikely: outside the usual range
 * of inductor data or a thousand times off the list's median (4.7 H in a list of µH parts), and
 * contradictions between fields (DCR max below typical, hot Isat above cold Isat).
 */
export function checkPlausibility(parts: Part[], rows: number[]): RowWarning[] {
  const warnings: RowWarning[] = [];
  const count = CHECKED.length;
  // The median comes from evenly spaced parts, at most MEDIAN_SAMPLE of them: exact for short
  // lists, and on 100 000 parts a sort of every value per field costs more than the import.
  const stride = Math.max(1, Math.ceil(parts.length / MEDIAN_SAMPLE));
  const positive: number[][] = CHECKED.map(() => []);
  const n = new Int32Array(count);
  let sampled = true;
  const min = new Float64Array(count).fill(Infinity);
  const max = new Float64Array(count).fill(-Infinity);
  const minPositive = new Float64Array(count).fill(Infinity);
  // One pass over the parts reads every field while the object is in cache; a pass per field
  // was most of the cost on 100 000 parts.
  const take = (k: number, v: number | null) => {
    if (v === null) return;
    if (v < (min[k] as number)) min[k] = v;
    if (v > (max[k] as number)) max[k] = v;
    if (v > 0) {
      n[k] = (n[k] as number) + 1;
      if (sampled) (positive[k] as number[]).push(v);
      if (v < (minPositive[k] as number)) minPositive[k] = v;
    }
  };
  for (let i = 0; i < parts.length; i++) {
    const p = parts[i] as Part;
    sampled = i % stride === 0;
    // Written out in CHECKED order: fourteen direct reads, no indirect call per field.
    take(0, p.inductance);
    take(1, p.tolerance);
    take(2, p.dcrTyp);
    take(3, p.dcrMax);
    take(4, p.isat);
    take(5, p.isatDrop);
    take(6, p.isatHot);
    take(7, p.irms);
    take(8, p.irmsRise);
    take(9, p.srf);
    take(10, p.length);
    take(11, p.width);
    take(12, p.height);
    take(13, p.price);
    if (p.dcrTyp !== null && p.dcrMax !== null && p.dcrMax < p.dcrTyp) {
      warnings.push({ row: rows[i] ?? null, field: "dcrMax", message: `${p.partNumber}: DCR maximum ${show("dcrMax", p.dcrMax)} is below typical ${show("dcrTyp", p.dcrTyp)}` });
    }
    if (p.isat !== null && p.isatHot !== null && p.isatHot > p.isat) {
      warnings.push({ row: rows[i] ?? null, field: "isatHot", message: `${p.partNumber}: hot Isat ${show("isatHot", p.isatHot)} is above Isat at 25 °C ${show("isat", p.isat)}` });
    }
  }
  for (let k = 0; k < count; k++) {
    const [q, get] = CHECKED[k] as [Quantity, (p: Part) => number | null];
    const m = median(positive[k] as number[]);
    const range = QUANTITIES[q].plausible;
    const lo = range === null ? -Infinity : range[0];
    const hi = range === null ? Infinity : range[1];
    const checkMedian = m !== null && m > 0 && (n[k] as number) >= 3;
    const farAtAll = checkMedian && ((max[k] as number) / (m as number) > MEDIAN_FACTOR || (m as number) / (minPositive[k] as number) > MEDIAN_FACTOR);
    // Most lists have nothing to report: the extremes decide that without a second pass.
    if ((min[k] as number) >= lo && (max[k] as number) <= hi && !farAtAll) continue;
    for (let i = 0; i < parts.length; i++) {
      const p = parts[i] as Part;
      const v = get(p);
      if (v === null) continue;
      const outside = v < lo || v > hi;
      const far = checkMedian && v > 0 && (v / (m as number) > MEDIAN_FACTOR || (m as number) / v > MEDIAN_FACTOR);
      if (!outside && !far) continue;
      const reasons: string[] = [];
      if (outside) reasons.push(`outside the usual ${show(q, lo)} … ${show(q, hi)}`);
      if (far) reasons.push(`far from the list's median of ${show(q, m as number)}`);
      warnings.push({ row: rows[i] ?? null, field: q, message: `${p.partNumber}: ${QUANTITIES[q].label} ${show(q, v)} is ${reasons.join(" and ")}; check the unit` });
    }
  }
  return warnings;
}
