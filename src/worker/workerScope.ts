/**
 * The part of a dedicated worker's global scope the workers use. Declared here because the
 * project's TypeScript config carries the DOM library, which clashes with the WebWorker one.
 */
export interface WorkerScope<In, Out> {
  onmessage: ((event: MessageEvent<In>) => void) | null;
  postMessage(message: Out, transfer?: Transferable[]): void;
}

export function workerScope<In, Out>(): WorkerScope<In, Out> {
  return self as unknown as WorkerScope<In, Out>;
}
