import { buildReport } from "./buildReport.ts";
import { renderReportHtml } from "./renderReportHtml.ts";
import { loadWorkspaceParts } from "./loadWorkspaceParts.ts";
import { reportFileName } from "./reportFileName.ts";
import { COILSIFT_VERSION } from "./coilsiftVersion.ts";
import type { ReportModel, ReportWorkspace } from "./types.ts";

export interface ExportReportOptions {
  /** Defaults to now; tests and the CLI's --generated-at fix it. */
  generatedAt?: Date | string;
  /** Defaults to package.json's version. */
  version?: string;
}

export interface ExportedReport {
  fileName: string;
  html: string;
  model: ReportModel;
}

/**
 * The selection report of a workspace, ready to download: its lists re-imported and merged, every
 * part screened, the shortlist evaluated in full. Pure (no DOM, no download): the browser's
 * button and the CLI's `report` command both call it, so they write the same report.
 */
export function exportReport(workspace: ReportWorkspace, options: ExportReportOptions = {}): ExportedReport {
  const loaded = loadWorkspaceParts(workspace);
  const model = buildReport({
    workspace,
    spec: workspace.spec,
    parts: loaded.parts,
    rejected: loaded.rejected,
    imports: loaded.imports,
    duplicates: loaded.duplicates.map((d) => d.message),
    generatedAt: options.generatedAt ?? new Date(),
    version: options.version ?? COILSIFT_VERSION,
  });
  return { fileName: reportFileName(model.designName, model.generatedAt), html: renderReportHtml(model), model };
}
