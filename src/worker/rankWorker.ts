import { createRankHandler } from "./rankWorkerCore.ts";
import type { RankReply, RankRequest } from "./protocol.ts";
import { workerScope } from "./workerScope.ts";

const scope = workerScope<RankRequest, RankReply>();
const handle = createRankHandler((reply, transfer) => scope.postMessage(reply, transfer ?? []));
scope.onmessage = (event) => handle(event.data);
