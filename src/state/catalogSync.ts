import type { PartListSource } from "./workspace.ts";
import { workspaceStore } from "./workspaceStore.ts";
import { catalogStore } from "./catalogStore.ts";
import { startImport } from "../worker/importClient.ts";
import { catalog, loadingList, patchList, received, remerge, running, sourceKey, type CatalogDeps } from "./catalogInternals.ts";

export type { CatalogDeps } from "./catalogInternals.ts";

/** Imports a workspace list (on start, after a reload, or when the workspace gains it). */
function importSource(source: PartListSource): void {
  const deps = catalog.deps;
  if (deps === null) return;
  const key = sourceKey(source);
  catalogStore.setState((c) => ({ lists: { ...c.lists, [source.id]: loadingList(source, "reading", source.text.length) } }));
  running.get(source.id)?.cancel();
  running.set(
    source.id,
    startImport(
      deps.spawnImport,
      { bytes: null, text: source.text, name: source.name, mapping: source.mapping, remembered: {}, seriesSaturation: source.seriesSaturation },
      {
        onPhase: (phase, done, total) => patchList(source.id, { phase, done, total }),
        onDone: (outcome) => {
          running.delete(source.id);
          received(source.id, outcome, key);
        },
        onFailed: (message) => {
          running.delete(source.id);
          patchList(source.id, { state: "failed", phase: null, message: `could not be read: ${message}` });
        },
      },
    ),
  );
}

function dropList(id: string): void {
  running.get(id)?.cancel();
  running.delete(id);
  catalogStore.setState((c) => {
    const { [id]: _gone, ...rest } = c.lists;
    return { lists: rest };
  });
  void catalog.deps?.ranking?.dropList(id);
  remerge();
}

/** Keeps the imported lists in step with the workspace's: new ones imported, removed ones dropped. */
function sync(): void {
  const sources = workspaceStore.getState().lists;
  const { lists } = catalogStore.getState();
  for (const source of sources) {
    const loaded = lists[source.id];
    if (loaded === undefined || (loaded.sourceKey !== sourceKey(source) && !loaded.reimporting)) importSource(source);
  }
  for (const id of Object.keys(lists)) if (!sources.some((s) => s.id === id)) dropList(id);
}

/** Starts following the workspace's lists; returns the unsubscribe. */
export function startCatalog(d: CatalogDeps): () => void {
  catalog.deps = d;
  // The workers start empty, so every list is imported and sent afresh.
  const version = catalogStore.getState().merged.version + 1;
  catalogStore.setState({ lists: {}, pending: [], merged: { version, parts: [], duplicates: [], index: new Map() } });
  sync();
  let previous = workspaceStore.getState().lists;
  const stop = workspaceStore.subscribe((w) => {
    if (w.lists === previous) return;
    previous = w.lists;
    sync();
  });
  return () => {
    stop();
    for (const r of running.values()) r.cancel();
    running.clear();
    catalog.deps = null;
  };
}
