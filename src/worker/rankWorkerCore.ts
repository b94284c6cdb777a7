import type { Part } from "../engine/types.ts";
import { mergeLists } from "../catalog/mergeLists.ts";
import { emptySlice, screenInto, sliceBuffers } from "./screenSlice.ts";
import { finishRanking, rankingBuffers } from "./finishRanking.ts";
import type { RankReply, RankRequest } from "./protocol.ts";

/**
 * Parts screened between two looks at the message queue: about 10–20 ms of work at 18 corners a
 * part, so a newer spec stops an old job within a frame or so.
 */
export const SCREEN_STEP = 400;

export type Post = (reply: RankReply, transfer?: Transferable[]) => void;

/** Lets queued messages (a newer job, a cancel) run; a MessageChannel round trip is not clamped like setTimeout. */
export function yieldToMessages(): Promise<void> {
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => {
      channel.port1.close();
      resolve();
    };
    channel.port2.postMessage(null);
  });
}

/** The state and message handling of one ranking worker, apart from the worker global so tests can drive it. */
export function createRankHandler(post: Post): (request: RankRequest) => void {
  const lists = new Map<string, { name: string; parts: Part[] }>();
  let parts: Part[] = [];
  let version = -1;
  /** Highest job seen: a job stops as soon as a newer one (or its cancel) arrives. */
  let latest = 0;

  async function screen(request: Extract<RankRequest, { type: "screen" }>): Promise<void> {
    const { job, from, to, spec } = request;
    if (request.version !== version) {
      post({ type: "failed", job, message: `catalog ${request.version} is not loaded in the worker (it has ${version})` });
      return;
    }
    const out = emptySlice(from, Math.max(0, to - from));
    for (let at = from; at < to; at += SCREEN_STEP) {
      if (latest !== job) return;
      screenInto(spec, parts, at, Math.min(to, at + SCREEN_STEP), out);
      post({ type: "progress", job, done: Math.min(to, at + SCREEN_STEP) - from });
      await yieldToMessages();
    }
    if (latest !== job) return;
    post({ type: "slice", job, slice: out }, sliceBuffers(out));
  }

  function finish(request: Extract<RankRequest, { type: "finish" }>): void {
    if (latest !== request.job) return;
    if (request.version !== version) {
      post({ type: "failed", job: request.job, message: `catalog ${request.version} is not loaded in the worker (it has ${version})` });
      return;
    }
    const ranking = finishRanking(request.spec, parts, request.slices);
    post({ type: "ranked", job: request.job, ranking }, rankingBuffers(ranking));
  }

  return (request) => {
    switch (request.type) {
      case "list": {
        const list = request.first ? { name: request.name, parts: [] as Part[] } : (lists.get(request.id) ?? { name: request.name, parts: [] });
        for (const p of request.parts) list.parts.push(p);
        lists.set(request.id, list);
        return;
      }
      case "dropList":
        lists.delete(request.id);
        return;
      case "catalog":
        parts = mergeLists(request.order.flatMap((id) => {
          const list = lists.get(id);
          return list === undefined ? [] : [list];
        })).parts;
        version = request.version;
        return;
      case "screen":
        latest = Math.max(latest, request.job);
        void screen(request).catch((error: unknown) => post({ type: "failed", job: request.job, message: String(error) }));
        return;
      case "finish":
        try {
          finish(request);
        } catch (error) {
          post({ type: "failed", job: request.job, message: String(error) });
        }
        return;
      case "cancel":
        // Job numbers only grow, so the next job (job + 1) still runs.
        latest = Math.max(latest, request.job + 1);
        return;
    }
  };
}
