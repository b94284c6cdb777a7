import { rankParts } from "../engine/rankParts.ts";
import { loadWorkspaceParts } from "./loadWorkspaceParts.ts";
import { resultsCsv } from "./resultsCsv.ts";
import { rankingJson } from "./rankingJson.ts";
import { reportFileName } from "./reportFileName.ts";
import type { ReportWorkspace } from "./types.ts";

export interface ExportedRanking {
  csvFileName: string;
  csv: string;
  jsonFileName: string;
  json: string;
}

/**
 * Every part of a workspace ranked, as CSV and JSON files. Pure: the UI does the download. A UI
 * that already holds the ranked results can call resultsCsv and rankingJson directly instead.
 */
export function exportRanking(workspace: ReportWorkspace, generatedAt: Date | string = new Date()): ExportedRanking {
  const loaded = loadWorkspaceParts(workspace);
  const results = rankParts(workspace.spec, loaded.parts);
  const day = (typeof generatedAt === "string" ? new Date(generatedAt) : generatedAt).toISOString();
  const base = reportFileName(workspace.name, day).replace(/^coilsift-report-/, "coilsift-ranking-").replace(/\.html$/, "");
  return {
    csvFileName: `${base}.csv`,
    csv: resultsCsv(workspace.spec, results, loaded.parts),
    jsonFileName: `${base}.json`,
    json: rankingJson({ spec: workspace.spec, results, rejected: loaded.rejected, duplicates: loaded.duplicates }),
  };
}
