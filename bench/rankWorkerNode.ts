import { parentPort } from "node:worker_threads";
import { createRankHandler } from "../src/worker/rankWorkerCore.ts";
import type { RankRequest } from "../src/worker/protocol.ts";

// The workbench's ranking worker (rankWorkerCore) on a Node worker thread, for the engine bench.
const handle = createRankHandler((reply, transfer) => parentPort!.postMessage(reply, (transfer ?? []) as ArrayBuffer[]));
parentPort!.on("message", (request: RankRequest) => handle(request));
parentPort!.postMessage("ready");
