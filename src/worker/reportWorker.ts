import type { Workspace } from "../state/workspace.ts";
import { workerScope } from "./workerScope.ts";

type ExportReport = (workspace: Workspace) => { fileName: string; html: string };

// Eager: a worker bundle is a single file. Empty while the report module does not exist.
const modules = import.meta.glob<{ exportReport: ExportReport }>("../report/exportReport.ts", { eager: true });
const exportReport = Object.values(modules)[0]?.exportReport;

type Reply = { ok: true; file: { fileName: string; html: string } } | { ok: false; message: string };
const scope = workerScope<Workspace, Reply>();
scope.onmessage = (event) => {
  if (exportReport === undefined) {
    scope.postMessage({ ok: false, message: "report export arrives with the report module" });
    return;
  }
  try {
    const { fileName, html } = exportReport(event.data);
    scope.postMessage({ ok: true, file: { fileName, html } });
  } catch (error) {
    scope.postMessage({ ok: false, message: error instanceof Error ? error.message : String(error) });
  }
};
