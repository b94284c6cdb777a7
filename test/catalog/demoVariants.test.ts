import { readFileSync } from "node:fs";
import { join } from "node:path";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { importPartListBytes } from "../../src/catalog/importPartListBytes.ts";
import type { Part } from "../../src/engine/types.ts";
import { generateDemoParts, mainCsv, messyCsv, variantRNotation, variantSemicolon, variantSubset, variantTabbed } from "../../sample-parts/generate.ts";
import { close, si } from "./siReference.ts";

const DIR = join(import.meta.dirname, "../../sample-parts");
const read = (name: string) => readFileSync(join(DIR, name));
const VARIANTS = ["demo-variant-tabbed.tsv", "demo-variant-semicolon.csv", "demo-variant-rnotation.csv"];
const NUMERIC: (keyof Part)[] = ["inductance", "tolerance", "dcrTyp", "dcrMax", "isat", "isatDrop", "irms", "irmsRise", "srf", "price"];
const SIZES: (keyof Part)[] = ["length", "width", "height"];

describe("sample-parts demo catalogs", () => {
  const main = importPartListBytes(read("demo-parts.csv"));

  it("generate.ts reproduces the committed files byte for byte", () => {
    const parts = generateDemoParts();
    const subset = variantSubset(parts);
    expect(read("demo-parts.csv").toString("utf8")).toBe(mainCsv(parts));
    expect(read("demo-variant-tabbed.tsv").toString("utf8")).toBe(variantTabbed(subset));
    expect(read("demo-variant-semicolon.csv").toString("utf8")).toBe(variantSemicolon(subset));
    expect(read("demo-variant-rnotation.csv").toString("utf8")).toBe(variantRNotation(subset));
  });

  it("importPartList(demo-parts.csv) matches papaparse + mathjs read of the same file", () => {
    // Reference: papaparse with header names, each column converted by mathjs from its header unit.
    const rows = Papa.parse<Record<string, string>>(read("demo-parts.csv").toString("utf8"), { header: true, skipEmptyLines: true }).data;
    expect(main.rejected).toEqual([]);
    expect(main.parts).toHaveLength(rows.length);
    expect(rows.length).toBeGreaterThanOrEqual(300);
    rows.forEach((row, i) => {
      const p = main.parts[i]!;
      expect(p.partNumber).toBe(row["Part Number"]);
      expect(close(p.inductance, si(`${row["Inductance (uH)"]} uH`, "H"))).toBe(true);
      expect(close(p.dcrTyp, si(`${row["DCR typ (mOhm)"]} mohm`, "ohm"))).toBe(true);
      expect(close(p.dcrMax, si(`${row["DCR max (mOhm)"]} mohm`, "ohm"))).toBe(true);
      expect(close(p.isat, si(`${row["Isat (A)"]} A`, "A"))).toBe(true);
      expect(close(p.srf, si(`${row["SRF (MHz)"]} MHz`, "Hz"))).toBe(true);
      expect(close(p.height, si(`${row["Height (mm)"]} mm`, "m"))).toBe(true);
      expect(close(p.tolerance, Number(row["Tolerance (%)"]) / 100)).toBe(true);
    });
  });

  it("the demo scenario (3.3–10 µH, Isat 4–8 A) has a few dozen candidates and many misfits", () => {
    const fit = main.parts.filter((p) => p.inductance >= 3.3e-6 && p.inductance <= 10e-6 && p.isat !== null && p.isat >= 4 && p.isat <= 8);
    expect(fit.length).toBeGreaterThanOrEqual(24);
    expect(main.parts.length - fit.length).toBeGreaterThan(200);
    expect(new Set(main.parts.map((p) => p.material)).size).toBeGreaterThanOrEqual(3);
  });

  it.each(VARIANTS)("importPartList(%s) gives the same SI values as demo-parts.csv for its 60 parts", (name) => {
    const variant = importPartListBytes(read(name));
    expect(variant.rejected).toEqual([]);
    expect(variant.parts).toHaveLength(60);
    const byNumber = new Map(main.parts.map((p) => [p.partNumber, p]));
    for (const p of variant.parts) {
      const reference = byNumber.get(p.partNumber);
      expect(reference, p.partNumber).toBeDefined();
      for (const key of ["maker", "series", "material", "saturation", "rollOffExponent"] as const) expect(p[key]).toBe(reference![key]);
      for (const key of NUMERIC) expect(close(p[key] as number, reference![key] as number), `${p.partNumber} ${key}`).toBe(true);
      // Inch and mil figures are written to 8 significant digits.
      for (const key of SIZES) expect(close(p[key] as number, reference![key] as number, 1e-6), `${p.partNumber} ${key}`).toBe(true);
    }
  });
});

describe("sample-parts/demo-messy.csv", () => {
  it("importPartList(demo-messy.csv) rejects the rows its notes call rejected and warns where they say so", () => {
    const text = read("demo-messy.csv").toString("utf8");
    expect(text).toBe(messyCsv(generateDemoParts()));
    const r = importPartListBytes(read("demo-messy.csv"));
    expect(r.parts.length + r.rejected.length).toBe(r.dataRows);
    expect(r.title).toMatch(/Invented demo list/);
    const notes = Papa.parse<string[]>(text, { skipEmptyLines: true, comments: "#" }).data.slice(2);
    const rejectedNotes = notes.filter((n) => n[n.length - 1]!.startsWith("rejected")).length;
    expect(r.rejected).toHaveLength(rejectedNotes);
    expect(r.rejected.map((x) => x.field)).toEqual(["inductance", "partNumber", "dcrMax", "isat", "inductance", "partNumber"]);
    expect(r.warnings.some((w) => w.field === "inductance" && /check the unit/.test(w.message))).toBe(true);
    expect(r.warnings.some((w) => w.field === "dcrMax" && /below typical/.test(w.message))).toBe(true);
    expect(r.warnings.some((w) => w.field === "isat" && /lower end/.test(w.message))).toBe(true);
    expect(Object.values(r.extra).some((e) => e["Notes"] === "fine, with a note\non two lines")).toBe(true);
  });
});
