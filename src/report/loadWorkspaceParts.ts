import type { Part } from "../engine/types.ts";
import { importPartList } from "../catalog/importPartList.ts";
import { mergeLists, type MergeDuplicate } from "../catalog/mergeLists.ts";
import type { ImportedList, ReportListSource, ReportRejectedRow, ReportWorkspace } from "./types.ts";

export interface WorkspaceParts {
  parts: Part[];
  rejected: ReportRejectedRow[];
  imports: ImportedList[];
  duplicates: MergeDuplicate[];
}

/**
 * Lists in merge order: by the time they were added, so that the later list wins a duplicate
 * part number (ties keep the workspace order; the sort is stable).
 */
export function listsInMergeOrder(lists: readonly ReportListSource[]): ReportListSource[] {
  return [...lists].sort((a, b) => (a.addedAt < b.addedAt ? -1 : a.addedAt > b.addedAt ? 1 : 0));
}

/**
 * Re-imports every list of a workspace from its text with the user's column choices and series
 * characters, and merges them: the same parts and rejected rows in the browser and the CLI.
 */
export function loadWorkspaceParts(workspace: Pick<ReportWorkspace, "lists">): WorkspaceParts {
  const imports: ImportedList[] = listsInMergeOrder(workspace.lists).map((source) => ({
    source,
    result: importPartList(source.text, { name: source.name, mapping: source.mapping, seriesSaturation: { ...source.seriesSaturation } }),
  }));
  const merged = mergeLists(imports.map(({ source, result }) => ({ name: source.name, parts: result.parts })));
  const rejected = imports.flatMap(({ source, result }) =>
    result.rejected.map((r) => ({ list: source.name, row: r.row, field: r.field, reason: r.reason })),
  );
  return { parts: merged.parts, rejected, imports, duplicates: merged.duplicates };
}
