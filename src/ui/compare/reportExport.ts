import type { Workspace } from "../../state/workspace.ts";

/**
 * The report module is another engineer's and may not be there yet: a glob import finds it when
 * it is, and is simply empty (the button then says why it is off) when it is not.
 */
const found = import.meta.glob("../../report/exportReport.ts");
export const reportAvailable = Object.keys(found).length > 0;

export interface ReportFile {
  fileName: string;
  html: string;
}

/**
 * Runs exportReport(workspace) in a worker: it re-imports and screens every list, which for a
 * large catalog takes seconds that the page must not freeze for.
 */
export function exportReportOffThread(workspace: Workspace): Promise<ReportFile> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL("../../worker/reportWorker.ts", import.meta.url), { type: "module", name: "coilsift-report" });
    worker.onmessage = (event: MessageEvent<{ ok: true; file: ReportFile } | { ok: false; message: string }>) => {
      worker.terminate();
      if (event.data.ok) resolve(event.data.file);
      else reject(new Error(event.data.message));
    };
    worker.onerror = (event) => {
      worker.terminate();
      reject(new Error(event.message || "the report worker stopped"));
    };
    worker.postMessage(workspace);
  });
}
