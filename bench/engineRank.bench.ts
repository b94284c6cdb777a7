import type { Part } from "../src/engine/types.ts";
import { completePart } from "../src/engine/partDefaults.ts";
import { makeSpec } from "../src/engine/specDefaults.ts";
import { screenParts } from "../src/engine/screenParts.ts";
import { RankingClient, type WorkerLike } from "../src/worker/rankingClient.ts";
import type { RankReply } from "../src/worker/protocol.ts";
import { Worker } from "node:worker_threads";
import { cornerPoints } from "../src/engine/cornerPoints.ts";
import { medianMs, settle } from "./measure.ts";
import { makeRandom } from "../sample-parts/generate.ts";

export const benchSpec = makeSpec({
  topology: "buck",
  vin: { min: 10.8, nom: 12, max: 13.2 },
  vout: 3.3,
  iout: { min: 0.2, max: 3 },
  fsw: 500e3,
  switchResistance: 0.03,
  rectifierDrop: 0.4,
  ambient: 40,
});

export function generateParts(count: number, rollOff: boolean): Part[] {
  const rnd = makeRandom(rollOff ? 7 : 11);
  const parts: Part[] = [];
  for (let i = 0; i < count; i++) {
    const inductance = 0.33e-6 * Math.pow(300, rnd());
    const size = 2 + 10 * rnd();
    parts.push(
      completePart({
        partNumber: `BENCH-${i}`,
        inductance,
        tolerance: 0.2,
        dcrTyp: 0.004 * (inductance / 1e-6) / size,
        dcrMax: 0.005 * (inductance / 1e-6) / size,
        isat: rollOff ? (size * 2) / Math.sqrt(inductance / 1e-6) : null,
        irms: size / Math.sqrt(inductance / 1e-6),
        srf: 200e6 / Math.sqrt(inductance / 1e-6),
        length: size * 1e-3,
        width: size * 1e-3,
        height: size * 0.5e-3,
        price: 0.05 + 0.05 * size,
        saturation: rnd() < 0.5 ? "hard" : "soft",
      }),
    );
  }
  return parts;
}

/**
 * The floor: closed-form CCM buck figures (ΔI, Ipk, Irms, DCR loss) in a bare typed-array loop
 * over the same number of part-corners, no modes, roll-off or thermal solution.
 */
function floorLoop(inductance: Float64Array, dcr: Float64Array, out: Float64Array, vins: number[], loads: number[]): number {
  const vo = benchSpec.vout;
  const fsw = benchSpec.fsw;
  let sum = 0;
  for (let p = 0; p < inductance.length; p++) {
    let worstLoss = 0;
    for (const vin of vins) {
      const d = vo / vin;
      for (const iout of loads) {
        for (const f of [0.8, 1, 1.2]) {
          const ripple = ((vin - vo) * d) / (fsw * inductance[p]! * f);
          const ipk = iout + ripple / 2;
          const rms2 = iout * iout + (ripple * ripple) / 12;
          const loss = rms2 * dcr[p]!;
          if (loss > worstLoss) worstLoss = loss;
          sum += ipk;
        }
      }
    }
    out[p] = worstLoss;
  }
  return sum;
}

export async function benchEngineRank(count = 100_000): Promise<string[]> {
  const lines: string[] = [];
  const cornersPerPart = cornerPoints(benchSpec, completePart({ partNumber: "x", inductance: 1e-6, tolerance: 0.2 })).length;
  const partCorners = count * cornersPerPart;
  const constant = generateParts(count, false);
  const rolled = generateParts(count, true);
  const inductance = Float64Array.from(rolled, (p) => p.inductance);
  const dcr = Float64Array.from(rolled, (p) => p.dcrMax ?? 0);
  const out = new Float64Array(count);
  const floor = await medianMs(() => floorLoop(inductance, dcr, out, [benchSpec.vin.min, benchSpec.vin.nom, benchSpec.vin.max], [benchSpec.iout.min, benchSpec.iout.max]));
  const constantMs = await medianMs(() => screenParts(benchSpec, constant));
  const rolledMs = await medianMs(() => screenParts(benchSpec, rolled));
  const parallelMs = await twoWorkers(rolled);
  const ns = (ms: number) => ((ms * 1e6) / partCorners).toFixed(0);
  lines.push(`engine ranking: ${count.toLocaleString("en")} parts × ${cornersPerPart} corners = ${partCorners.toLocaleString("en")} part-corners (median of 5)`);
  lines.push(`  floor (closed-form buck, bare typed-array loop): ${floor.toFixed(1)} ms, ${ns(floor)} ns per part-corner`);
  lines.push(
    `  constant L:  ${constantMs.toFixed(0)} ms, ${ns(constantMs)} ns per part-corner, ${Math.round((count / constantMs) * 1000).toLocaleString("en")} parts/s, ${(constantMs / floor).toFixed(0)}× floor`,
  );
  lines.push(
    `  roll-off:    ${rolledMs.toFixed(0)} ms, ${ns(rolledMs)} ns per part-corner, ${Math.round((count / rolledMs) * 1000).toLocaleString("en")} parts/s, ${(rolledMs / floor).toFixed(0)}× floor, ${(rolledMs / constantMs).toFixed(2)}× constant L`,
  );
  lines.push(
    `  roll-off, 2 worker threads: ${parallelMs.toFixed(0)} ms (the workbench's ranking client and workers, request to ranking received), ${Math.round((count / parallelMs) * 1000).toLocaleString("en")} parts/s`,
  );
  return lines;
}

/**
 * Wall time of the ranking on both cores, by the workbench's own path: its RankingClient hands
 * ranges of the list to two of its ranking workers (rankWorkerCore, here on Node worker threads),
 * which hold the list as they do after an import; the first joins, scores and sorts. Timed from
 * rank() to the ranking received.
 */
async function twoWorkers(parts: Part[]): Promise<number> {
  const bootstrap = new URL("./tsWorker.mjs", import.meta.url);
  const entry = new URL("./rankWorkerNode.ts", import.meta.url).href;
  const threads = [0, 1].map(() => new Worker(bootstrap, { workerData: { entry } }));
  await Promise.all(threads.map((w) => new Promise((resolve) => w.once("message", resolve))));
  const workers: WorkerLike[] = threads.map((thread) => {
    const like: WorkerLike = {
      onmessage: null,
      postMessage: (message, transfer) => thread.postMessage(message, (transfer ?? []) as ArrayBuffer[]),
      terminate: () => void thread.terminate(),
    };
    thread.on("message", (data: RankReply) => like.onmessage?.({ data } as MessageEvent<RankReply>));
    return like;
  });
  let finished: (() => void) | null = null;
  const client = new RankingClient(workers, { onProgress: () => {}, onRanked: () => finished?.(), onFailed: (_job, message) => console.log(`ranking failed: ${message}`) });
  await client.sendList("bench", "bench", parts);
  await client.setCatalog(1, ["bench"]);
  const once = async () => {
    const ranked = new Promise<void>((resolve) => (finished = resolve));
    const start = performance.now();
    client.rank(benchSpec, 1, parts.length);
    await ranked;
    return performance.now() - start;
  };
  await once();
  const times: number[] = [];
  for (let r = 0; r < 5; r++) {
    await settle();
    times.push(await once());
  }
  client.terminate();
  times.sort((a, b) => a - b);
  return times[2]!;
}
