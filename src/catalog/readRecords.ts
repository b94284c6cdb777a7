import Papa from "papaparse";

export interface RecordProblem {
  /** Line of the record with the problem. */
  line: number | null;
  message: string;
}

export interface RecordChunk {
  rows: string[][];
  /** Record index of rows[0]. */
  start: number;
  /** 1-based line on which each record starts. */
  lines: number[];
}

/** Records are handed over in chunks of about this many characters, converted, and dropped. */
const CHUNK_CHARS = 512 * 1024;
const REGEX_SPECIAL = /[.*+?^${}()|[\]\\]/g;

/**
 * Comment lines (starting with "#", but not "#" then the delimiter, which is a cell "#") are
 * blanked, keeping the line count, because a quote inside a comment must not open a field.
 * The cost of that: such a line inside a quoted multi-line cell is blanked too.
 */
export function blankComments(input: string, delimiter: string): string {
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  if (!(text.startsWith("#") || text.includes("\n#") || text.includes("\r#"))) return text;
  return text.replace(new RegExp(`^#(?!${delimiter.replace(REGEX_SPECIAL, "\\$&")})[^\\r\\n]*`, "gm"), "");
}

function countOf(text: string, char: string, from: number, to: number): number {
  let n = 0;
  for (let at = text.indexOf(char, from); at >= 0 && at < to; at = text.indexOf(char, at + 1)) n++;
  return n;
}

function problemMessage(code: string): string {
  return code === "MissingQuotes"
    ? "a quoted cell is not closed: the rest of the file after it is read as one cell"
    : "a quoted cell has text after its closing quote";
}

/** Counts lines across chunks: a record starts on the line after the previous record's last. */
class LineCounter {
  line = 1;
  private cursor = 0;
  constructor(
    private readonly text: string,
    private readonly newline: string,
  ) {}

  /** Lines of the records parsed from the text up to `cursor` (null: unknown, count per cell). */
  number(rows: string[][], cursor: number | null): number[] {
    const lines = new Array<number>(rows.length);
    const breaks = cursor === null ? -1 : countOf(this.text, this.newline, this.cursor, cursor);
    const complete = cursor !== null && cursor >= this.text.length ? rows.length - 1 : rows.length;
    if (breaks === complete) {
      // As many line ends as records: no cell holds a line break.
      for (let i = 0; i < rows.length; i++) lines[i] = this.line + i;
      this.line += breaks;
    } else {
      for (let i = 0; i < rows.length; i++) {
        lines[i] = this.line;
        this.line += 1;
        for (const cell of rows[i] as string[]) {
          for (let at = cell.indexOf(this.newline); at >= 0; at = cell.indexOf(this.newline, at + 1)) this.line++;
        }
      }
    }
    if (cursor !== null) this.cursor = cursor;
    return lines;
  }
}

/** The character that ends a line in papaparse's reading of the file ("\r\n" is counted by its "\n"). */
function newlineOf(linebreak: string): string {
  return linebreak === "\r" ? "\r" : "\n";
}

/** The first `count` records, for finding the header before the whole file is read. */
export function previewRecords(text: string, delimiter: string, count: number): { chunk: RecordChunk; truncated: boolean; linebreak: string } {
  const parsed = Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false, preview: count });
  const counter = new LineCounter(text, newlineOf(parsed.meta.linebreak));
  const rows = parsed.data;
  // Where a preview stops is not reported reliably; counting per cell does not depend on it.
  const lines = counter.number(rows, null);
  return { chunk: { rows, start: 0, lines }, truncated: rows.length >= count, linebreak: parsed.meta.linebreak };
}

/**
 * Splits text into records with papaparse, chunk by chunk, and hands each chunk with the line
 * each record starts on to `onChunk`. Chunks let the caller turn rows into parts while they are
 * young and drop them, where one whole-file parse keeps every cell of 100 000 rows alive.
 */
export function readRecords(text: string, delimiter: string, onChunk: (chunk: RecordChunk) => void, linebreak?: string): RecordProblem[] {
  let counter: LineCounter | null = null;
  const problems: RecordProblem[] = [];
  let start = 0;
  // With a string input papaparse streams synchronously: every chunk is handled before parse returns.
  Papa.parse<string[]>(text, {
    delimiter,
    // Given once (from the preview), papaparse does not guess it again for every chunk.
    ...(linebreak === undefined ? {} : { newline: linebreak as "\r" | "\n" | "\r\n" }),
    skipEmptyLines: false,
    chunkSize: CHUNK_CHARS,
    complete: () => undefined,
    chunk: (results: Papa.ParseResult<string[]>) => {
      const rows = results.data;
      const cursor = results.meta.cursor;
      // Papaparse settles the line break on the first chunk and keeps it for the rest.
      counter ??= new LineCounter(text, newlineOf(results.meta.linebreak));
      const lines = counter.number(rows, cursor);
      for (const e of results.errors) {
        if (e.type === "Quotes") problems.push({ line: lines[e.row ?? 0] ?? null, message: problemMessage(e.code) });
      }
      onChunk({ rows, start, lines });
      start += rows.length;
    },
  });
  return problems;
}

/**
 * The records that start on the given 1-based lines (as readRecords numbers them), read again
 * from the text: one pass to find where those lines start, then one short parse for each.
 */
export function recordsAtLines(text: string, delimiter: string, lines: readonly number[], linebreak: string): Map<number, string[]> {
  const out = new Map<number, string[]>();
  if (lines.length === 0) return out;
  const wanted = [...new Set(lines)].sort((a, b) => a - b);
  const newline = newlineOf(linebreak);
  let line = 1;
  let at = 0;
  for (const target of wanted) {
    while (line < target) {
      const next = text.indexOf(newline, at);
      if (next < 0) return out;
      at = next + 1;
      line++;
    }
    const parsed = Papa.parse<string[]>(text.slice(at), { delimiter, newline: linebreak as "\r" | "\n" | "\r\n", skipEmptyLines: false, preview: 1 });
    out.set(target, parsed.data[0] ?? []);
  }
  return out;
}
