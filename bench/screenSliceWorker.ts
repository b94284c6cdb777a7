import { parentPort, workerData } from "node:worker_threads";
import { screenSlice, sliceBuffers } from "../src/worker/screenSlice.ts";
import { benchSpec, generateParts } from "./engineRank.bench.ts";

// Holds the generated list and screens the slice asked for, as a ranking worker of the workbench
// does (see twoWorkers in engineRank.bench.ts); the typed arrays are handed over, not copied.
const parts = generateParts((workerData as { count: number }).count, true);
parentPort!.on("message", ({ from, to }: { from: number; to: number }) => {
  const slice = screenSlice(benchSpec, parts, from, to);
  parentPort!.postMessage(slice, sliceBuffers(slice));
});
parentPort!.postMessage("ready");
