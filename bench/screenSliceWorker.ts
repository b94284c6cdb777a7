import { parentPort, workerData } from "node:worker_threads";
import { screenFigures } from "../src/engine/screenParts.ts";
import { benchSpec, generateParts } from "./engineRank.bench.ts";

// Holds the generated list and screens the slice asked for (see twoWorkers in engineRank.bench.ts).
const parts = generateParts((workerData as { count: number }).count, true);
parentPort!.on("message", ({ from, to }: { from: number; to: number }) => {
  parentPort!.postMessage(screenFigures(benchSpec, parts, from, to));
});
parentPort!.postMessage("ready");
