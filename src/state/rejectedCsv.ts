import type { RejectedRow } from "../catalog/types.ts";

function cell(text: string): string {
  // RFC 4180 quoting; a leading = + - @ is prefixed so a spreadsheet does not run it as a formula.
  const safe = /^[=+\-@]/.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** Rejected rows as CSV: where, why, then the row's own cells, so nothing of the list is lost. */
export function rejectedCsv(rows: readonly RejectedRow[]): string {
  const width = rows.reduce((w, r) => Math.max(w, r.cells.length), 0);
  const header = ["line", "field", "column", "reason", ...Array.from({ length: width }, (_, i) => `cell ${i + 1}`)];
  const lines = [header, ...rows.map((r) => [String(r.row), r.field, r.header ?? "", r.reason, ...r.cells])];
  return lines.map((l) => l.map(cell).join(",")).join("\r\n") + "\r\n";
}
