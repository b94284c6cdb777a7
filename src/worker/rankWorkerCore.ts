import type { Part } from "../engine/types.ts";
import { mergeLists } from "../catalog/mergeLists.ts";
import { PartScreener } from "../engine/screenParts.ts";
import { emptySlice, screenInto, sliceBuffers } from "./screenSlice.ts";
import { finishRanking, rankingBuffers } from "./finishRanking.ts";
import type { RankReply, RankRequest } from "./protocol.ts";

/**
 * Screening work between two looks at the message queue: a newer spec stops an old job within
 * about a frame, and the round trips cost next to nothing beside the work. Checked on the clock
 * every SCREEN_STEP parts, so the step adapts to the machine and the list.
 */
export const SCREEN_STEP = 100;
export const SCREEN_SLICE_MS = 12;
/**
 * Progress goes to the page at most this often: every report re-renders the progress bar, and
 * that page work competes with the workers for the cores (on two cores, reports every 12 ms
 * slowed a 10 000-part ranking by about a third).
 */
export const PROGRESS_MS = 100;

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
  /** One for the worker's life, aimed at each step's spec (see PartScreener). */
  let screener: PartScreener | null = null;

  async function screen(request: Extract<RankRequest, { type: "screen" }>): Promise<void> {
    const { job, from, to, spec } = request;
    if (request.version !== version) {
      post({ type: "failed", job, message: `catalog ${request.version} is not loaded in the worker (it has ${version})` });
      return;
    }
    const out = emptySlice(from, Math.max(0, to - from));
    let at = from;
    let reported = performance.now();
    while (at < to) {
      if (latest !== job) return;
      const started = performance.now();
      let now = started;
      do {
        const end = Math.min(to, at + SCREEN_STEP);
        screenInto((screener ??= new PartScreener(spec)).aim(spec), parts, at, end, out);
        at = end;
        now = performance.now();
      } while (at < to && now - started < SCREEN_SLICE_MS);
      if (at < to && now - reported >= PROGRESS_MS) {
        post({ type: "progress", job, done: at - from });
        reported = now;
      }
      if (at < to) await yieldToMessages();
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
