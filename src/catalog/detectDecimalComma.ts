/** The first number-like run of a cell: digits with dots and commas ("1.234,5", "4,7", "10"). */
const NUMBER_RUN = /\d[\d.,]*/;
const SAMPLE_ROWS = 500;

/** +1: the cell reads as a decimal comma, -1: as a decimal point, 0: it cannot tell. */
function vote(cell: string): number {
  const m = NUMBER_RUN.exec(cell);
  if (m === null) return 0;
  const run = m[0].replace(/[.,]+$/, "");
  const comma = run.lastIndexOf(",");
  const dot = run.lastIndexOf(".");
  // With both marks the last one is the decimal sign: "1.234,5" or "1,234.5".
  if (comma >= 0 && dot >= 0) return comma > dot ? 1 : -1;
  const at = Math.max(comma, dot);
  if (at < 0) return 0;
  // "1,250" and "1.250" could be thousands or decimals; they decide nothing.
  if (run.length - at - 1 === 3 && run.indexOf(run[at] as string) === at) return 0;
  return comma >= 0 ? 1 : -1;
}

/**
 * True when the numeric cells of a list use a decimal comma: more cells read like "4,7" than like
 * "4.7" among the first rows. Decided once per file because a list never mixes the two.
 */
export function detectDecimalComma(rows: string[][], dataIndices: number[], numericColumns: number[]): boolean {
  let balance = 0;
  for (const r of dataIndices.slice(0, SAMPLE_ROWS)) {
    const row = rows[r] as string[];
    for (const c of numericColumns) {
      const cell = row[c];
      if (cell !== undefined && cell !== "") balance += vote(cell);
    }
  }
  return balance > 0;
}
