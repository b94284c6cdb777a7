import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { decodeText } from "../../src/catalog/decodeText.ts";
import { importPartList } from "../../src/catalog/importPartList.ts";
import type { ImportResult } from "../../src/catalog/types.ts";

// 10 000 cases in all across the properties below.
const DIR = join(import.meta.dirname, "../../sample-parts");
const MAIN = readFileSync(join(DIR, "demo-parts.csv"), "utf8");
const VARIANTS = ["demo-variant-tabbed.tsv", "demo-variant-semicolon.csv", "demo-variant-rnotation.csv", "demo-parts.csv"].map((n) => readFileSync(join(DIR, n), "utf8"));
const TABLE = Papa.parse<string[]>(MAIN, { skipEmptyLines: true }).data;
const HEADER = TABLE[0]!;
const ROWS = TABLE.slice(1, 21);

function wellFormed(r: ImportResult, text: string): void {
  expect(r.parts.length + r.rejected.length).toBe(r.dataRows);
  const lines = text.split(/\r\n|\r|\n/).length;
  for (const x of r.rejected) {
    expect(x.row).toBeGreaterThanOrEqual(1);
    expect(x.row).toBeLessThanOrEqual(lines);
    expect(x.reason.length).toBeGreaterThan(0);
  }
}

const cell = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc.constantFrom("4.7", "4,7", "4R7", "R47", "470n", "4.7µ", "±20%", "1,500", "1.500", "-3", "0", "n/a", "", " ", '"', "#", "\n", ";", "\t", "|", "1e999", "4.5-5.5", "typ", "5 x 5 x 3"),
  fc.double({ noNaN: false }).map(String),
);

describe("importPartList fuzzing", () => {
  it("importPartList(decodeText(random bytes)) never throws and balances rows", () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => {
        const text = decodeText(bytes);
        wellFormed(importPartList(text), text);
      }),
      { numRuns: 2000 },
    );
  });

  it("importPartList(random cells under a known header) never throws and balances rows", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(",", ";", "\t", "|"),
        fc.array(fc.array(cell, { minLength: 0, maxLength: HEADER.length + 2 }), { maxLength: 12 }),
        (delimiter, rows) => {
          const text = Papa.unparse([HEADER, ...rows], { delimiter });
          wellFormed(importPartList(text), text);
        },
      ),
      { numRuns: 2500 },
    );
  });

  it("importPartList(shuffled and duplicated columns) imports the same parts", () => {
    const reference = importPartList(Papa.unparse([HEADER, ...ROWS])).parts;
    fc.assert(
      fc.property(
        fc.array(fc.nat({ max: HEADER.length - 1 }), { minLength: 1, maxLength: 8 }),
        fc.shuffledSubarray(
          HEADER.map((_, i) => i),
          { minLength: HEADER.length },
        ),
        fc.constantFrom(",", ";", "\t"),
        (duplicates, order, delimiter) => {
          const columns = [...order, ...duplicates];
          const table = [HEADER, ...ROWS].map((row) => columns.map((c) => row[c] ?? ""));
          const text = Papa.unparse(table, { delimiter });
          const r = importPartList(text);
          wellFormed(r, text);
          expect(r.parts).toEqual(reference);
        },
      ),
      { numRuns: 1500 },
    );
  });

  it("importPartList(truncated demo file) never throws and balances rows", () => {
    fc.assert(
      fc.property(fc.constantFrom(...VARIANTS), fc.double({ min: 0, max: 1, noNaN: true }), (text, at) => {
        const cut = text.slice(0, Math.floor(text.length * at * 0.2));
        wellFormed(importPartList(cut), cut);
      }),
      { numRuns: 2000 },
    );
  });

  it("importPartList(random structure characters) never throws and balances rows", () => {
    const alphabet = fc.constantFrom(",", ";", "\t", "|", '"', "\n", "\r\n", "\r", "#", " ", "4", ".", "L", "uH", "Part Number", "Inductance", "R", "x", "µ", "\ufeff");
    fc.assert(
      fc.property(fc.array(alphabet, { maxLength: 120 }), (pieces) => {
        const text = pieces.join("");
        wellFormed(importPartList(text), text);
      }),
      { numRuns: 2000 },
    );
  });
});
