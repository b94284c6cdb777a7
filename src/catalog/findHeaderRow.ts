import { parseUnit } from "./parseUnit.ts";
import { recogniseHeader } from "./recogniseHeader.ts";
import { QUANTITIES } from "./quantities.ts";

export interface HeaderLocation {
  /** Record index of the header, -1 when there is no content at all. */
  header: number;
  /** Record index of a unit row directly above or below the header, -1 when none. */
  unitRow: number;
}

const HEADER_SEARCH = 30;

/** A printable ASCII character: never white space, so a cell starting with one is not blank. */
export function isVisibleAscii(code: number): boolean {
  return code > 32 && code < 127;
}

export function isBlank(row: string[]): boolean {
  for (const cell of row) {
    // Most cells start with a visible character: decide without allocating a trimmed copy.
    if (cell.length > 0 && (isVisibleAscii(cell.charCodeAt(0)) || cell.trim() !== "")) return false;
  }
  return true;
}

/**
 * A unit row holds only units ("µH", "[mΩ]", "%") and blanks, and at least one unit. A cell
 * that is a bare number is data, never a unit, and under a text column (part number, maker…)
 * a unit row has nothing: otherwise a first part such as "A,1" would be taken for units and lost.
 */
export function isUnitRow(row: string[], header?: string[]): boolean {
  let units = 0;
  for (let column = 0; column < row.length; column++) {
    const c = (row[column] as string).trim();
    if (c === "" || /^[-–—]$/.test(c)) continue;
    if (/^[-+]?[\d.,\s]+$/.test(c) || parseUnit(c) === null) return false;
    const above = header?.[column];
    if (above !== undefined && isTextColumn(above)) return false;
    units++;
  }
  return units > 0;
}

function isTextColumn(header: string): boolean {
  const quantity = recogniseHeader(header).quantity;
  // Composite columns such as "L x W x H" have no entry of their own.
  const known: Partial<Record<string, { dimension: string }>> = QUANTITIES;
  return quantity !== null && known[quantity]?.dimension === "text";
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
  const headerCells = rows[header] as string[];
  if (below >= 0 && isUnitRow(rows[below] as string[], headerCells)) unitRow = below;
  else if (above >= 0 && isUnitRow(rows[above] as string[], headerCells)) unitRow = above;
  return { header, unitRow };
}

function nextContent(rows: string[][], start: number, step: 1 | -1): number {
  for (let i = start; i >= 0 && i < rows.length; i += step) if (!isBlank(rows[i] as string[])) return i;
  return -1;
}
