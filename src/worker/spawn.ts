import type { ImportWorkerLike } from "./importClient.ts";
import type { WorkerLike } from "./rankingClient.ts";

// The `new URL(…, import.meta.url)` form is what lets Vite find and bundle each worker.

export function spawnRankWorker(): WorkerLike {
  return new Worker(new URL("./rankWorker.ts", import.meta.url), { type: "module", name: "coilsift-rank" }) as unknown as WorkerLike;
}

export function spawnImportWorker(): ImportWorkerLike {
  return new Worker(new URL("./importWorker.ts", import.meta.url), { type: "module", name: "coilsift-import" }) as unknown as ImportWorkerLike;
}

/** One ranking worker per core, at most four: past that the page's own thread starts to lose out. */
export function rankWorkerCount(): number {
  const cores = typeof navigator !== "undefined" ? navigator.hardwareConcurrency || 2 : 2;
  return Math.max(1, Math.min(4, cores));
}
