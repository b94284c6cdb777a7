import Papa from "papaparse";
import { recogniseHeader } from "./recogniseHeader.ts";

/** Tab first: it never appears inside data; then ";" (decimal-comma lists), "|", ",". */
const CANDIDATES = ["\t", ";", "|", ","] as const;
const SAMPLE_CHARS = 64 * 1024;
const SAMPLE_RECORDS = 40;

function isContent(row: string[]): boolean {
  const first = (row[0] ?? "").trimStart();
  // "#" alone is a cell (a row-number column); "#…" starts a comment line.
  return !(first.startsWith("#") && first !== "#") && row.some((c) => c.trim() !== "");
}

/**
 * Picks the delimiter that splits the most recognisable header names out of the first lines;
 * when no candidate finds any (no header), the one that gives the most lines the same number of
 * fields. Papaparse's own guess prefers "," in a semicolon file with decimal commas.
 */
export function detectDelimiter(text: string): string {
  const sample = text.slice(0, SAMPLE_CHARS);
  let best: string = ",";
  let bestKey: number[] = [-1, -1, -1, -1];
  CANDIDATES.forEach((delimiter, priority) => {
    if (!sample.includes(delimiter)) return;
    const rows = Papa.parse<string[]>(sample, { delimiter, preview: SAMPLE_RECORDS }).data.filter(isContent);
    let headerScore = 0;
    for (const row of rows.slice(0, 12)) {
      if (row.length < 2) continue;
      const recognised = row.filter((cell) => recogniseHeader(cell).quantity !== null).length;
      headerScore = Math.max(headerScore, recognised);
    }
    const counts = new Map<number, number>();
    for (const row of rows) if (row.length > 1) counts.set(row.length, (counts.get(row.length) ?? 0) + 1);
    let support = 0;
    for (const n of counts.values()) support = Math.max(support, n);
    const key = [headerScore, rows.length === 0 ? 0 : Math.round((10 * support) / rows.length), support > 0 ? 1 : 0, -priority];
    for (let i = 0; i < key.length; i++) {
      const a = key[i] as number;
      const b = bestKey[i] as number;
      if (a > b) {
        best = delimiter;
        bestKey = key;
        break;
      }
      if (a < b) break;
    }
  });
  return best;
}
