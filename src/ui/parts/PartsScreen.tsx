import { useWorkspace } from "../../state/workspaceStore.ts";
import { useCatalog } from "../../state/catalogStore.ts";
import { showScreen } from "../../state/workspaceActions.ts";
import { ImportPanel } from "./ImportPanel.tsx";
import { PendingImports } from "./PendingImports.tsx";
import { ListCard } from "./ListCard.tsx";

/** Part lists in: import, the detected mapping and how to change it, what was refused and why. */
export function PartsScreen() {
  const sources = useWorkspace((w) => w.lists);
  const loaded = useCatalog((c) => c.lists);
  const merged = useCatalog((c) => c.merged);
  return (
    <div className="screen">
      <div className="screen-head">
        <h1>Parts</h1>
        <span role="status">
          {merged.parts.length.toLocaleString("en")} parts from {sources.length} list{sources.length === 1 ? "" : "s"}
        </span>
        {merged.parts.length > 0 && (
          <button type="button" onClick={() => showScreen("ranking")}>
            See the ranking
          </button>
        )}
      </div>
      <ImportPanel />
      <PendingImports />
      {merged.duplicates.length > 0 && (
        <details className="card">
          <summary>
            <span aria-hidden="true">⚠ </span>
            {merged.duplicates.length.toLocaleString("en")} part numbers are in more than one list: the later list's part is used
          </summary>
          <ul>
            {merged.duplicates.slice(0, 200).map((d) => (
              <li key={`${d.partNumber}-${d.kept}`}>{d.message}</li>
            ))}
          </ul>
        </details>
      )}
      {sources.length === 0 && <p className="card empty">No lists loaded. Add one above: a maker's or distributor's export works as it is.</p>}
      {[...sources].reverse().map((s) => (
        <ListCard key={s.id} source={s} loaded={loaded[s.id]} />
      ))}
    </div>
  );
}
