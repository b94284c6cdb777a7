import type { Part, Result, Spec, WorstCase } from "../engine/types.ts";
import { lossDcr } from "../engine/evaluateCorner.ts";
import { describeCorner } from "../engine/cornerPoints.ts";
import { csvCell } from "./csvCell.ts";

type Cell = string | number | null;

/** Twelve significant figures: beyond any list's precision, without binary noise like 0.30000000000000004. */
const num = (x: number | null): number | null => (x === null || !Number.isFinite(x) ? null : Number(x.toPrecision(12)));

function corner(result: Result, worst: WorstCase | null, tolerance: number): string | null {
  if (worst === null || worst.cornerIndex < 0) return null;
  const c = result.corners[worst.cornerIndex];
  return c === undefined ? null : describeCorner(c, tolerance);
}

const COLUMNS: [string, (r: Result, p: Part | undefined, tolerance: number) => Cell][] = [
  ["rank", (r) => r.rank],
  ["part number", (r) => r.partNumber],
  ["maker", (_, p) => p?.maker ?? null],
  ["series", (_, p) => p?.series ?? null],
  ["material", (_, p) => p?.material ?? null],
  ["status", (r) => r.status],
  ["score (0-100)", (r) => num(r.score)],
  ["on trade-off front", (r) => (r.pareto ? "yes" : "no")],
  ["inductance (H)", (_, p) => num(p?.inductance ?? null)],
  ["tolerance (fraction)", (_, p) => num(p?.tolerance ?? null)],
  ["DCR used for losses (ohm)", (_, p) => num(p === undefined ? null : lossDcr(p))],
  ["Isat (A)", (_, p) => num(p?.isat ?? null)],
  ["rated heating current (A)", (_, p) => num(p?.irms ?? null)],
  ["SRF (Hz)", (_, p) => num(p?.srf ?? null)],
  ["length (m)", (_, p) => num(p?.length ?? null)],
  ["width (m)", (_, p) => num(p?.width ?? null)],
  ["height (m)", (_, p) => num(p?.height ?? null)],
  ["price (list currency)", (_, p) => num(p?.price ?? null)],
  ["worst peak |i| (A)", (r) => num(r.worst.peakMagnitude.value)],
  ["worst peak corner", (r, _, t) => corner(r, r.worst.peakMagnitude, t)],
  ["worst RMS current (A)", (r) => num(r.worst.irms.value)],
  ["worst ripple peak-to-peak (A)", (r) => num(r.worst.ripple.value)],
  ["worst total loss (W)", (r) => num(r.worst.totalLoss.value)],
  ["worst loss corner", (r, _, t) => corner(r, r.worst.totalLoss, t)],
  ["worst core loss (W)", (r) => num(r.worst.coreLoss?.value ?? null)],
  ["worst temperature rise (K)", (r) => num(r.worst.tempRise?.value ?? null)],
  ["smallest current margin (fraction)", (r) => num(r.minMargin)],
  ["failures", (r) => r.failures.join("; ")],
  ["not checked", (r) => r.unchecked.join("; ")],
];

/**
 * Ranked results as CSV for spreadsheets: SI units named in the headers, numbers as plain
 * numbers, text quoted and neutralised against formula injection, CRLF line ends (RFC 4180) and a
 * UTF-8 byte-order mark so that spreadsheet programs read µ, ° and − correctly. The browser's
 * export and `rank --csv` both write this text.
 */
export function resultsCsv(spec: Spec, results: readonly Result[], parts: readonly Part[]): string {
  const byNumber = new Map(parts.map((p) => [p.partNumber, p]));
  const lines = [COLUMNS.map(([header]) => csvCell(header)).join(",")];
  for (const r of results) {
    const p = byNumber.get(r.partNumber);
    const tolerance = p?.tolerance ?? spec.assumedTolerance;
    lines.push(COLUMNS.map(([, cell]) => csvCell(cell(r, p, tolerance))).join(","));
  }
  return `\uFEFF${lines.join("\r\n")}\r\n`;
}
