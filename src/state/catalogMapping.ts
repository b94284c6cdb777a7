import type { MappingOverride } from "../catalog/types.ts";
import type { PartListSource } from "./workspace.ts";
import { workspaceStore } from "./workspaceStore.ts";
import { setListMapping } from "./workspaceActions.ts";
import { rememberMapping } from "./mappingMemory.ts";
import { notify } from "./noticeStore.ts";
import { startImport } from "../worker/importClient.ts";
import { catalog, patchList, received, running, sourceKey } from "./catalogInternals.ts";

/**
 * Reads a list again with new column choices. The current parts stay until the new read is
 * done; then the choices are recorded on the list and remembered for its header layout.
 */
export function applyMapping(id: string, mapping: MappingOverride[], seriesSaturation?: Record<string, "soft" | "hard">): void {
  const source = workspaceStore.getState().lists.find((l) => l.id === id);
  const deps = catalog.deps;
  if (deps === null || source === undefined) return;
  const saturation = seriesSaturation ?? source.seriesSaturation;
  const next: PartListSource = { ...source, mapping, seriesSaturation: saturation };
  const key = sourceKey(next);
  patchList(id, { reimporting: true, phase: "reading", done: 0, total: source.text.length });
  running.get(id)?.cancel();
  running.set(
    id,
    startImport(
      deps.spawnImport,
      { bytes: null, text: source.text, name: source.name, mapping, remembered: {}, seriesSaturation: saturation },
      {
        onPhase: (phase, done, total) => patchList(id, { phase, done, total }),
        onDone: (outcome) => {
          running.delete(id);
          if (!workspaceStore.getState().lists.some((l) => l.id === id)) return;
          patchList(id, { sourceKey: key });
          setListMapping(id, mapping, saturation);
          if (outcome.signature !== null) rememberMapping(outcome.signature, mapping);
          received(id, outcome, key);
        },
        onFailed: (message) => {
          running.delete(id);
          patchList(id, { reimporting: false, phase: null });
          notify("error", `${source.name} could not be read with the new column choices (${message}); the previous reading is kept.`);
        },
      },
    ),
  );
}

/** Stops a re-import; the list keeps its previous reading and choices. */
export function cancelReimport(id: string): void {
  running.get(id)?.cancel();
  running.delete(id);
  patchList(id, { reimporting: false, phase: null });
}
