/** Characters a spreadsheet may read as the start of a formula (OWASP's CSV-injection list). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * One CSV field (RFC 4180). A number is written as a plain number so that spreadsheets keep it
 * numeric; null and non-finite numbers become an empty cell. Text is always quoted, and text that
 * a spreadsheet could take for a formula gets a leading apostrophe: the text itself is kept.
 */
export function csvCell(value: string | number | null): string {
  if (value === null) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  const safe = FORMULA_START.test(value) ? `'${value}` : value;
  return `"${safe.replace(/"/g, '""')}"`;
}
