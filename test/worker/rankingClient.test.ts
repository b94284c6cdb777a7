import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { importPartList } from "../../src/catalog/importPartList.ts";
import { parseSpec } from "../../src/engine/parseSpec.ts";
import { screenParts } from "../../src/engine/screenParts.ts";
import type { Spec } from "../../src/engine/types.ts";
import { chunkRanges, RankingClient } from "../../src/worker/rankingClient.ts";
import type { Ranking } from "../../src/worker/finishRanking.ts";
import type { RankRequest } from "../../src/worker/protocol.ts";
import { FakeRankWorker } from "./fakeWorkers.ts";

const spec = (parseSpec(JSON.parse(readFileSync("sample-parts/demo-spec.json", "utf8"))) as { ok: true; spec: Spec }).spec;
const parts = importPartList(readFileSync("sample-parts/demo-parts.csv", "utf8")).parts;

function client(workers: number) {
  const events: { ranked: [number, Ranking][]; failed: string[]; progress: number[] } = { ranked: [], failed: [], progress: [] };
  let resolve: () => void = () => {};
  const c = new RankingClient(
    Array.from({ length: workers }, () => new FakeRankWorker()),
    {
      onProgress: (_job, done) => events.progress.push(done),
      onRanked: (job, ranking) => {
        events.ranked.push([job, ranking]);
        resolve();
      },
      onFailed: (_job, message) => {
        events.failed.push(message);
        resolve();
      },
    },
  );
  const settled = () => new Promise<void>((r) => (resolve = r));
  return { c, events, settled };
}

describe("RankingClient", () => {
  it("RankingClient over three workers ranks like screenParts in one pass", async () => {
    const { c, events, settled } = client(3);
    void c.sendList("a", "demo", parts);
    void c.setCatalog(1, ["a"]);
    const done = settled();
    c.rank(spec, 1, parts.length);
    await done;
    expect(events.failed).toEqual([]);
    const whole = screenParts(spec, parts);
    expect(Array.from(events.ranked[0]![1].order)).toEqual(Array.from(whole.order));
    expect(events.progress.at(-1)).toBe(parts.length);
  });

  it("RankingClient hands a long list out in ranges as workers come back and still ranks like screenParts", async () => {
    // 80 copies of the demo list (24 640 parts) make two ranges per worker.
    const many = Array.from({ length: 80 }, (_, copy) => parts.map((p) => ({ ...p, partNumber: `${p.partNumber}-${copy}` }))).flat();
    const workers = Array.from({ length: 2 }, () => new FakeRankWorker());
    const screened: number[][] = workers.map(() => []);
    workers.forEach((w, k) => {
      const post = w.postMessage.bind(w);
      w.postMessage = (message: RankRequest) => {
        if (message.type === "screen") screened[k]!.push(message.to - message.from);
        post(message);
      };
    });
    let ranked: Ranking | null = null;
    let resolve: () => void = () => {};
    const done = new Promise<void>((r) => (resolve = r));
    const progress: number[] = [];
    const c = new RankingClient(workers, {
      onProgress: (_job, d) => progress.push(d),
      onRanked: (_job, r) => {
        ranked = r;
        resolve();
      },
      onFailed: (_job, message) => {
        throw new Error(message);
      },
    });
    void c.sendList("a", "many", many);
    void c.setCatalog(1, ["a"]);
    c.rank(spec, 1, many.length);
    await done;
    expect(screened.flat().length).toBeGreaterThan(2);
    expect(screened.flat().reduce((a, b) => a + b, 0)).toBe(many.length);
    expect(Array.from(ranked!.order)).toEqual(Array.from(screenParts(spec, many).order));
    expect(Math.max(...progress)).toBe(many.length);
  });

  it("RankingClient.rank supersedes a running job: only the newest one is reported", async () => {
    const { c, events, settled } = client(2);
    void c.sendList("a", "demo", parts);
    void c.setCatalog(1, ["a"]);
    c.rank(spec, 1, parts.length);
    const second = { ...spec, vin: { ...spec.vin, max: 20 } };
    const done = settled();
    const job = c.rank(second, 1, parts.length);
    await done;
    expect(events.ranked.map(([j]) => j)).toEqual([job]);
    expect(Array.from(events.ranked[0]![1].order)).toEqual(Array.from(screenParts(second, parts).order));
  });

  it("RankingClient merges lists as mergeLists does: the later list wins a duplicate part number", async () => {
    const { c, events, settled } = client(2);
    const changed = parts.slice(0, 5).map((p) => ({ ...p, price: 99 }));
    void c.sendList("a", "demo", parts);
    void c.sendList("b", "override", changed);
    void c.setCatalog(2, ["a", "b"]);
    const done = settled();
    c.rank(spec, 2, parts.length);
    await done;
    expect(events.ranked[0]![1].count).toBe(parts.length);
    void c.dropList("b");
    void c.setCatalog(3, ["a"]);
    const again = settled();
    c.rank(spec, 3, parts.length);
    await again;
    expect(Array.from(events.ranked[1]![1].order)).toEqual(Array.from(screenParts(spec, parts).order));
  });

  it("RankingClient reports a job for a catalog version the workers do not have as failed", async () => {
    const { c, events, settled } = client(1);
    void c.sendList("a", "demo", parts);
    void c.setCatalog(1, ["a"]);
    const done = settled();
    c.rank(spec, 7, parts.length);
    await done;
    expect(events.failed[0]).toMatch(/catalog 7/);
  });

  it("chunkRanges covers the list once: a short list in equal ranges, the same number per worker; a long one in ranges that shrink toward the end", () => {
    for (const [count, workers] of [[0, 2], [1, 2], [308, 2], [10_000, 2], [24_640, 2], [47_999, 2], [48_000, 2], [100_000, 2], [100_000, 3], [7, 4]] as const) {
      const ranges = chunkRanges(count, workers);
      const covered = ranges.flatMap((r) => Array.from({ length: r.to - r.from }, (_, i) => r.from + i));
      expect(covered).toEqual(Array.from({ length: count }, (_, i) => i));
      const sizes = ranges.map((r) => r.to - r.from);
      if (count < workers * 24_000) {
        expect(ranges.length % Math.min(count, workers) || 0).toBe(0);
        expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
      } else {
        for (let k = 1; k < sizes.length - 1; k++) expect(sizes[k]).toBeLessThanOrEqual(sizes[k - 1]!);
        expect(Math.min(...sizes.slice(0, -1))).toBeGreaterThanOrEqual(2000);
        expect(sizes[0]).toBe(Math.ceil(count / (2 * workers)));
        expect(sizes.at(-1)).toBeGreaterThanOrEqual(1000);
      }
    }
    expect(chunkRanges(10_000, 2).map((r) => r.to - r.from)).toEqual([5000, 5000]);
    expect(chunkRanges(24_640, 2).map((r) => r.to - r.from)).toEqual([6160, 6160, 6160, 6160]);
    expect(chunkRanges(100_000, 2).map((r) => r.to - r.from).slice(0, 3)).toEqual([25_000, 18_750, 14_063]);
  });

});
