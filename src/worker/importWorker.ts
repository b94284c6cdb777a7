import { runImport } from "./importWorkerCore.ts";
import type { ImportReply, ImportRequest } from "./protocol.ts";
import { workerScope } from "./workerScope.ts";

// One import per worker: the page terminates the worker to cancel, which stops even the
// synchronous parse in the middle.
const scope = workerScope<ImportRequest, ImportReply>();
scope.onmessage = (event) => {
  runImport(event.data, (reply) => scope.postMessage(reply));
};
