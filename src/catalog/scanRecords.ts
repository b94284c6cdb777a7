import type { RecordCells } from "./RecordCells.ts";

const QUOTE = 34;

function countOf(text: string, char: string, from: number, to: number): number {
  let n = 0;
  for (let at = text.indexOf(char, from); at >= 0 && at < to; at = text.indexOf(char, at + 1)) n++;
  return n;
}

/**
 * Splits well-formed delimited text (RFC 4180: a field that starts with a quote runs to the
 * closing quote, "" inside it is one quote, and the closing quote is followed by the delimiter,
 * the line break or the end) into records, the same records papaparse gives with this delimiter
 * and line break, without making a string of every cell: each record is loaded into `cells` and
 * handed to `onRecord` with its index. Lines without a quote are split with indexOf, which is
 * most of a part list.
 *
 * Returns false, possibly after some records, as soon as a quote is not closed or text follows a
 * closing quote: papaparse's recovery and its problem reports then apply, so the caller reads
 * the whole text again with papaparse. A quote inside an unquoted cell is a plain character, as
 * in papaparse. The final empty record papaparse gives after a trailing line break is not given.
 */
export function scanRecords(text: string, delimiter: string, linebreak: string, cells: RecordCells, onRecord: (index: number) => void): boolean {
  const n = text.length;
  const breakLength = linebreak.length;
  // Lines are counted as readRecords counts them: "\r\n" by its "\n", so a lone "\n" inside a
  // cell of a CRLF file starts a line too.
  const newline = linebreak === "\r" ? "\r" : "\n";
  const delimiterCode = delimiter.charCodeAt(0);
  let pos = 0;
  let line = 1;
  let index = 0;
  let nextQuote = text.indexOf('"');
  if (nextQuote < 0) nextQuote = n;
  let nextNewline = text.indexOf(newline);
  if (nextNewline < 0) nextNewline = n;
  while (pos < n) {
    const recordStart = pos;
    let recordEnd: number;
    let lineEnd = text.indexOf(linebreak, pos);
    if (lineEnd < 0) lineEnd = n;
    if (nextQuote < pos) {
      nextQuote = text.indexOf('"', pos);
      if (nextQuote < 0) nextQuote = n;
    }
    cells.beginText(text, line);
    if (nextQuote >= lineEnd) {
      for (let s = pos; ; ) {
        const e = text.indexOf(delimiter, s);
        if (e < 0 || e > lineEnd) {
          cells.addRange(s, lineEnd);
          break;
        }
        cells.addRange(s, e);
        s = e + 1;
      }
      recordEnd = lineEnd;
      pos = lineEnd + breakLength;
    } else {
      for (let s = pos; ; ) {
        if (text.charCodeAt(s) === QUOTE) {
          let value = "";
          let from = s + 1;
          let close: number;
          for (;;) {
            close = text.indexOf('"', from);
            if (close < 0) return false;
            if (text.charCodeAt(close + 1) !== QUOTE) break;
            value += text.slice(from, close + 1);
            from = close + 2;
          }
          value += text.slice(from, close);
          cells.addValue(value);
          const after = close + 1;
          if (after >= n) {
            recordEnd = pos = n;
            break;
          }
          if (text.charCodeAt(after) === delimiterCode) {
            s = after + 1;
            continue;
          }
          if (text.startsWith(linebreak, after)) {
            recordEnd = after;
            pos = after + breakLength;
            break;
          }
          return false;
        }
        // A quoted cell may have run over line breaks: find this line's end again.
        if (lineEnd < s) {
          lineEnd = text.indexOf(linebreak, s);
          if (lineEnd < 0) lineEnd = n;
        }
        const e = text.indexOf(delimiter, s);
        if (e >= 0 && e < lineEnd) {
          cells.addRange(s, e);
          s = e + 1;
          continue;
        }
        cells.addRange(s, lineEnd);
        recordEnd = lineEnd;
        pos = lineEnd + breakLength;
        break;
      }
    }
    onRecord(index++);
    if (nextNewline < recordStart) {
      nextNewline = text.indexOf(newline, recordStart);
      if (nextNewline < 0) nextNewline = n;
    }
    line += 1 + (nextNewline < recordEnd ? countOf(text, newline, nextNewline, recordEnd) : 0);
  }
  return true;
}
