import type { Spec } from "../engine/types.ts";
import type { RankingClient, RankingListener } from "../worker/rankingClient.ts";
import type { Ranking } from "../worker/finishRanking.ts";
import { workspaceStore } from "./workspaceStore.ts";
import { catalogStore } from "./catalogStore.ts";
import { rankingStore } from "./rankingStore.ts";

const PROGRESS_INTERVAL_MS = 100;

interface Request {
  job: number;
  spec: Spec;
  version: number;
  started: number;
}

/**
 * Re-ranks whenever the spec or the merged catalog changes. Requests are not debounced: a new
 * one supersedes the running job in the workers, which drop it within a step.
 */
export function startRanking(client: RankingClient): () => void {
  let request: Request | null = null;
  let lastSpec = "";
  let lastVersion = -1;
  let lastProgress = 0;

  const listener: RankingListener = {
    onProgress(job: number, done: number, total: number) {
      // A progress bar needs a few updates a second, not one per worker step.
      const now = performance.now();
      if (request?.job !== job || now - lastProgress < PROGRESS_INTERVAL_MS) return;
      lastProgress = now;
      rankingStore.setState({ done, total });
    },
    onRanked(job: number, ranking: Ranking) {
      if (request?.job !== job) return;
      const r = request;
      request = null;
      rankingStore.setState((s) => ({
        status: "ready",
        ranking,
        spec: r.spec,
        version: r.version,
        serial: s.serial + 1,
        done: ranking.count,
        total: ranking.count,
        elapsed: performance.now() - r.started,
        message: null,
      }));
    },
    onFailed(job: number, message: string) {
      if (request?.job !== job) return;
      request = null;
      rankingStore.setState({ status: "failed", message });
    },
  };
  client.setListener(listener);
  rankingStore.setState((s) => ({ status: "idle", ranking: null, spec: null, version: -1, serial: s.serial + 1, done: 0, total: 0, elapsed: null, message: null }));

  const check = () => {
    const spec = workspaceStore.getState().spec;
    const { version, parts } = catalogStore.getState().merged;
    const specKey = JSON.stringify(spec);
    if (specKey === lastSpec && version === lastVersion) return;
    lastSpec = specKey;
    lastVersion = version;
    if (parts.length === 0) {
      client.cancel();
      request = null;
      rankingStore.setState((s) => ({ status: "idle", ranking: null, spec, version, serial: s.serial + 1, done: 0, total: 0, message: null }));
      return;
    }
    const job = client.rank(spec, version, parts.length);
    request = { job, spec, version, started: performance.now() };
    rankingStore.setState({ status: "ranking", done: 0, total: parts.length, message: null });
  };
  const stopWorkspace = workspaceStore.subscribe(check);
  const stopCatalog = catalogStore.subscribe(check);
  check();
  return () => {
    stopWorkspace();
    stopCatalog();
    client.cancel();
  };
}
