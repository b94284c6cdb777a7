import { useMemo } from "react";
import { evaluatePart } from "../../engine/evaluatePart.ts";
import { effectiveTolerance } from "../../engine/cornerPoints.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { findPart, useCatalog } from "../../state/catalogStore.ts";
import { useRanking } from "../../state/rankingStore.ts";
import { setExtras, useExtras } from "../../state/extrasStore.ts";
import { addToShortlist, removeFromShortlist, showScreen } from "../../state/workspaceActions.ts";
import { notify } from "../../state/noticeStore.ts";
import { StatusMark } from "../common/StatusMark.tsx";
import { chosenCorner, keyOf } from "./cornerChoice.ts";
import { CornerPicker } from "./CornerPicker.tsx";
import { WaveformChart } from "./WaveformChart.tsx";
import { InductanceChart } from "./InductanceChart.tsx";
import { CornerTable } from "./CornerTable.tsx";
import { CheckList } from "./CheckList.tsx";
import { PartFacts } from "./PartFacts.tsx";
import { PartPicker } from "./PartPicker.tsx";

/** One part in full: its current at a chosen corner, its L(i), every corner and every check. */
export function DetailScreen() {
  const selected = useWorkspace((w) => w.view.selectedPart);
  const spec = useWorkspace((w) => w.spec);
  const shortlist = useWorkspace((w) => w.shortlist);
  const merged = useCatalog((c) => c.merged);
  const lists = useCatalog((c) => c.lists);
  const ranking = useRanking((r) => (r.version === merged.version ? r.ranking : null));
  const cornerKey = useExtras((e) => e.detailCorner);
  const fallback = ranking !== null && ranking.count > 0 ? (merged.parts[ranking.order[0]!]?.partNumber ?? null) : null;
  const partNumber = selected ?? fallback;
  const found = partNumber === null ? null : findPart(merged, partNumber);
  const part = found?.part ?? null;
  const e = useMemo(() => (part === null ? null : evaluatePart(spec, part)), [spec, part]);
  if (part === null || e === null) {
    return (
      <div className="screen">
        <h1>Part detail</h1>
        <PartPicker />
        <p className="card empty">{selected !== null ? `${selected} is not in the loaded lists (was its list removed?).` : "Open a part from the Ranking (click its number) or type its number above."}</p>
      </div>
    );
  }
  const shown = chosenCorner(e, cornerKey);
  const corner = e.corners[shown]!;
  const onList = shortlist.includes(part.partNumber);
  const extra = Object.values(lists).find((l) => l.summary?.extra[part.partNumber] !== undefined)?.summary?.extra[part.partNumber] ?? null;
  const rank = found !== null && ranking !== null ? (ranking.rankOf[found.index] ?? -1) + 1 : null;
  return (
    <div className="screen">
      <div className="screen-head">
        <h1>{part.partNumber}</h1>
        <span className="muted">{[part.maker, part.series, part.material].filter((x) => x !== null).join(" · ")}</span>
        <StatusMark status={e.status} />
        {rank !== null && rank > 0 && <span className="muted">rank {rank.toLocaleString("en")}</span>}
        {selected === null && <span className="muted">(the top-ranked part)</span>}
        <button
          type="button"
          aria-pressed={onList}
          onClick={() => {
            if (onList) removeFromShortlist(part.partNumber);
            else if (addToShortlist(part.partNumber) === "full") notify("warning", "The shortlist holds six parts: remove one on the Compare screen first.");
          }}
        >
          {onList ? "✓ On the shortlist" : "+ Add to shortlist"}
        </button>
        <button type="button" onClick={() => showScreen("ranking")}>
          Back to the ranking
        </button>
      </div>
      <PartPicker />
      <section className="card">
        <h2>Operating corner</h2>
        <CornerPicker corners={e.corners} shown={shown} idPrefix="detail" onPick={(key) => setExtras({ detailCorner: key })} onWorst={() => setExtras({ detailCorner: null })} />
      </section>
      <div className="two-col">
        <section className="card" aria-labelledby="wave-title">
          <h2 id="wave-title">Inductor current</h2>
          <WaveformChart spec={spec} part={part} corner={corner} />
        </section>
        <section className="card" aria-labelledby="curve-title">
          <h2 id="curve-title">Inductance against current</h2>
          <InductanceChart part={part} corner={corner} />
        </section>
      </div>
      <section className="card" aria-labelledby="checks-title">
        <h2 id="checks-title">Checks</h2>
        <CheckList checks={e.checks} />
      </section>
      <section className="card" aria-labelledby="corners-title">
        <h2 id="corners-title">Every corner</h2>
        <CornerTable part={part} corners={e.corners} tolerance={effectiveTolerance(spec, part)} shown={shown} onShow={(k) => setExtras({ detailCorner: keyOf(e.corners[k]!) })} />
      </section>
      <section className="card" aria-labelledby="facts-title">
        <h2 id="facts-title">List data</h2>
        <PartFacts part={part} extra={extra} />
      </section>
    </div>
  );
}
