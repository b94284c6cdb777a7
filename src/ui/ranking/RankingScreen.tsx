import { useMemo } from "react";
import { useShallow } from "zustand/react/shallow";
import { useRanking } from "../../state/rankingStore.ts";
import { useCatalog } from "../../state/catalogStore.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { showScreen } from "../../state/workspaceActions.ts";
import { filteredOrder, sortedOrder } from "../../state/rankingView.ts";
import { QuickSpec } from "./QuickSpec.tsx";
import { RankingFilters } from "./RankingFilters.tsx";
import { RankingStatus } from "./RankingStatus.tsx";
import { RankingTable } from "./RankingTable.tsx";

/** Every loaded part ranked against the spec, re-ranked in the workers on every valid change. */
export function RankingScreen() {
  // Progress ticks are left to RankingStatus: this screen re-renders only when a ranking lands.
  const { ranking, spec, version, serial, status } = useRanking(useShallow((r) => ({ ranking: r.ranking, spec: r.spec, version: r.version, serial: r.serial, status: r.status })));
  const merged = useCatalog((c) => c.merged);
  const loading = useCatalog((c) => c.pending.length > 0 || Object.values(c.lists).some((l) => l.state === "loading"));
  const filter = useWorkspace((w) => w.view.rankingFilter);
  const sort = useWorkspace((w) => w.view.rankingSort);
  // A ranking of another catalog version has other indices: it cannot be shown at all.
  const current = ranking !== null && version === merged.version ? ranking : null;
  const usable = current !== null && spec !== null ? { ranking: current, spec } : null;
  const indices = useMemo(() => (current === null ? null : sortedOrder(filteredOrder(current, merged.parts, filter), current, merged.parts, sort)), [current, merged.parts, filter, sort]);
  return (
    <div className="screen">
      <div className="screen-head">
        <h1>Ranking</h1>
        <RankingStatus />
      </div>
      <QuickSpec />
      {merged.parts.length === 0 && !loading ? (
        <div className="card empty">
          <p>No parts are loaded yet.</p>
          <button type="button" className="primary" onClick={() => showScreen("parts")}>
            Import a part list
          </button>
        </div>
      ) : usable === null || indices === null ? (
        <div className="card empty" aria-busy="true">
          {loading ? "Reading the part lists…" : "Ranking…"}
        </div>
      ) : (
        <>
          <RankingFilters parts={merged.parts} shown={indices.length} total={usable.ranking.count} />
          <RankingTable indices={indices} parts={merged.parts} ranking={usable.ranking} spec={usable.spec} serial={serial} stale={status === "ranking"} />
        </>
      )}
    </div>
  );
}
