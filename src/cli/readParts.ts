import { readFileSync } from "node:fs";
import { basename } from "node:path";
import type { Part } from "../engine/types.ts";
import { decodeText } from "../catalog/decodeText.ts";
import { importPartList } from "../catalog/importPartList.ts";
import { parseMappingOverride } from "../catalog/parseMappingOverride.ts";
import { mergeLists, type MergeDuplicate } from "../catalog/mergeLists.ts";
import type { ImportResult, MappingOverride } from "../catalog/types.ts";
import { CliError } from "./cliError.ts";

export interface RejectedEntry {
  file: string;
  row: number;
  field: string | null;
  reason: string;
}

export interface LoadedParts {
  parts: Part[];
  rejected: RejectedEntry[];
  imports: { file: string; result: ImportResult }[];
  duplicates: MergeDuplicate[];
}

/** Reads one part list with the importer; a file that cannot be read is a CLI error naming it. */
export function readPartFile(file: string, mapOverrides: string[] = []): ImportResult {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(file);
  } catch (error) {
    throw new CliError(`${file}: cannot read the part list (${(error as NodeJS.ErrnoException).code ?? String(error)})`);
  }
  const overrides: MappingOverride[] = mapOverrides.map((text) => {
    const parsed = parseMappingOverride(text);
    if (typeof parsed === "string") throw new CliError(`--map "${text}": ${parsed}`);
    return parsed;
  });
  return importPartList(decodeText(bytes), { name: basename(file), mapping: overrides });
}

/** Reads every part list, merges them (a later list's part replaces a duplicate) and collects rejected rows. */
export function readParts(files: string[] | undefined, mapOverrides: string[] = []): LoadedParts {
  if (files === undefined || files.length === 0) throw new CliError("--parts <file> is required");
  const imports = files.map((file) => ({ file, result: readPartFile(file, mapOverrides) }));
  const merged = mergeLists(imports.map(({ file, result }) => ({ name: file, parts: result.parts })));
  const rejected = imports.flatMap(({ file, result }) =>
    result.rejected.map((r) => ({ file, row: r.row, field: r.field, reason: r.reason })),
  );
  return { parts: merged.parts, rejected, imports, duplicates: merged.duplicates };
}
