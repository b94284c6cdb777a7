import type { Part } from "../../engine/types.ts";
import { findPart, useCatalog } from "../../state/catalogStore.ts";

/** The merged part with this number, or null (not loaded, or its list was removed). */
export function usePart(partNumber: string | null): { part: Part; index: number } | null {
  const merged = useCatalog((c) => c.merged);
  return partNumber === null ? null : findPart(merged, partNumber);
}
