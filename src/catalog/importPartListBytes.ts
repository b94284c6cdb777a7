import { decodeText } from "./decodeText.ts";
import { importPartList } from "./importPartList.ts";
import type { ImportOptions, ImportResult } from "./types.ts";

/** importPartList on the raw bytes of a file (UTF-8, UTF-16 with BOM, Windows-1252). */
export function importPartListBytes(bytes: Uint8Array, options: ImportOptions = {}): ImportResult {
  return importPartList(decodeText(bytes), options);
}
