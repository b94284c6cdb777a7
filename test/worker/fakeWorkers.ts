import { createRankHandler } from "../../src/worker/rankWorkerCore.ts";
import { runImport } from "../../src/worker/importWorkerCore.ts";
import type { ImportReply, ImportRequest, RankReply, RankRequest } from "../../src/worker/protocol.ts";
import type { WorkerLike } from "../../src/worker/rankingClient.ts";
import type { ImportWorkerLike } from "../../src/worker/importClient.ts";

/** Delivers like postMessage: later, one message per task, with a structured clone. */
function later<T>(deliver: (value: T) => void, value: T): void {
  const copy = structuredClone(value);
  setTimeout(() => deliver(copy), 0);
}

/** A ranking worker run in-process, with the real handler. */
export class FakeRankWorker implements WorkerLike {
  onmessage: ((event: MessageEvent<RankReply>) => void) | null = null;
  terminated = false;
  private readonly handle = createRankHandler((reply) => {
    if (!this.terminated) later((r) => this.onmessage?.({ data: r } as MessageEvent<RankReply>), reply);
  });
  postMessage(message: RankRequest): void {
    later((m) => {
      if (!this.terminated) this.handle(m);
    }, message);
  }
  terminate(): void {
    this.terminated = true;
  }
}

/** An import worker run in-process. */
export class FakeImportWorker implements ImportWorkerLike {
  onmessage: ((event: MessageEvent<ImportReply>) => void) | null = null;
  terminated = false;
  postMessage(message: ImportRequest): void {
    later((m) => {
      if (this.terminated) return;
      runImport(m, (reply) => {
        if (!this.terminated) later((r) => this.onmessage?.({ data: r } as MessageEvent<ImportReply>), reply);
      });
    }, message);
  }
  terminate(): void {
    this.terminated = true;
  }
}
