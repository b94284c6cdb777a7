import { readFileSync, writeFileSync } from "node:fs";
import { basename } from "node:path";
import type { CliOptions } from "../main.ts";
import type { MappingOverride } from "../../catalog/types.ts";
import { decodeText } from "../../catalog/decodeText.ts";
import { parseMappingOverride } from "../../catalog/parseMappingOverride.ts";
import { CliError } from "../cliError.ts";
import { readSpec } from "../readSpec.ts";
import { checkProjectOptions, readProject } from "./rankCommand.ts";
import { exportReport } from "../../report/exportReport.ts";
import type { ReportListSource, ReportWorkspace } from "../../report/types.ts";
import { MAX_SHORTLIST } from "../../state/workspace.ts";

/** Lists read from files get times in the order given, so the later file wins a duplicate part number (as in the browser). */
const FILE_LIST_EPOCH = Date.UTC(2000, 0, 1);

function readListFile(file: string, index: number, mapping: MappingOverride[]): ReportListSource {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(file);
  } catch (error) {
    throw new CliError(`${file}: cannot read the part list (${(error as NodeJS.ErrnoException).code ?? String(error)})`);
  }
  return {
    id: `list-${index + 1}`,
    name: basename(file),
    text: decodeText(bytes),
    mapping,
    seriesSaturation: {},
    addedAt: new Date(FILE_LIST_EPOCH + index * 1000).toISOString(),
  };
}

/** "a, b,,c" → ["a", "b", "c"]; part numbers cannot contain commas here. */
function parseShortlist(text: string): string[] {
  const seen = new Set<string>();
  const list: string[] = [];
  for (const item of text.split(",")) {
    const pn = item.trim();
    if (pn === "" || seen.has(pn.toUpperCase())) continue;
    seen.add(pn.toUpperCase());
    list.push(pn);
  }
  if (list.length > MAX_SHORTLIST) throw new CliError(`--shortlist names ${list.length} parts; a report compares at most ${MAX_SHORTLIST}`);
  return list;
}

/** The workspace the browser would hold after importing these files with this spec and shortlist. */
function workspaceFromFiles(options: CliOptions): ReportWorkspace {
  if (options.spec === undefined) throw new CliError("--spec <spec.json> is required (or --project <project.json>)");
  const spec = readSpec(options.spec);
  const files = options.parts ?? [];
  if (files.length === 0) throw new CliError("--parts <file> is required (or --project <project.json>)");
  if (options.shortlist === undefined) throw new CliError("--shortlist <pn,pn,…> is required: the part numbers to compare in the report");
  const mapping = (options.map ?? []).map((text) => {
    const parsed = parseMappingOverride(text);
    if (typeof parsed === "string") throw new CliError(`--map "${text}": ${parsed}`);
    return parsed;
  });
  return {
    name: options.name ?? basename(options.spec).replace(/\.json$/i, ""),
    notes: "",
    spec,
    lists: files.map((file, i) => readListFile(file, i, mapping)),
    shortlist: parseShortlist(options.shortlist),
  };
}

function generatedAt(text: string | undefined): Date {
  if (text === undefined) return new Date();
  const at = new Date(text);
  if (Number.isNaN(at.getTime())) throw new CliError(`--generated-at "${text}" is not a date and time (ISO 8601, e.g. 2026-03-01T09:30:00Z)`);
  return at;
}

/**
 * `report`: the selection report, written by the same function as the browser's "Export report",
 * from --spec/--parts/--shortlist or from a saved --project.
 */
export function reportCommand(args: string[], options: CliOptions): string {
  if (args.length > 0) throw new CliError(`report takes no positional arguments; unexpected "${args.join(" ")}"`);
  if (options.out === undefined) throw new CliError("--out <report.html> is required");
  checkProjectOptions(options);
  const at = generatedAt(options["generated-at"]);
  let workspace: ReportWorkspace;
  if (options.project !== undefined) {
    const project = readProject(options.project);
    workspace = {
      ...project,
      name: options.name ?? project.name,
      shortlist: options.shortlist === undefined ? project.shortlist : parseShortlist(options.shortlist),
    };
  } else {
    workspace = workspaceFromFiles(options);
  }
  const report = exportReport(workspace, { generatedAt: at });
  const missing = report.model.missingShortlist;
  // A shortlist typed on the command line must match; a project's own shortlist is reported as it stands.
  if (missing.length > 0 && options.shortlist !== undefined) {
    throw new CliError(`--shortlist: ${missing.map((pn) => `"${pn}"`).join(", ")} ${missing.length === 1 ? "is" : "are"} in none of the part lists`);
  }
  try {
    writeFileSync(options.out, report.html);
  } catch (error) {
    throw new CliError(`${options.out}: cannot write the report (${(error as NodeJS.ErrnoException).code ?? String(error)})`);
  }
  const m = report.model;
  return `${options.out}: report "${m.designName}", ${m.partsConsidered} parts considered, ${m.shortlist.length} shortlisted (${m.shortlist.map((s) => s.part.partNumber).join(", ")})`;
}
