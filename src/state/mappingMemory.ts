import { createStore } from "zustand/vanilla";
import type { MappingOverride } from "../catalog/types.ts";

/**
 * Column choices remembered per header signature (see worker/headerSignature.ts): the next file
 * with the same header layout is read with them from the start.
 */
export const mappingMemory = createStore<{ bySignature: Record<string, MappingOverride[]> }>(() => ({ bySignature: {} }));

export function rememberMapping(signature: string, mapping: MappingOverride[]): void {
  mappingMemory.setState((s) => {
    const next = { ...s.bySignature };
    if (mapping.length === 0) delete next[signature];
    else next[signature] = mapping;
    return { bySignature: next };
  });
}
