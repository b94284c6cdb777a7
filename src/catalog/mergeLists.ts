import type { Part } from "../engine/types.ts";

export interface MergeDuplicate {
  partNumber: string;
  /** Name of the list whose part is kept (the later one). */
  kept: string;
  /** Name of the list whose part is dropped. */
  dropped: string;
  message: string;
}

export interface MergedLists {
  parts: Part[];
  duplicates: MergeDuplicate[];
}

/**
 * Joins several imported lists. A part number found in more than one list (case-insensitive)
 * keeps the part of the later list, the newer data, at the place of the earlier one, and each
 * replacement is reported.
 */
export function mergeLists(lists: ReadonlyArray<{ name: string; parts: readonly Part[] }>): MergedLists {
  const parts: Part[] = [];
  const from: string[] = [];
  const index = new Map<string, number>();
  const duplicates: MergeDuplicate[] = [];
  for (const list of lists) {
    for (const part of list.parts) {
      const key = part.partNumber.trim().toUpperCase();
      const at = index.get(key);
      if (at === undefined) {
        index.set(key, parts.length);
        parts.push(part);
        from.push(list.name);
        continue;
      }
      const dropped = from[at] as string;
      duplicates.push({
        partNumber: part.partNumber,
        kept: list.name,
        dropped,
        message: `${part.partNumber} is in both ${dropped} and ${list.name}: the part from ${list.name} (the later list) is kept`,
      });
      parts[at] = part;
      from[at] = list.name;
    }
  }
  return { parts, duplicates };
}
