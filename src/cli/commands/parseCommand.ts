import type { CliOptions } from "../main.ts";
import { CliError } from "../cliError.ts";
import { readPartFile } from "../readParts.ts";
import { formatTable } from "../formatTable.ts";
import { formatQuantity } from "../../engine/formatQuantity.ts";

/** `parse <file>`: the parts in SI, the rejected rows with reasons and the column mapping. */
export function parseCommand(args: string[], options: CliOptions): string {
  const [file, ...extra] = args;
  if (file === undefined) throw new CliError("parse needs a part list: parse <parts.csv|tsv>");
  if (extra.length > 0) throw new CliError(`parse takes one file; unexpected "${extra.join(" ")}"`);
  const result = readPartFile(file, options.map ?? []);
  if (options.json) {
    return JSON.stringify({ parts: result.parts, rejected: result.rejected, warnings: result.warnings, mapping: result.mapping }, null, 2);
  }
  const table = formatTable(
    ["part", "L", "DCR max", "Isat", "Irated", "size (mm)"],
    result.parts.map((p) => [
      p.partNumber,
      formatQuantity(p.inductance, "H"),
      formatQuantity(p.dcrMax ?? p.dcrTyp, "Ω"),
      formatQuantity(p.isat, "A"),
      formatQuantity(p.irms, "A"),
      p.length !== null && p.width !== null ? `${+(p.length * 1e3).toFixed(2)}×${+(p.width * 1e3).toFixed(2)}×${p.height === null ? "?" : +(p.height * 1e3).toFixed(2)}` : "—",
    ]),
  );
  const rejected = result.rejected.map((r) => `  row ${r.row}${r.field ? ` (${r.field})` : ""}: ${r.reason}`);
  return [
    `${file}: ${result.parts.length} parts, ${result.rejected.length} rejected rows`,
    table,
    ...(rejected.length > 0 ? ["rejected:", ...rejected] : []),
  ].join("\n");
}
