import { isVisibleAscii } from "./findHeaderRow.ts";
import { plainDecimalInRange } from "./parseUnit.ts";
import type { Unit } from "./types.ts";

/**
 * One record of a part list, read without making a string of every cell. A cell is either a
 * range of the file's text (most cells: plain, unquoted) or a string (a quoted cell after
 * unescaping, or every cell when the record came from papaparse). Numbers are read straight
 * from the text, so a 100 000-row list does not allocate 1.7 million short strings only to turn
 * them into numbers; that allocation was most of the import's cost.
 *
 * One object is reused for every record: a consumer that keeps a cell keeps `cell(c)`, never the
 * object.
 */
export class RecordCells {
  /** 1-based line on which the record starts. */
  line = 1;
  /** Number of cells in the record. */
  count = 0;
  private text = "";
  private starts = new Int32Array(64);
  private ends = new Int32Array(64);
  /** A cell's own string where it is not a plain range of the text; null entries are ranges. */
  private values: (string | null)[] = [];
  private hasValues = false;

  /** Starts a record read from `text` (cells follow through addRange / addValue). */
  beginText(text: string, line: number): void {
    this.text = text;
    this.line = line;
    this.count = 0;
    if (this.hasValues) {
      this.values.fill(null);
      this.hasValues = false;
    }
  }

  addRange(start: number, end: number): void {
    const c = this.count;
    if (c === this.starts.length) this.growTo(c * 2);
    this.starts[c] = start;
    this.ends[c] = end;
    this.count = c + 1;
  }

  addValue(value: string): void {
    const c = this.count;
    if (c === this.starts.length) this.growTo(c * 2);
    this.starts[c] = 0;
    this.ends[c] = -1;
    while (this.values.length <= c) this.values.push(null);
    this.values[c] = value;
    this.hasValues = true;
    this.count = c + 1;
  }

  /** The record as papaparse gives it: every cell a string. */
  setCells(cells: readonly string[], line: number): void {
    this.beginText("", line);
    for (const cell of cells) this.addValue(cell);
  }

  /** The cell's text, "" past the end of the record. */
  cell(c: number): string {
    if (c >= this.count) return "";
    const end = this.ends[c] as number;
    return end < 0 ? (this.values[c] as string) : this.text.slice(this.starts[c], end);
  }

  cellLength(c: number): number {
    if (c >= this.count) return 0;
    const end = this.ends[c] as number;
    return end < 0 ? (this.values[c] as string).length : end - (this.starts[c] as number);
  }

  /** True when the cell is exactly `s`, compared in place ("" past the end of the record). */
  cellIs(c: number, s: string): boolean {
    if (c >= this.count) return s === "";
    const end = this.ends[c] as number;
    if (end < 0) return this.values[c] === s;
    const start = this.starts[c] as number;
    if (end - start !== s.length) return false;
    const text = this.text;
    for (let i = 0; i < s.length; i++) if (text.charCodeAt(start + i) !== s.charCodeAt(i)) return false;
    return true;
  }

  /** The cell as a plain decimal in `unit`, in SI; NaN when it is anything else (see plainDecimalToSi). */
  plainNumber(c: number, unit: Unit | null, decimalComma: boolean): number {
    if (c >= this.count) return NaN;
    const end = this.ends[c] as number;
    if (end < 0) {
      const value = this.values[c] as string;
      return plainDecimalInRange(value, 0, value.length, unit, decimalComma);
    }
    return plainDecimalInRange(this.text, this.starts[c] as number, end, unit, decimalComma);
  }

  /** True when every cell is empty or white space (as String.prototype.trim sees it). */
  isBlank(): boolean {
    for (let c = 0; c < this.count; c++) {
      const end = this.ends[c] as number;
      if (end < 0) {
        const value = this.values[c] as string;
        if (value.length > 0 && (isVisibleAscii(value.charCodeAt(0)) || value.trim() !== "")) return false;
      } else {
        const start = this.starts[c] as number;
        // Most cells start with a visible character: decide without a trimmed copy.
        if (end > start && (isVisibleAscii(this.text.charCodeAt(start)) || this.text.slice(start, end).trim() !== "")) return false;
      }
    }
    return true;
  }

  /** Every cell as a string, for a rejected row (kept whole so nothing is lost). */
  cells(): string[] {
    const out = new Array<string>(this.count);
    for (let c = 0; c < this.count; c++) out[c] = this.cell(c);
    return out;
  }

  private growTo(size: number): void {
    const starts = new Int32Array(size);
    const ends = new Int32Array(size);
    starts.set(this.starts);
    ends.set(this.ends);
    this.starts = starts;
    this.ends = ends;
  }
}
