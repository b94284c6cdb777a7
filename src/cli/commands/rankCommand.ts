import { readFileSync } from "node:fs";
import type { CliOptions } from "../main.ts";
import type { Part, Spec } from "../../engine/types.ts";
import type { MergeDuplicate } from "../../catalog/mergeLists.ts";
import { CliError } from "../cliError.ts";
import { readSpec } from "../readSpec.ts";
import { readParts, type RejectedEntry } from "../readParts.ts";
import { formatTable } from "../formatTable.ts";
import { rankParts } from "../../engine/rankParts.ts";
import { formatQuantity } from "../../engine/formatQuantity.ts";
import { openProject } from "../../state/projectFile.ts";
import type { Workspace } from "../../state/workspace.ts";
import { loadWorkspaceParts } from "../../report/loadWorkspaceParts.ts";
import { resultsCsv } from "../../report/resultsCsv.ts";
import { rankingJson } from "../../report/rankingJson.ts";

export function requireSpec(options: CliOptions): string {
  if (options.spec === undefined) throw new CliError("--spec <spec.json> is required");
  return options.spec;
}

/** `--project <file>`: a project saved by the browser; a file that cannot be opened is refused with its name and the reason. */
export function readProject(file: string): Workspace {
  let text: string;
  try {
    text = readFileSync(file, "utf8");
  } catch (error) {
    throw new CliError(`${file}: cannot read the project file (${(error as NodeJS.ErrnoException).code ?? String(error)})`);
  }
  const opened = openProject(text);
  if (!opened.ok) throw new CliError(`${file}: ${opened.error}`);
  return opened.workspace;
}

/** --project replaces --spec, --parts and --map; mixing them would leave it unclear which inputs were used. */
export function checkProjectOptions(options: CliOptions): void {
  if (options.project === undefined) return;
  const mixed = [options.spec !== undefined && "--spec", options.parts !== undefined && "--parts", options.map !== undefined && "--map"].filter(Boolean);
  if (mixed.length > 0) throw new CliError(`--project holds the spec, the part lists and their column choices; drop ${mixed.join(", ")}`);
}

interface RankInputs {
  spec: Spec;
  parts: Part[];
  rejected: RejectedEntry[];
  duplicates: MergeDuplicate[];
}

function rankInputs(options: CliOptions): RankInputs {
  checkProjectOptions(options);
  if (options.project !== undefined) {
    const workspace = readProject(options.project);
    const loaded = loadWorkspaceParts(workspace);
    const rejected = loaded.rejected.map((r) => ({ file: r.list, row: r.row, field: r.field, reason: r.reason }));
    return { spec: workspace.spec, parts: loaded.parts, rejected, duplicates: loaded.duplicates };
  }
  if (options.spec === undefined) throw new CliError("--spec <spec.json> is required (or --project <project.json>)");
  const spec = readSpec(options.spec);
  const loaded = readParts(options.parts, options.map ?? []);
  return { spec, parts: loaded.parts, rejected: loaded.rejected, duplicates: loaded.duplicates };
}

/** `rank`: every part evaluated at every corner, in rank order; --csv writes the browser's CSV export. */
export function rankCommand(args: string[], options: CliOptions): string {
  if (args.length > 0) throw new CliError(`rank takes no positional arguments; unexpected "${args.join(" ")}"`);
  if (options.csv && options.json) throw new CliError("--csv and --json are alternatives; give one");
  const { spec, parts, rejected, duplicates } = rankInputs(options);
  const results = rankParts(spec, parts);
  if (options.csv) return resultsCsv(spec, results, parts);
  if (options.json) return rankingJson({ spec, results, rejected, duplicates });
  const byNumber = new Map(parts.map((p) => [p.partNumber, p]));
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
  return [`${results.length} parts ranked, ${passing} pass, ${rejected.length} rows rejected`, table].join("\n");
}
