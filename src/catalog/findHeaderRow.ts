import { parseUnit } from "./parseUnit.ts";
import { recogniseHeader } from "./recogniseHeader.ts";

export interface HeaderLocation {
  /** Record index of the header, -1 when there is no content at all. */
  header: number;
  /** Record index of a unit row directly above or below the header, -1 when none. */
  unitRow: number;
}

const HEADER_SEARCH = 30;

export function isBlank(row: string[]): boolean {
  for (const cell of row) {
    // Most cells start with a visible character: decide without allocating a trimmed copy.
    if (cell.length > 0 && (cell.charCodeAt(0) > 32 || cell.trim() !== "")) return false;
  }
  return true;
}

/** A unit row holds only units ("µH", "[mΩ]", "%") and blanks, and at least one unit. */
export function isUnitRow(row: string[]): boolean {
  let units = 0;
  for (const cell of row) {
    const c = cell.trim();
    if (c === "" || /^[-–—]$/.test(c)) continue;
    if (parseUnit(c) === null) return false;
    units++;
  }
  return units > 0;
}

/**
 * The header is the row among the first content rows that names the most known quantities
 * (the first such row on a tie); title rows above it are skipped. Without any known name the
 * first content row is the header, so its cells still name the columns in the mapping.
 */
export function findHeaderRow(rows: string[][]): HeaderLocation {
  let header = -1;
  let bestScore = 0;
  let firstContent = -1;
  let seen = 0;
  for (let i = 0; i < rows.length && seen < HEADER_SEARCH; i++) {
    const row = rows[i] as string[];
    if (isBlank(row)) continue;
    seen++;
    if (firstContent < 0) firstContent = i;
    let score = 0;
    for (const cell of row) if (cell.trim() !== "" && recogniseHeader(cell).quantity !== null) score++;
    if (score > bestScore) {
      bestScore = score;
      header = i;
    }
  }
  if (header < 0) header = firstContent;
  if (header < 0) return { header: -1, unitRow: -1 };
  let unitRow = -1;
  const below = nextContent(rows, header + 1, 1);
  const above = nextContent(rows, header - 1, -1);
  if (below >= 0 && isUnitRow(rows[below] as string[])) unitRow = below;
  else if (above >= 0 && isUnitRow(rows[above] as string[])) unitRow = above;
  return { header, unitRow };
}

function nextContent(rows: string[][], start: number, step: 1 | -1): number {
  for (let i = start; i >= 0 && i < rows.length; i += step) if (!isBlank(rows[i] as string[])) return i;
  return -1;
}
