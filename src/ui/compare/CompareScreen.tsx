import { useMemo } from "react";
import { evaluatePart } from "../../engine/evaluatePart.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { findPart, useCatalog } from "../../state/catalogStore.ts";
import { useRanking } from "../../state/rankingStore.ts";
import { setExtras, useExtras } from "../../state/extrasStore.ts";
import { showScreen } from "../../state/workspaceActions.ts";
import { MAX_SHORTLIST } from "../../state/workspace.ts";
import { CornerPicker } from "../detail/CornerPicker.tsx";
import { findCorner } from "../detail/cornerChoice.ts";
import { CompareTable } from "./CompareTable.tsx";
import { OverlayChart } from "./OverlayChart.tsx";
import { ExportReportButton } from "./ExportReportButton.tsx";
import type { CompareItem } from "./compareRows.ts";

/** Up to six shortlisted parts side by side, their waveforms overlaid at one corner. */
export function CompareScreen() {
  const shortlist = useWorkspace((w) => w.shortlist);
  const spec = useWorkspace((w) => w.spec);
  const merged = useCatalog((c) => c.merged);
  const ranking = useRanking((r) => (r.version === merged.version ? r.ranking : null));
  const corner = useExtras((e) => e.compareCorner);
  const { items, missing } = useMemo(() => {
    const items: CompareItem[] = [];
    const missing: string[] = [];
    for (const pn of shortlist.slice(0, MAX_SHORTLIST)) {
      const found = findPart(merged, pn);
      if (found === null) missing.push(pn);
      else items.push({ part: found.part, e: evaluatePart(spec, found.part), score: ranking === null ? null : (ranking.score[found.index] ?? null) });
    }
    return { items, missing };
  }, [shortlist, merged, spec, ranking]);
  const first = items[0];
  return (
    <div className="screen">
      <div className="screen-head">
        <h1>Compare</h1>
        <span className="muted">
          {shortlist.length} of {MAX_SHORTLIST} on the shortlist
        </span>
        <ExportReportButton />
      </div>
      {shortlist.length === 0 ? (
        <div className="card empty">
          <p>The shortlist is empty. Add parts from the Ranking (+ Shortlist) or from a part's detail.</p>
          <button type="button" className="primary" onClick={() => showScreen("ranking")}>
            Go to the ranking
          </button>
        </div>
      ) : (
        <>
          <section className="card" aria-labelledby="compare-table-title">
            <h2 id="compare-table-title">Side by side</h2>
            <CompareTable items={items} missing={missing} />
          </section>
          {first !== undefined && (
            <section className="card" aria-labelledby="overlay-title">
              <h2 id="overlay-title">Currents at the same corner</h2>
              <CornerPicker corners={first.e.corners} shown={Math.max(0, findCorner(first.e.corners, corner))} idPrefix="compare" onPick={(key) => setExtras({ compareCorner: key })} />
              <OverlayChart spec={spec} items={items} corner={corner} />
            </section>
          )}
        </>
      )}
    </div>
  );
}
