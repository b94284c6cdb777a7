/** Plain-text table with right-aligned numeric columns, for the CLI's readable output. */
export function formatTable(header: string[], rows: string[][]): string {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] ?? "").length)));
  const numeric = header.map((_, c) => rows.length > 0 && rows.every((r) => /^[-−+]?[\d.]/.test(r[c] ?? "") || (r[c] ?? "") === "—"));
  const line = (cells: string[]) =>
    cells.map((cell, c) => (numeric[c] ? cell.padStart(widths[c]!) : cell.padEnd(widths[c]!))).join("  ").trimEnd();
  return [line(header), widths.map((w) => "-".repeat(w)).join("  "), ...rows.map(line)].join("\n");
}
