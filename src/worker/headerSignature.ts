import { importPartList } from "../catalog/importPartList.ts";

/** Lines read to find the header: lists put at most a title, notes and a unit row above it. */
const HEAD_LINES = 40;

/**
 * A key for a list's column layout: its header cells, normalised, in order. Two files from the
 * same vendor export share it, so the column choices made for one are offered for the next.
 * Null when no header is found.
 */
export function headerSignature(text: string): string | null {
  let end = 0;
  for (let n = 0; n < HEAD_LINES && end >= 0; n++) end = text.indexOf("\n", end + 1);
  const head = end < 0 ? text : text.slice(0, end);
  const mapping = importPartList(head).mapping;
  if (mapping.length === 0) return null;
  return mapping.map((m) => m.header.trim().toLowerCase().replace(/\s+/g, " ")).join(" | ");
}
