import { useState } from "react";
import { workspaceStore } from "../../state/workspaceStore.ts";
import { downloadText } from "../common/download.ts";
import { exportReportOffThread, reportAvailable } from "./reportExport.ts";

/** Export report: exportReport(workspace) from src/report, run off the page's thread, saved as HTML. */
export function ExportReportButton() {
  const [state, setState] = useState<{ busy: boolean; message: string | null }>({ busy: false, message: null });
  const onExportReport = async () => {
    setState({ busy: true, message: null });
    try {
      const file = await exportReportOffThread(workspaceStore.getState());
      downloadText(file.fileName, file.html, "text/html");
      setState({ busy: false, message: `Saved ${file.fileName}.` });
    } catch (error) {
      setState({ busy: false, message: `The report could not be made: ${error instanceof Error ? error.message : String(error)}` });
    }
  };
  if (!reportAvailable) {
    return (
      <button type="button" disabled title="report export arrives with the report module">
        Export report
      </button>
    );
  }
  return (
    <span className="button-row">
      <button type="button" className="primary" disabled={state.busy} onClick={() => void onExportReport()}>
        {state.busy ? "Building the report…" : "Export report"}
      </button>
      {state.message !== null && <span role="status">{state.message}</span>}
    </span>
  );
}
