import type { Part } from "../../engine/types.ts";
import type { PartEvaluation } from "../../engine/evaluatePart.ts";
import { amps, henries, hertz, kelvin, MODE_SHORT, mm3, ohms, percent, priceText, sizeText, volumeOf, watts } from "../common/format.ts";

export interface CompareItem {
  part: Part;
  e: PartEvaluation;
  score: number | null;
}

export interface CompareRow {
  label: string;
  cells: string[];
  /** Columns holding the best value of the row (empty when nothing is comparable). */
  best: number[];
}

interface RowDef {
  label: string;
  better: "low" | "high" | null;
  value?: (it: CompareItem) => number | null;
  text: (it: CompareItem) => string;
}

const finite = (x: number | null | undefined) => (x === null || x === undefined || !Number.isFinite(x) ? null : x);
const checkMargin = (it: CompareItem, name: "saturation" | "heating") => {
  const c = it.e.checks.find((k) => k.name === name);
  return c === undefined || c.status === "unchecked" ? null : c.margin;
};
const lightLoad = (it: CompareItem) => {
  const min = it.e.corners.filter((c) => c.ioutCorner === "min" && !c.unreachable);
  const other = min.find((c) => c.mode !== "ccm");
  return min.length === 0 ? "—" : MODE_SHORT[other?.mode ?? "ccm"];
};

const ROWS: RowDef[] = [
  { label: "Result", better: null, text: (it) => (it.e.status === "pass" ? "✓ pass" : it.e.status === "incomplete" ? "? incomplete" : `✗ fail (${it.e.failures.length})`) },
  // A failing part's score only orders the near misses: it never earns "best" beside parts that work.
  { label: "Score", better: "high", value: (it) => (it.e.status === "fail" ? null : it.score), text: (it) => (it.score === null ? "—" : it.score.toFixed(1)) },
  { label: "Inductance", better: null, text: (it) => henries(it.part.inductance) },
  { label: "Tolerance", better: "low", value: (it) => it.part.tolerance, text: (it) => (it.part.tolerance === null ? "—" : percent(it.part.tolerance)) },
  { label: "DCR (max, else typ.)", better: "low", value: (it) => it.part.dcrMax ?? it.part.dcrTyp, text: (it) => ohms(it.part.dcrMax ?? it.part.dcrTyp) },
  { label: "Isat", better: "high", value: (it) => it.part.isat, text: (it) => amps(it.part.isat) },
  { label: "Rated current", better: "high", value: (it) => it.part.irms, text: (it) => amps(it.part.irms) },
  { label: "SRF", better: "high", value: (it) => it.part.srf, text: (it) => hertz(it.part.srf) },
  { label: "Size", better: null, text: (it) => sizeText(it.part) },
  { label: "Volume", better: "low", value: (it) => volumeOf(it.part), text: (it) => mm3(volumeOf(it.part)) },
  { label: "Height", better: "low", value: (it) => it.part.height, text: (it) => (it.part.height === null ? "—" : `${Number((it.part.height * 1e3).toPrecision(3))} mm`) },
  { label: "Price", better: "low", value: (it) => it.part.price, text: (it) => priceText(it.part.price) },
  { label: "Worst peak |i|", better: "low", value: (it) => finite(it.e.worst.peakMagnitude.value), text: (it) => amps(finite(it.e.worst.peakMagnitude.value)) },
  { label: "Worst RMS", better: "low", value: (it) => finite(it.e.worst.irms.value), text: (it) => amps(finite(it.e.worst.irms.value)) },
  { label: "Worst loss", better: "low", value: (it) => finite(it.e.worst.totalLoss.value), text: (it) => watts(finite(it.e.worst.totalLoss.value)) },
  { label: "Worst temperature rise", better: "low", value: (it) => finite(it.e.worst.tempRise?.value), text: (it) => kelvin(finite(it.e.worst.tempRise?.value)) },
  { label: "Isat margin", better: "high", value: (it) => checkMargin(it, "saturation"), text: (it) => percent(checkMargin(it, "saturation")) },
  { label: "Heating margin", better: "high", value: (it) => checkMargin(it, "heating"), text: (it) => percent(checkMargin(it, "heating")) },
  { label: "Mode at minimum load", better: null, text: lightLoad },
];

/** The comparison table's rows, with the best value of each comparable row found (ties share it). */
export function compareRows(items: readonly CompareItem[]): CompareRow[] {
  return ROWS.map((def) => {
    const cells = items.map(def.text);
    if (def.better === null || def.value === undefined || items.length < 2) return { label: def.label, cells, best: [] };
    const values = items.map((it) => finite(def.value!(it)));
    const known = values.filter((v): v is number => v !== null);
    if (known.length < 2) return { label: def.label, cells, best: [] };
    const target = def.better === "low" ? Math.min(...known) : Math.max(...known);
    const best = values.flatMap((v, k) => (v !== null && Math.abs(v - target) <= 1e-12 * Math.max(1, Math.abs(target)) ? [k] : []));
    // Everyone equal is no distinction worth marking.
    return { label: def.label, cells, best: best.length === known.length ? [] : best };
  });
}
