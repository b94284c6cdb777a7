import type { Part, Spec } from "../engine/types.ts";
import type { RankReply, RankRequest } from "./protocol.ts";
import { PART_CHUNK } from "./protocol.ts";
import { sliceBuffers, type SliceFigures } from "./screenSlice.ts";
import type { Ranking } from "./finishRanking.ts";

/** What the page needs of a Worker (a real one, or a test's in-process stand-in). */
export interface WorkerLike {
  postMessage(message: RankRequest, transfer?: Transferable[]): void;
  onmessage: ((event: MessageEvent<RankReply>) => void) | null;
  onerror?: ((event: ErrorEvent) => void) | null;
  terminate(): void;
}

export interface RankingListener {
  onProgress(job: number, done: number, total: number): void;
  onRanked(job: number, ranking: Ranking): void;
  onFailed(job: number, message: string): void;
}

interface Job {
  job: number;
  version: number;
  spec: Spec;
  count: number;
  /** Ranges of the list still to hand out, first one next. */
  pending: { from: number; to: number }[];
  chunks: number;
  slices: SliceFigures[];
  /** Parts in the slices already back. */
  doneBefore: number;
  /** Parts done so far in the range each worker is screening. */
  progress: number[];
}

/**
 * Ranges of the list, handed out one at a time as workers come back, so that a worker slowed by
 * anything else on the machine takes fewer of them. Each range is a round trip through the page,
 * which may be busy drawing just then, so short lists get few: a list is cut into equal ranges,
 * the same number per worker, none under EVEN_MIN parts (one each below that; 10 000 parts in
 * five ranges of 2 000 left one worker three of them while the other idled after two). A long
 * list gets ranges that shrink as it is used up (each a 2·workers-th of what is left, none under
 * GUIDED_MIN): large first ranges keep the round trips few, small last ones keep the workers
 * finishing together.
 */
const EVEN_MIN = 6000;
const EVEN_PER_WORKER = 4;
const GUIDED_MIN = 2000;

export function chunkRanges(count: number, workers: number): { from: number; to: number }[] {
  const ranges: { from: number; to: number }[] = [];
  if (count < workers * EVEN_PER_WORKER * EVEN_MIN) {
    const perWorker = Math.max(1, Math.min(EVEN_PER_WORKER, Math.floor(count / (workers * EVEN_MIN))));
    const pieces = Math.max(1, Math.min(count, workers * perWorker));
    // Range k starts at ⌊k·count/pieces⌋: sizes differ by one part at most.
    for (let k = 0; k < pieces; k++) ranges.push({ from: Math.floor((k * count) / pieces), to: Math.floor(((k + 1) * count) / pieces) });
    return ranges;
  }
  for (let from = 0; from < count; ) {
    const left = count - from;
    let size = Math.max(GUIDED_MIN, Math.ceil(left / (2 * workers)));
    // A remainder under half a minimum range goes with this one.
    if (left - size < GUIDED_MIN / 2) size = left;
    ranges.push({ from, to: from + size });
    from += size;
  }
  return ranges;
}

/** Lets the page handle input between two chunks of a long send. */
const pause = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/**
 * Runs rankings on a pool of workers: they screen ranges of the list handed out as they come back,
 * the first one joins the slices and ranks the whole (scores are relative to the best part, so
 * they need every slice).
 * A new request supersedes the running one; the workers drop stale work at their next step.
 * Every message goes through one queue, so lists, catalogs and jobs arrive in the order sent.
 */
export class RankingClient {
  private nextJob = 1;
  private current: Job | null = null;
  private queue: Promise<void> = Promise.resolve();

  private listener: RankingListener;

  constructor(
    private readonly workers: WorkerLike[],
    listener?: RankingListener,
  ) {
    this.listener = listener ?? { onProgress: () => {}, onRanked: () => {}, onFailed: () => {} };
    workers.forEach((w, k) => {
      w.onmessage = (event) => this.receive(k, event.data);
      if ("onerror" in w) w.onerror = (event) => this.fail(event.message || "a ranking worker stopped");
    });
  }

  setListener(listener: RankingListener): void {
    this.listener = listener;
  }

  get size(): number {
    return this.workers.length;
  }

  private enqueue(step: () => void | Promise<void>): Promise<void> {
    this.queue = this.queue.then(step, step);
    return this.queue;
  }

  /** Sends one list's parts to every worker, in chunks with pauses between them. */
  sendList(id: string, name: string, parts: readonly Part[]): Promise<void> {
    return this.enqueue(async () => {
      for (let at = 0; at === 0 || at < parts.length; at += PART_CHUNK) {
        const chunk = parts.slice(at, at + PART_CHUNK);
        for (const w of this.workers) w.postMessage({ type: "list", id, name, parts: chunk, first: at === 0 });
        if (at + PART_CHUNK < parts.length) await pause();
      }
    });
  }

  dropList(id: string): Promise<void> {
    return this.enqueue(() => {
      for (const w of this.workers) w.postMessage({ type: "dropList", id });
    });
  }

  setCatalog(version: number, order: string[]): Promise<void> {
    return this.enqueue(() => {
      for (const w of this.workers) w.postMessage({ type: "catalog", version, order });
    });
  }

  /** Starts ranking `count` parts of catalog `version`; returns the job number. */
  rank(spec: Spec, version: number, count: number): number {
    const job = this.nextJob++;
    const previous = this.current;
    const n = this.workers.length;
    const pending = chunkRanges(count, n);
    const current: Job = { job, version, spec, count, pending, chunks: pending.length, slices: [], doneBefore: 0, progress: new Array<number>(n).fill(0) };
    this.current = current;
    void this.enqueue(() => {
      if (this.current?.job !== job) return;
      if (previous !== null) for (const w of this.workers) w.postMessage({ type: "cancel", job: previous.job });
      this.workers.forEach((_, k) => this.handOut(current, k));
    });
    return job;
  }

  /** Gives worker k the next range of the job, if one is left. */
  private handOut(job: Job, k: number): void {
    const range = job.pending.shift();
    if (range === undefined) return;
    this.workers[k]!.postMessage({ type: "screen", job: job.job, version: job.version, spec: job.spec, from: range.from, to: range.to });
  }

  cancel(): void {
    const running = this.current;
    this.current = null;
    if (running !== null) void this.enqueue(() => this.workers.forEach((w) => w.postMessage({ type: "cancel", job: running.job })));
  }

  terminate(): void {
    this.current = null;
    for (const w of this.workers) w.terminate();
  }

  private fail(message: string): void {
    const running = this.current;
    if (running === null) return;
    this.current = null;
    this.listener.onFailed(running.job, message);
  }

  private receive(worker: number, reply: RankReply): void {
    const job = this.current;
    if (job === null || reply.job !== job.job) return;
    switch (reply.type) {
      case "progress":
        job.progress[worker] = reply.done;
        this.listener.onProgress(job.job, job.doneBefore + job.progress.reduce((a, b) => a + b, 0), job.count);
        return;
      case "slice": {
        job.slices.push(reply.slice);
        job.doneBefore += reply.slice.status.length;
        job.progress[worker] = 0;
        this.handOut(job, worker);
        // Workers report progress only now and then (PROGRESS_MS); a finished range always counts.
        this.listener.onProgress(job.job, job.doneBefore + job.progress.reduce((a, b) => a + b, 0), job.count);
        if (job.slices.length < job.chunks) return;
        const slices = job.slices;
        job.slices = [];
        // The slices' buffers move on to the first worker; the page keeps no copy.
        this.workers[0]!.postMessage({ type: "finish", job: job.job, version: job.version, spec: job.spec, slices }, slices.flatMap(sliceBuffers));
        return;
      }
      case "ranked":
        this.current = null;
        this.listener.onRanked(job.job, reply.ranking);
        return;
      case "failed":
        this.fail(reply.message);
        return;
    }
  }
}
