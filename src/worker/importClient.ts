import type { Part } from "../engine/types.ts";
import type { MappingOverride } from "../catalog/types.ts";
import type { ImportPhase, ImportReply, ImportRequest, ImportSummary } from "./protocol.ts";

export interface ImportWorkerLike {
  postMessage(message: ImportRequest, transfer?: Transferable[]): void;
  onmessage: ((event: MessageEvent<ImportReply>) => void) | null;
  onerror?: ((event: ErrorEvent) => void) | null;
  terminate(): void;
}

export interface ImportOutcome {
  text: string;
  signature: string | null;
  mapping: MappingOverride[];
  rememberedApplied: boolean;
  summary: ImportSummary;
  parts: Part[];
}

export interface ImportHandlers {
  onPhase(phase: ImportPhase, done: number, total: number): void;
  onDone(outcome: ImportOutcome): void;
  onFailed(message: string): void;
}

export interface RunningImport {
  /** Stops the import at once (the worker is terminated); no handler is called afterwards. */
  cancel(): void;
}

/** Runs one import in its own worker and gathers the chunked parts. */
export function startImport(spawn: () => ImportWorkerLike, request: ImportRequest, handlers: ImportHandlers): RunningImport {
  const worker = spawn();
  let finished = false;
  let meta: Extract<ImportReply, { type: "summary" }> | null = null;
  const parts: Part[] = [];
  const end = () => {
    finished = true;
    worker.terminate();
  };
  worker.onmessage = (event) => {
    if (finished) return;
    const reply = event.data;
    switch (reply.type) {
      case "phase":
        handlers.onPhase(reply.phase, reply.done, reply.total);
        return;
      case "summary":
        meta = reply;
        return;
      case "parts":
        for (const p of reply.parts) parts.push(p);
        if (meta !== null) handlers.onPhase("delivering", parts.length, meta.partCount);
        return;
      case "done": {
        end();
        if (meta === null) {
          handlers.onFailed("the import finished without a summary");
          return;
        }
        const text = meta.text ?? request.text ?? "";
        handlers.onDone({ text, signature: meta.signature, mapping: meta.mapping, rememberedApplied: meta.rememberedApplied, summary: meta.summary, parts });
        return;
      }
      case "failed":
        end();
        handlers.onFailed(reply.message);
        return;
    }
  };
  worker.onerror = (event) => {
    if (finished) return;
    end();
    handlers.onFailed(event.message || "the import worker stopped");
  };
  worker.postMessage(request, request.bytes === null ? [] : [request.bytes]);
  return {
    cancel() {
      if (!finished) end();
    },
  };
}
