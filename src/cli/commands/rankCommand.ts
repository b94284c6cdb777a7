import type { CliOptions } from "../main.ts";
import { CliError } from "../cliError.ts";
import { readSpec } from "../readSpec.ts";
import { readParts } from "../readParts.ts";
import { formatTable } from "../formatTable.ts";
import { rankParts } from "../../engine/rankParts.ts";
import { formatQuantity } from "../../engine/formatQuantity.ts";

export function requireSpec(options: CliOptions): string {
  if (options.spec === undefined) throw new CliError("--spec <spec.json> is required");
  return options.spec;
}

/** `rank`: every part evaluated at every corner, in rank order. */
export function rankCommand(args: string[], options: CliOptions): string {
  if (args.length > 0) throw new CliError(`rank takes no positional arguments; unexpected "${args.join(" ")}"`);
  const spec = readSpec(requireSpec(options));
  const loaded = readParts(options.parts, options.map ?? []);
  const results = rankParts(spec, loaded.parts);
  if (options.json) return JSON.stringify({ spec, results, rejected: loaded.rejected, duplicates: loaded.duplicates }, null, 2);
  const byNumber = new Map(loaded.parts.map((p) => [p.partNumber, p]));
  const table = formatTable(
    ["rank", "part", "status", "score", "L", "Isat", "peak", "RMS", "loss", "rise", "first problem"],
    results.map((r) => {
      const p = byNumber.get(r.partNumber)!;
      return [
        String(r.rank),
        r.partNumber,
        r.status,
        r.score.toFixed(1),
        formatQuantity(p.inductance, "H"),
        formatQuantity(p.isat, "A"),
        formatQuantity(r.worst.peakMagnitude.value, "A"),
        formatQuantity(r.worst.irms.value, "A"),
        formatQuantity(r.worst.totalLoss.value, "W"),
        r.worst.tempRise === null ? "—" : `${r.worst.tempRise.value.toFixed(1)} K`,
        r.failures[0] ?? r.unchecked[0] ?? "",
      ];
    }),
  );
  const passing = results.filter((r) => r.pass).length;
  return [`${results.length} parts ranked, ${passing} pass, ${loaded.rejected.length} rows rejected`, table].join("\n");
}
