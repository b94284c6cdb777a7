import fc from "fast-check";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { readRecords } from "../../src/catalog/readRecords.ts";
import { RecordCells } from "../../src/catalog/RecordCells.ts";
import { scanRecords } from "../../src/catalog/scanRecords.ts";

interface Read {
  rows: string[][];
  lines: number[];
}

function scanned(text: string, delimiter: string, linebreak: string): Read | null {
  const cells = new RecordCells();
  const rows: string[][] = [];
  const lines: number[] = [];
  const ok = scanRecords(text, delimiter, linebreak, cells, (index) => {
    expect(index).toBe(rows.length);
    rows.push(cells.cells());
    lines.push(cells.line);
  });
  return ok ? { rows, lines } : null;
}

/** Reference: papaparse (through readRecords, which adds the line numbers), less its final empty record. */
function papaparsed(text: string, delimiter: string, linebreak: string): Read {
  const rows: string[][] = [];
  const lines: number[] = [];
  readRecords(
    text,
    delimiter,
    (chunk) => {
      rows.push(...chunk.rows);
      lines.push(...chunk.lines);
    },
    linebreak,
  );
  const last = rows[rows.length - 1];
  if (last !== undefined && last.length === 1 && last[0] === "" && (text.endsWith(linebreak) || text === "")) {
    rows.pop();
    lines.pop();
  }
  return { rows, lines };
}

const DELIMITERS = [",", ";", "\t", "|"] as const;
const LINEBREAKS = ["\n", "\r\n", "\r"] as const;

/** Cells as a vendor writes them: plain text (a quote anywhere but first), or quoted with anything inside. */
function cellArb(delimiter: string) {
  const plainChar = fc.constantFrom("a", "B", "4", ".", ",", " ", "µ", "-", '"', delimiter === ";" ? "x" : ";");
  const anyChar = fc.constantFrom("a", "4", delimiter, '"', "\n", "\r", " ", "Ω");
  const plain = fc
    .array(plainChar, { maxLength: 8 })
    .map((cs) => cs.join("").split(delimiter).join(""))
    .filter((s) => !s.startsWith('"') && !/[\r\n]/.test(s));
  const quoted = fc.array(anyChar, { maxLength: 8 }).map((cs) => `"${cs.join("").replaceAll('"', '""')}"`);
  return fc.oneof(plain, quoted);
}

describe("scanRecords", () => {
  it("scanRecords splits well-formed text into the records and lines papaparse gives (reference: papaparse)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...DELIMITERS).chain((delimiter) =>
          fc.record({
            delimiter: fc.constant(delimiter),
            linebreak: fc.constantFrom(...LINEBREAKS),
            records: fc.array(fc.array(cellArb(delimiter), { minLength: 1, maxLength: 5 }), { maxLength: 12 }),
            trailing: fc.boolean(),
          }),
        ),
        ({ delimiter, linebreak, records, trailing }) => {
          const text = records.map((r) => r.join(delimiter)).join(linebreak) + (trailing && records.length > 0 ? linebreak : "");
          const mine = scanned(text, delimiter, linebreak);
          expect(mine).not.toBeNull();
          expect(mine).toEqual(papaparsed(text, delimiter, linebreak));
        },
      ),
      { numRuns: 3000 },
    );
  });

  it("scanRecords either agrees with papaparse or declines, on any text of delimiters, quotes and line breaks (reference: papaparse)", () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom("a", "7", ",", '"', "\n", "\r", " "), { maxLength: 40 }), fc.constantFrom(...LINEBREAKS), (chars, linebreak) => {
        const text = chars.join("");
        const mine = scanned(text, ",", linebreak);
        if (mine !== null) expect(mine).toEqual(papaparsed(text, ",", linebreak));
      }),
      { numRuns: 5000 },
    );
  });

  it("scanRecords declines an unclosed quote and text after a closing quote, where papaparse reports a problem", () => {
    for (const text of ['a,b\n"c,d\ne,f\n', 'a,"b"c,d\n']) {
      expect(scanned(text, ",", "\n")).toBeNull();
      expect(Papa.parse(text, { delimiter: ",", newline: "\n" }).errors.some((e) => e.type === "Quotes")).toBe(true);
    }
  });

  it("scanRecords counts the lines of a multi-line quoted cell toward the next record", () => {
    const r = scanned('P1,"two\nlines",4.7\nP2,x,1\n', ",", "\n");
    expect(r).toEqual({ rows: [["P1", "two\nlines", "4.7"], ["P2", "x", "1"]], lines: [1, 3] });
  });
});

describe("RecordCells", () => {
  it("RecordCells reads plain numbers in place and compares cells without slicing", () => {
    const cells = new RecordCells();
    const text = 'P1,4.7,"1,5", x ';
    expect(scanRecords(text, ",", "\n", cells, () => undefined)).toBe(true);
    expect(cells.count).toBe(4);
    expect(cells.plainNumber(1, null, false)).toBe(4.7);
    // A quoted cell is its own string: "1,5" is read with the decimal comma when the list has one.
    expect(cells.plainNumber(2, null, true)).toBe(1.5);
    expect(cells.plainNumber(3, null, false)).toBeNaN();
    expect(cells.plainNumber(9, null, false)).toBeNaN();
    expect(cells.cellIs(0, "P1")).toBe(true);
    expect(cells.cellIs(0, "P2")).toBe(false);
    expect(cells.cellIs(2, "1,5")).toBe(true);
    expect(cells.cellIs(7, "")).toBe(true);
    expect(cells.cellLength(3)).toBe(3);
    expect(cells.isBlank()).toBe(false);
  });

  it("RecordCells sees a record of spaces, tabs and no-break spaces as blank, as String.prototype.trim does", () => {
    const cells = new RecordCells();
    scanRecords(' ,\u00a0,"\t",', ",", "\n", cells, () => undefined);
    expect(cells.isBlank()).toBe(true);
    cells.setCells(["", " x"], 4);
    expect(cells.isBlank()).toBe(false);
    expect(cells.line).toBe(4);
  });

  it("RecordCells holds records wider than its first buffer", () => {
    const cells = new RecordCells();
    const text = Array.from({ length: 200 }, (_, i) => String(i)).join(",");
    scanRecords(text, ",", "\n", cells, () => undefined);
    expect(cells.count).toBe(200);
    expect(cells.cell(199)).toBe("199");
    expect(cells.plainNumber(150, null, false)).toBe(150);
  });
});
