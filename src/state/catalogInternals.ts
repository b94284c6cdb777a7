import { mergeLists } from "../catalog/mergeLists.ts";
import type { ImportOutcome, ImportWorkerLike, RunningImport } from "../worker/importClient.ts";
import type { RankingClient } from "../worker/rankingClient.ts";
import type { PartListSource } from "./workspace.ts";
import { workspaceStore } from "./workspaceStore.ts";
import { catalogStore, partKey, type LoadedList, type PendingImport } from "./catalogStore.ts";

/**
 * What the catalog modules share: the workers, the running imports, and the steps every import
 * ends with (merge the ready lists, hand them to the ranking workers).
 */
export interface CatalogDeps {
  spawnImport: () => ImportWorkerLike;
  /** Where parts go for ranking; null in tests that rank nothing. */
  ranking: RankingClient | null;
}

export const catalog: { deps: CatalogDeps | null; nextToken: number } = { deps: null, nextToken: 1 };
/** Running imports: by token for new lists, by list id for workspace lists. */
export const running = new Map<number | string, RunningImport>();

export function sourceKey(l: PartListSource): string {
  return `${l.text.length}:${JSON.stringify(l.mapping)}:${JSON.stringify(l.seriesSaturation)}`;
}

/** A list that has started (re)importing: nothing read yet. */
export function loadingList(source: PartListSource, phase: LoadedList["phase"], total: number): LoadedList {
  return {
    id: source.id,
    name: source.name,
    state: "loading",
    phase,
    done: 0,
    total,
    summary: null,
    parts: [],
    signature: null,
    rememberedApplied: false,
    message: null,
    reimporting: false,
    sourceKey: sourceKey(source),
  };
}

export function patchList(id: string, patch: Partial<LoadedList>): void {
  catalogStore.setState((c) => {
    const list = c.lists[id];
    return list === undefined ? c : { lists: { ...c.lists, [id]: { ...list, ...patch } } };
  });
}

export function patchPending(token: number, patch: Partial<PendingImport>): void {
  catalogStore.setState((c) => ({ pending: c.pending.map((p) => (p.token === token ? { ...p, ...patch } : p)) }));
}

/** Merges the ready lists in the order they were added and hands the new catalog to the ranking workers. */
export function remerge(): void {
  const { lists } = catalogStore.getState();
  // Merge order is the order lists were added (stable for equal times), as the report merges them.
  const ready = [...workspaceStore.getState().lists]
    .sort((a, b) => (a.addedAt < b.addedAt ? -1 : a.addedAt > b.addedAt ? 1 : 0))
    .map((s) => lists[s.id])
    .filter((l): l is LoadedList => l !== undefined && l.parts.length > 0 && l.state !== "failed");
  const merged = mergeLists(ready.map((l) => ({ name: l.name, parts: l.parts })));
  const index = new Map<string, number>();
  merged.parts.forEach((p, i) => index.set(partKey(p.partNumber), i));
  const version = catalogStore.getState().merged.version + 1;
  void catalog.deps?.ranking?.setCatalog(
    version,
    ready.map((l) => l.id),
  );
  catalogStore.setState({ merged: { version, parts: merged.parts, duplicates: merged.duplicates, index } });
}

export function received(id: string, outcome: ImportOutcome, key: string): void {
  patchList(id, {
    state: "ready",
    phase: null,
    summary: outcome.summary,
    parts: outcome.parts,
    signature: outcome.signature,
    rememberedApplied: outcome.rememberedApplied,
    message: null,
    reimporting: false,
    sourceKey: key,
  });
  void catalog.deps?.ranking?.sendList(id, catalogStore.getState().lists[id]?.name ?? id, outcome.parts);
  remerge();
}
