import { evaluate } from "mathjs";
import { describe, expect, it } from "vitest";
import { parseNumberCell, type CellContext } from "../../src/catalog/parseNumberCell.ts";
import { parseUnit } from "../../src/catalog/parseUnit.ts";
import type { Dimension } from "../../src/catalog/types.ts";
import { close, si } from "./siReference.ts";

function ctx(dimension: Dimension, unit: string | null, extra: Partial<CellContext> = {}): CellContext {
  return { dimension, unit: unit === null ? null : parseUnit(unit, dimension), decimalComma: false, rangePick: "mid", ...extra };
}

function value(raw: string, c: CellContext): number | null {
  const r = parseNumberCell(raw, c);
  return r.kind === "value" ? r.value : null;
}

// [cell, dimension, column unit, reference value, source of the reference]
const CASES: [string, Dimension, string | null, number, string][] = [
  ["4.7", "inductance", "uH", si("4.7 uH", "H"), "mathjs"],
  ["4.7µ", "inductance", "uH", si("4.7 uH", "H"), "mathjs (µ = U+00B5 micro sign)"],
  ["4.7μ", "inductance", "uH", si("4.7 uH", "H"), "mathjs (μ = U+03BC Greek mu)"],
  ["4.7 uH", "inductance", "nH", si("4.7 uH", "H"), "mathjs: a cell's own unit beats the column's"],
  ["4.7 µH", "inductance", null, si("4.7 uH", "H"), "mathjs"],
  ["470n", "inductance", "uH", si("470 nH", "H"), "mathjs: a bare prefix scales the SI base unit"],
  ["470 nH", "inductance", "uH", si("470 nH", "H"), "mathjs"],
  ["2.2m", "resistance", "ohm", si("2.2 mohm", "ohm"), "mathjs"],
  ["2.2 mΩ", "resistance", "ohm", si("2.2 mohm", "ohm"), "mathjs"],
  ["45 mOhm", "resistance", "ohm", si("45 mohm", "ohm"), "mathjs"],
  ["1500 mA", "current", "A", si("1500 mA", "A"), "mathjs"],
  ["12.5 MHz", "frequency", "kHz", si("12.5 MHz", "Hz"), "mathjs"],
  ["250 kHz", "frequency", "MHz", si("250 kHz", "Hz"), "mathjs"],
  ["0.2 in", "length", "mm", si("0.2 in", "m"), "mathjs"],
  ["197 mil", "length", "mm", si("197 mil", "m"), "mathjs"],
  ["5.2 typ", "current", "A", 5.2, "the figure as written"],
  ["typ. 5.2", "current", "A", 5.2, "the figure as written"],
  ["max 45", "resistance", "mOhm", si("45 mohm", "ohm"), "mathjs"],
  ["≤ 45", "resistance", "mOhm", si("45 mohm", "ohm"), "mathjs"],
  ["45 (max)", "resistance", "mOhm", si("45 mohm", "ohm"), "mathjs"],
  ["3.2 A @ 30%", "current", "A", 3.2, "the figure as written (the condition is dropped)"],
  ["±20%", "fraction", "%", evaluate("20%"), "mathjs % operator"],
  ["20 %", "fraction", "%", evaluate("20%"), "mathjs % operator"],
  ["+/-20 %", "fraction", "%", evaluate("20%"), "mathjs % operator"],
  ["20", "fraction", "%", evaluate("20%"), "mathjs % operator"],
  ["-30%", "fraction", "%", evaluate("30%"), "mathjs % operator (a drop stated as a decrease)"],
  ["-20/+30 %", "fraction", "%", evaluate("30%"), "mathjs % operator: the larger side of an asymmetric tolerance"],
  ["ΔL=30%", "fraction", "%", evaluate("30%"), "mathjs % operator"],
  ["4R7", "inductance", "uH", si("4.7 uH", "H"), "IEC 60062 R as decimal marker; value via mathjs"],
  ["R47", "inductance", "uH", si("0.47 uH", "H"), "IEC 60062; mathjs"],
  ["47R", "inductance", "uH", si("47 uH", "H"), "IEC 60062; mathjs"],
  ["R012", "resistance", "ohm", si("0.012 ohm", "ohm"), "IEC 60062; mathjs"],
  ["4n7", "inductance", "uH", si("4.7 nH", "H"), "IEC 60062 prefix letter as decimal marker; mathjs"],
  ["2u2", "inductance", null, si("2.2 uH", "H"), "IEC 60062; mathjs"],
  ["1,500", "current", "mA", si("1500 mA", "A"), "mathjs; comma groups thousands in a decimal-point file"],
  ["1,234.5", "frequency", "kHz", si("1234.5 kHz", "Hz"), "mathjs"],
  ["10 000", "inductance", "nH", si("10000 nH", "H"), "ISO 80000-1 space grouping; mathjs"],
  ["4,7", "inductance", "uH", si("4.7 uH", "H"), "mathjs; a lone comma before other than three digits is a decimal sign"],
  ["1.5e3", "inductance", "nH", si("1500 nH", "H"), "mathjs"],
  [".47", "inductance", "uH", si("0.47 uH", "H"), "mathjs"],
  ["$0.25", "currency", null, 0.25, "the figure as written"],
  ["0.25 USD", "currency", null, 0.25, "the figure as written"],
];

describe("parseNumberCell", () => {
  it.each(CASES)("parseNumberCell(%j, %s in %s) matches the reference", (raw, dimension, unit, expected, _source) => {
    expect(close(value(raw, ctx(dimension, unit)), expected)).toBe(true);
  });

  it("parseNumberCell with a decimal comma reads dots as thousands separators (ISO 80000-1 allows either sign)", () => {
    const c = ctx("frequency", "kHz", { decimalComma: true });
    expect(close(value("45.600", c), si("45600 kHz", "Hz"))).toBe(true); // mathjs
    expect(close(value("1.234,5", c), si("1234.5 kHz", "Hz"))).toBe(true); // mathjs
    expect(close(value("4,7", ctx("inductance", "uH", { decimalComma: true })), si("4.7 uH", "H"))).toBe(true); // mathjs
    expect(close(value("0,33 µH", ctx("inductance", "nH", { decimalComma: true })), si("0.33 uH", "H"))).toBe(true); // mathjs
  });

  it("parseNumberCell(range) takes the end the quantity asks for", () => {
    // The range ends are the reference; which end is our documented, conservative choice.
    expect(value("4.5-5.5", ctx("current", "A", { rangePick: "low" }))).toBe(4.5);
    expect(close(value("40 ~ 50", ctx("resistance", "mOhm", { rangePick: "high" })), si("50 mohm", "ohm"))).toBe(true); // mathjs
    expect(close(value("4.5 to 5.5 A", ctx("current", "mA", { rangePick: "low" })), 4.5)).toBe(true);
    expect(close(value("9–11", ctx("inductance", "uH", { rangePick: "mid" })), si("10 uH", "H"))).toBe(true); // mathjs
    const r = parseNumberCell("4.5-5.5", ctx("current", "A", { rangePick: "low" }));
    expect(r.kind === "value" && r.note).toMatch(/lower end/);
  });

  it("parseNumberCell(tolerance letter) reads IEC 60062 codes", () => {
    const c = ctx("fraction", "%", { toleranceLetters: true });
    expect(value("M", c)).toBe(evaluate("20%")); // IEC 60062: M = ±20 %
    expect(value("K", c)).toBe(evaluate("10%")); // IEC 60062: K = ±10 %
    expect(value("J", c)).toBe(evaluate("5%")); // IEC 60062: J = ±5 %
  });

  it("parseNumberCell(empty or placeholder) is missing, not an error", () => {
    for (const raw of ["", "  ", "-", "—", "n/a", "N/A", "tbd"]) expect(parseNumberCell(raw, ctx("current", "A")).kind).toBe("missing");
  });

  it("parseNumberCell(garbage) gives a reason naming the cell", () => {
    const r = parseNumberCell("abc", ctx("current", "A"));
    expect(r.kind).toBe("error");
    expect(r.kind === "error" && r.reason).toContain('"abc"');
    const wrongUnit = parseNumberCell("5 mA", ctx("resistance", "mOhm"));
    expect(wrongUnit.kind === "error" && wrongUnit.reason).toMatch(/current.*resistance/);
    expect(parseNumberCell("4.7 uH x", ctx("inductance", "uH")).kind).toBe("error");
    expect(parseNumberCell("1e999", ctx("inductance", "uH")).kind).toBe("error");
  });

  it("parseNumberCell keeps the sign so the caller can refuse zero and negative values", () => {
    expect(close(value("-4.7", ctx("inductance", "uH")), si("-4.7 uH", "H"))).toBe(true); // mathjs
    expect(value("0", ctx("inductance", "uH"))).toBe(0);
  });
});
