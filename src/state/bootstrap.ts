import type { ImportWorkerLike } from "../worker/importClient.ts";
import { RankingClient, type WorkerLike } from "../worker/rankingClient.ts";
import { demoWorkspace } from "./demoScenario.ts";
import { loadSaved, saveStatus, startSaving, type KeyValueStore, type Saver } from "./persistence.ts";
import { loadSpec, replaceWorkspace, showScreen } from "./workspaceActions.ts";
import { setDraft } from "./draftStore.ts";
import { extrasStore } from "./extrasStore.ts";
import { mappingMemory } from "./mappingMemory.ts";
import { notify } from "./noticeStore.ts";
import { specFromHash } from "./shareLink.ts";
import { startCatalog } from "./catalogController.ts";
import { startRanking } from "./rankingController.ts";

/**
 * Applies a spec carried by a link's hash (at start, or when a link is opened in the running
 * page): a valid one replaces the spec, a bad one is refused with a message. Returns whether
 * the hash carried a spec.
 */
export function applyLinkHash(hash: string, clearHash: () => void): boolean {
  const shared = specFromHash(hash);
  if (shared === null) return false;
  if (shared.ok) {
    loadSpec(shared.spec);
    showScreen("design");
    notify("info", "The spec from the link is loaded. Your part lists and shortlist are unchanged.");
  } else {
    notify("error", `The spec in the link was not loaded: ${shared.message}. Your own spec is unchanged.`);
  }
  clearHash();
  return true;
}

export interface AppDeps {
  /** Browser storage, or null when it cannot be opened (the app then works without keeping anything). */
  storage: KeyValueStore | null;
  spawnImport: () => ImportWorkerLike;
  spawnRank: () => WorkerLike;
  rankWorkers: number;
  /** The page's URL hash, read for a shared spec, and how to clear it once applied. */
  hash: string;
  clearHash: () => void;
}

export interface RunningApp {
  saver: Saver | null;
  ranking: RankingClient;
  stop(): void;
}

/**
 * Starts the workbench before the first render: restores the saved work (or opens the demo on
 * first start), applies a spec from the link, then starts saving, importing and ranking.
 */
export async function startApp(deps: AppDeps): Promise<RunningApp> {
  const demo = demoWorkspace();
  let firstStart = true;
  let alreadySaved: string[] = [];
  if (deps.storage !== null) {
    try {
      const loaded = await loadSaved(deps.storage, demo);
      if (loaded !== null) {
        firstStart = false;
        replaceWorkspace(loaded.workspace);
        if (loaded.draft !== null) setDraft(loaded.draft);
        extrasStore.setState(loaded.extras, true);
        mappingMemory.setState({ bySignature: loaded.mappings });
        alreadySaved = loaded.workspace.lists.map((l) => l.id);
        for (const p of loaded.problems) notify("warning", p);
      }
    } catch (error) {
      notify("warning", `Saved work could not be read from browser storage (${error instanceof Error ? error.message : String(error)}); the demo is shown instead.`);
    }
  } else {
    saveStatus.setState({ state: "unavailable", message: "browser storage is not available: work is not kept after a reload" });
  }
  if (firstStart) replaceWorkspace(demo);

  const shared = applyLinkHash(deps.hash, deps.clearHash);

  const saver = deps.storage === null ? null : startSaving(deps.storage, alreadySaved);
  if (saver !== null && (firstStart || shared)) saver.saveSoon();
  const ranking = new RankingClient(Array.from({ length: Math.max(1, deps.rankWorkers) }, deps.spawnRank));
  const stopRanking = startRanking(ranking);
  const stopCatalog = startCatalog({ spawnImport: deps.spawnImport, ranking });
  return {
    saver,
    ranking,
    stop() {
      stopCatalog();
      stopRanking();
      saver?.stop();
      ranking.terminate();
    },
  };
}
