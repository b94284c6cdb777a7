import { parseUnit, plainDecimalToSi, powerOfTen, SI_PREFIX, SI_SYMBOL, toSiText } from "./parseUnit.ts";
import type { Dimension, Unit } from "./types.ts";

export type CellResult =
  | { kind: "missing" }
  | { kind: "value"; value: number; note: string | null }
  | { kind: "error"; reason: string };

export interface CellContext {
  dimension: Dimension;
  /** Unit of the column for bare numbers; null means SI (factor 1). */
  unit: Unit | null;
  decimalComma: boolean;
  rangePick: "low" | "high" | "mid";
  /** Accept EIA tolerance letters (J = 5 %, K = 10 %, M = 20 % …). */
  toleranceLetters?: boolean;
}

const MISSING: CellResult = { kind: "missing" };
const MISSING_TEXT = /^(?:-+|—|–|n\/?a|n\.a\.?|nan|tbd|tba|none|null|\?+)$/i;
/** EIA-198 tolerance letter codes for inductors and capacitors. */
const TOLERANCE_LETTER: Readonly<Record<string, number>> = { F: 0.01, G: 0.02, H: 0.03, J: 0.05, K: 0.1, L: 0.15, M: 0.2, N: 0.3 };
const LEADING_QUALIFIER = /^(?:(?:typ(?:ical)?|max(?:imum)?|min(?:imum)?|nom(?:inal)?|approx(?:imately)?|ca)\.?(?:\s+|(?=[\d.,+\-±])|$)|[~≈<>≤≥=]\s*|\+\/-\s*|\+-\s*|±\s*)/i;
const TRAILING_QUALIFIER = /\s*\(?\b(?:typ(?:ical)?|max(?:imum)?|min(?:imum)?|nom(?:inal)?|approx|drop|rise|ref)\.?\)?\s*$/i;
const LABEL_PREFIX = /^[^\d\s=:.,+\-±]{1,12}\s*[=:]\s*/;
const CURRENCY_LEADING = /^(?:US\$|\$|€|£|¥)\s*/;
const CURRENCY_TRAILING = /\s*(?:USD|EUR|GBP|JPY|CNY|RMB|CHF|US\$|\$|€|£|¥)$/i;
const R_NOTATION = /^(\d*)[Rr](\d*)(?![\d.,])/;
const PREFIX_DECIMAL = /^(\d+)([pnuµμmkKMG])(\d+)(?![\d.,])/;
const RANGE = /^(.+?)\s*(?:–|—|~|\.\.\.?|…|\bto\b|(?<=[\d\sA-Za-z%µμΩ])-(?=\s*[\d.,R])|\/)\s*(.+)$/;

function isDigit(c: string | undefined): boolean {
  return c !== undefined && c >= "0" && c <= "9";
}

/** True when s[i] is followed by exactly three digits: a thousands group. */
function isGroup(s: string, i: number): boolean {
  return isDigit(s[i + 1]) && isDigit(s[i + 2]) && isDigit(s[i + 3]) && !isDigit(s[i + 4]);
}

/**
 * Scans a decimal number at s[i]: thousands separators (the other mark, space, apostrophe, thin
 * space) are taken only before a group of exactly three digits, so "1,500" is 1500 in a
 * decimal-point file and "1.500" is 1500 in a decimal-comma file, while "4,7" and "4.7" read as
 * 4.7 in either (lenient, the mark cannot mean anything else there).
 */
function scanNumber(s: string, start: number, decimalComma: boolean): { text: string; end: number } | null {
  const decimalMark = decimalComma ? "," : ".";
  const otherMark = decimalComma ? "." : ",";
  let i = start;
  let text = "";
  let digits = false;
  let decimal = false;
  while (i < s.length) {
    const c = s[i] as string;
    if (isDigit(c)) {
      text += c;
      digits = true;
      i++;
    } else if (!decimal && (c === decimalMark || c === otherMark)) {
      if (c === otherMark && digits && isGroup(s, i)) {
        i++;
      } else if (isDigit(s[i + 1])) {
        text += ".";
        decimal = true;
        i++;
      } else break;
    } else if (!decimal && digits && (c === " " || c === "'" || c === "\u2009" || c === "\u202f" || c === "\u00a0") && isGroup(s, i)) {
      i++;
    } else break;
  }
  if (!digits) return null;
  if ((s[i] === "e" || s[i] === "E") && (isDigit(s[i + 1]) || ((s[i + 1] === "-" || s[i + 1] === "+") && isDigit(s[i + 2])))) {
    let j = i + 1;
    let exp = "e";
    if (s[j] === "-" || s[j] === "+") exp += s[j++];
    while (isDigit(s[j])) exp += s[j++];
    text += exp;
    i = j;
  }
  return { text, end: i };
}

interface Single {
  /** The number as decimal text ("-4.7", "1.5e3"). */
  text: string;
  /** Factor and offset to SI given by the cell itself; null: the column's unit applies. */
  unit: Unit | null;
}

const SI_UNIT: Unit = { dimension: "number", factor: 1, exponent: 0, offset: 0, symbol: "" };
function prefixUnit(factor: number, offset = 0): Unit {
  return { dimension: "number", factor, exponent: powerOfTen(factor), offset, symbol: "" };
}

const PHYSICAL_PREFIXABLE: ReadonlySet<Dimension> = new Set(["inductance", "resistance", "current", "frequency", "length", "number", "volume"]);

function describe(dimension: Dimension): string {
  return dimension === "fraction" ? "percentage" : dimension === "temperatureRise" ? "temperature rise" : dimension;
}

/** One number with an optional unit or SI prefix; a string is the reason it is not one. */
function parseSingle(s: string, ctx: CellContext): Single | string {
  let rest = s.trim();
  let sign = 1;
  if (rest.startsWith("-") || rest.startsWith("+")) {
    if (rest.startsWith("-")) sign = -1;
    rest = rest.slice(1).trimStart();
  }
  let value: string;
  let prefix: number | null = null;
  const r = R_NOTATION.exec(rest);
  const p = r === null ? PREFIX_DECIMAL.exec(rest) : null;
  if (r !== null && ((r[1] ?? "") !== "" || (r[2] ?? "") !== "")) {
    // "4R7" = 4.7, "R47" = 0.47, "47R" = 47: R marks the decimal point, in the column's unit.
    value = `${r[1] || "0"}.${r[2] || "0"}`;
    rest = rest.slice(r[0].length).trim();
  } else if (p !== null) {
    // "4n7" = 4.7 n: the prefix letter marks the decimal point and scales the base unit.
    value = `${p[1]}.${p[3]}`;
    prefix = SI_PREFIX[p[2] as string] ?? 1;
    rest = rest.slice(p[0].length).trim();
  } else {
    const scanned = scanNumber(rest, 0, ctx.decimalComma);
    if (scanned === null) return "is not a number";
    value = scanned.text;
    rest = rest.slice(scanned.end).trim();
  }
  const text = sign < 0 ? `-${value}` : value;
  if (rest === "") return { text, unit: prefix === null ? null : prefixUnit(prefix) };
  const unit = parseUnit(rest, ctx.dimension);
  if (unit !== null) {
    if (prefix !== null) {
      if (unit.factor !== 1) return `has two prefixes ("${rest}")`;
      return { text, unit: prefixUnit(prefix, unit.offset) };
    }
    return { text, unit };
  }
  const prefixAlone = SI_PREFIX[rest];
  if (prefix === null && prefixAlone !== undefined && PHYSICAL_PREFIXABLE.has(ctx.dimension)) {
    return { text, unit: prefixUnit(prefixAlone) };
  }
  const other = parseUnit(rest);
  if (other !== null && other.dimension !== ctx.dimension) {
    return `has unit "${rest}", a ${describe(other.dimension)}, where a ${describe(ctx.dimension)} is expected`;
  }
  return `has unrecognised text "${rest}" after the number`;
}

function toSi(single: Single, ctx: CellContext): number {
  return toSiText(single.text, single.unit ?? ctx.unit ?? SI_UNIT);
}

function unitLabel(ctx: CellContext): string {
  return ctx.unit?.symbol ?? SI_SYMBOL[ctx.dimension];
}

/**
 * Reads one numeric cell into SI. Handles SI prefixes and units in the cell, qualifiers
 * ("typ", "max", "±", "≤"), ranges (taking ctx.rangePick), R-notation and decimal commas.
 * Never throws: a value, "missing" or a reason.
 */
export function parseNumberCell(raw: string, ctx: CellContext): CellResult {
  const unit = ctx.unit;
  const plain = plainDecimalToSi(raw, unit, ctx.decimalComma);
  if (!Number.isNaN(plain)) return { kind: "value", value: plain, note: null };
  let s = raw
    .replace(/[\u2212\u2012]/g, "-")
    .replace(/[\u00a0\u2009\u202f]/g, " ")
    .trim();
  if (s === "" || MISSING_TEXT.test(s)) return MISSING;
  if (ctx.toleranceLetters === true) {
    const letter = TOLERANCE_LETTER[s.toUpperCase()];
    if (letter !== undefined && s.length === 1) return { kind: "value", value: letter, note: null };
  }
  const at = s.indexOf("@");
  if (at > 0) s = s.slice(0, at).trim();
  for (let k = 0; k < 4; k++) {
    const before = s;
    s = s.replace(LEADING_QUALIFIER, "").replace(TRAILING_QUALIFIER, "").replace(LABEL_PREFIX, "").trim();
    if (ctx.dimension === "currency") s = s.replace(CURRENCY_LEADING, "").replace(CURRENCY_TRAILING, "").trim();
    if (s === before) break;
  }
  if (s === "" || MISSING_TEXT.test(s)) return MISSING;
  const finish = (v: number, note: string | null): CellResult => {
    if (!Number.isFinite(v)) return { kind: "error", reason: `"${raw}" is not a finite number` };
    // A negative percentage in a tolerance or drop column states a decrease: "−30 %" drops 30 %.
    return { kind: "value", value: ctx.dimension === "fraction" ? Math.abs(v) : v, note };
  };
  const single = parseSingle(s, ctx);
  if (typeof single !== "string") return finish(toSi(single, ctx), null);
  const range = RANGE.exec(s);
  if (range !== null) {
    const a = parseSingle(range[1] as string, ctx);
    const b = parseSingle(range[2] as string, ctx);
    if (typeof a !== "string" && typeof b !== "string") {
      // "4.5–5.5 A": a unit written once after the range applies to both ends.
      const first = toSi(a.unit === null && b.unit !== null ? { text: a.text, unit: b.unit } : a, ctx);
      const second = toSi(b, ctx);
      if (ctx.dimension === "fraction") {
        const v = Math.max(Math.abs(first), Math.abs(second));
        return finish(v, `range "${raw}": took the larger magnitude`);
      }
      const lo = Math.min(first, second);
      const hi = Math.max(first, second);
      const v = ctx.rangePick === "low" ? lo : ctx.rangePick === "high" ? hi : (lo + hi) / 2;
      const which = ctx.rangePick === "low" ? "the lower end" : ctx.rangePick === "high" ? "the upper end" : "the middle";
      return finish(v, `range "${raw}": took ${which} (conservative)`);
    }
  }
  return { kind: "error", reason: `"${raw}" ${single} (column unit ${unitLabel(ctx) || "none"})` };
}
