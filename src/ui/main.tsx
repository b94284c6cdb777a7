import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { App } from "./App.tsx";
import { applyLinkHash, startApp } from "../state/bootstrap.ts";
import { openBrowserStorage } from "../state/idbStorage.ts";
import { rankWorkerCount, spawnImportWorker, spawnRankWorker } from "../worker/spawn.ts";
import "./styles/base.css";
import "./styles/forms.css";
import "./styles/table.css";
import "./styles/screens.css";

const root = document.getElementById("root");
if (root === null) throw new Error("index.html has no #root element");

// The stores are filled (saved work or the demo) before the first render, so no screen ever
// shows a half-loaded workspace.
const storage = await openBrowserStorage();
const clearHash = () => history.replaceState(null, "", location.pathname + location.search);
await startApp({ storage, spawnImport: spawnImportWorker, spawnRank: spawnRankWorker, rankWorkers: rankWorkerCount(), hash: location.hash, clearHash });
// A link opened in this very tab changes only the hash: no reload, so it is read here.
window.addEventListener("hashchange", () => applyLinkHash(location.hash, clearHash));
createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
