import { createStore } from "zustand/vanilla";
import { useStore } from "zustand";
import type { Spec } from "../engine/types.ts";
import type { Ranking } from "../worker/finishRanking.ts";

export interface RankingState {
  status: "idle" | "ranking" | "ready" | "failed";
  /** Parts screened of the running job, for the progress bar. */
  done: number;
  total: number;
  /** The latest complete ranking (kept on screen while a newer one runs). */
  ranking: Ranking | null;
  /** The spec and catalog version it was computed for. */
  spec: Spec | null;
  version: number;
  /** Counts results, so views can memoise on it. */
  serial: number;
  /** Time from the request to the result, ms. */
  elapsed: number | null;
  message: string | null;
}

export const rankingStore = createStore<RankingState>(() => ({
  status: "idle",
  done: 0,
  total: 0,
  ranking: null,
  spec: null,
  version: -1,
  serial: 0,
  elapsed: null,
  message: null,
}));

export function useRanking<T>(selector: (r: RankingState) => T): T {
  return useStore(rankingStore, selector);
}
