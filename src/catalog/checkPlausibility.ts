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
 *
 * Parts are added as they are made, while each is still in cache: a second pass over 100 000
 * finished parts cost more than reading them here. Most lists have nothing to report, and the
 * extremes gathered here say so without looking at a part again.
 */
export class PlausibilityCheck {
  private readonly min = new Float64Array(CHECKED.length).fill(Infinity);
  private readonly max = new Float64Array(CHECKED.length).fill(-Infinity);
  private readonly minPositive = new Float64Array(CHECKED.length).fill(Infinity);
  private readonly positives = new Int32Array(CHECKED.length);
  /** Every stride-th part added; the stride doubles when the sample grows past twice its size. */
  private sample: Part[] = [];
  private stride = 1;
  private added = 0;
  private readonly contradictions: { part: Part; row: number; field: "dcrMax" | "isatHot"; message: string }[] = [];

  add(p: Part, row: number): void {
    if (this.added++ % this.stride === 0) {
      this.sample.push(p);
      if (this.sample.length > 2 * MEDIAN_SAMPLE) {
        // Keep the parts at multiples of the doubled stride: still evenly spaced.
        this.sample = this.sample.filter((_, i) => i % 2 === 0);
        this.stride *= 2;
      }
    }
    // Written out in CHECKED order: fourteen direct reads, no indirect call per field.
    this.take(0, p.inductance);
    this.take(1, p.tolerance);
    this.take(2, p.dcrTyp);
    this.take(3, p.dcrMax);
    this.take(4, p.isat);
    this.take(5, p.isatDrop);
    this.take(6, p.isatHot);
    this.take(7, p.irms);
    this.take(8, p.irmsRise);
    this.take(9, p.srf);
    this.take(10, p.length);
    this.take(11, p.width);
    this.take(12, p.height);
    this.take(13, p.price);
    if (p.dcrTyp !== null && p.dcrMax !== null && p.dcrMax < p.dcrTyp) {
      this.contradictions.push({ part: p, row, field: "dcrMax", message: `${p.partNumber}: DCR maximum ${show("dcrMax", p.dcrMax)} is below typical ${show("dcrTyp", p.dcrTyp)}` });
    }
    if (p.isat !== null && p.isatHot !== null && p.isatHot > p.isat) {
      this.contradictions.push({ part: p, row, field: "isatHot", message: `${p.partNumber}: hot Isat ${show("isatHot", p.isatHot)} is above Isat at 25 °C ${show("isat", p.isat)}` });
    }
  }

  /**
   * The warnings for `parts` (with their rows), which are the parts added less any replaced
   * since: contradictions first in the order added, then each field's outliers. The median
   * comes from the evenly spaced sample (exact up to 2 × MEDIAN_SAMPLE parts): on 100 000 parts
   * a sort of every value per field costs more than the import.
   */
  warnings(parts: readonly Part[], rows: readonly number[]): RowWarning[] {
    const warnings: RowWarning[] = [];
    if (this.contradictions.length > 0) {
      const present = parts.length === this.added ? null : new Set(parts);
      for (const c of this.contradictions) if (present === null || present.has(c.part)) warnings.push({ row: c.row, field: c.field, message: c.message });
    }
    for (let k = 0; k < CHECKED.length; k++) {
      const [q, get] = CHECKED[k] as [Quantity, (p: Part) => number | null];
      const values: number[] = [];
      for (const p of this.sample) {
        const v = get(p);
        if (v !== null && v > 0) values.push(v);
      }
      const m = median(values);
      const range = QUANTITIES[q].plausible;
      const lo = range === null ? -Infinity : range[0];
      const hi = range === null ? Infinity : range[1];
      const checkMedian = m !== null && m > 0 && (this.positives[k] as number) >= 3;
      const farAtAll = checkMedian && ((this.max[k] as number) / (m as number) > MEDIAN_FACTOR || (m as number) / (this.minPositive[k] as number) > MEDIAN_FACTOR);
      if ((this.min[k] as number) >= lo && (this.max[k] as number) <= hi && !farAtAll) continue;
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

  private take(k: number, v: number | null): void {
    if (v === null) return;
    if (v < (this.min[k] as number)) this.min[k] = v;
    if (v > (this.max[k] as number)) this.max[k] = v;
    if (v > 0) {
      this.positives[k] = (this.positives[k] as number) + 1;
      if (v < (this.minPositive[k] as number)) this.minPositive[k] = v;
    }
  }
}

/** PlausibilityCheck over a finished list of parts, each with its row. */
export function checkPlausibility(parts: readonly Part[], rows: readonly number[]): RowWarning[] {
  const check = new PlausibilityCheck();
  for (let i = 0; i < parts.length; i++) check.add(parts[i] as Part, rows[i] ?? 0);
  return check.warnings(parts, rows);
}
