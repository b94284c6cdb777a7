import { useMemo } from "react";
import { useRanking } from "../../state/rankingStore.ts";
import { useCatalog } from "../../state/catalogStore.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { addToShortlist, openPart, selectPart } from "../../state/workspaceActions.ts";
import { setExtras, useExtras } from "../../state/extrasStore.ts";
import { notify } from "../../state/noticeStore.ts";
import { mm3, watts } from "../common/format.ts";
import { ScatterCanvas } from "./ScatterCanvas.tsx";
import { tradeoffPoints } from "./tradeoffData.ts";

/** Worst-case loss against volume for the passing parts; the Pareto front marked; a click selects. */
export function TradeoffScreen() {
  const merged = useCatalog((c) => c.merged);
  const ranking = useRanking((r) => (r.version === merged.version ? r.ranking : null));
  const includeIncomplete = useExtras((e) => e.tradeoffIncomplete);
  const selectedPart = useWorkspace((w) => w.view.selectedPart);
  const shortlist = useWorkspace((w) => w.shortlist);
  const points = useMemo(() => (ranking === null ? [] : tradeoffPoints(ranking, merged.parts, includeIncomplete)), [ranking, merged.parts, includeIncomplete]);
  const front = useMemo(() => points.filter((p) => p.pareto).sort((a, b) => a.volume - b.volume), [points]);
  const selectedIndex = selectedPart === null ? null : (merged.index.get(selectedPart.trim().toUpperCase()) ?? null);
  const selected = points.find((p) => p.index === selectedIndex) ?? null;
  const shortlistIt = (pn: string) => {
    if (addToShortlist(pn) === "full") notify("warning", "The shortlist holds six parts: remove one on the Compare screen first.");
  };
  return (
    <div className="screen">
      <div className="screen-head">
        <h1>Trade-off</h1>
        <span className="muted">
          {points.length.toLocaleString("en")} parts shown, {front.length} Pareto-optimal (◆): none of the others is both smaller and cooler
        </span>
        <label className="check-field">
          <input type="checkbox" checked={includeIncomplete} onChange={(e) => setExtras({ tradeoffIncomplete: e.target.checked })} /> Include parts with unchecked data
        </label>
      </div>
      {ranking === null ? (
        <p className="card empty">Waiting for the ranking…</p>
      ) : points.length === 0 ? (
        <p className="card empty">No part passes every check with a known size and loss. Loosen the targets on the Design screen, or include parts with unchecked data.</p>
      ) : (
        <>
          <section className="card">
            <ScatterCanvas points={points} selected={selectedIndex} onSelect={(i) => selectPart(merged.parts[i]!.partNumber)} />
            <p className="legend">
              <span className="legend-item">
                <span aria-hidden="true" style={{ color: "#1f5f8b" }}>
                  ●
                </span>
                passing part
              </span>
              <span className="legend-item">
                <span aria-hidden="true" style={{ color: "#c58a22" }}>
                  ◆
                </span>
                Pareto-optimal (joined by the dashed step line)
              </span>
              <span className="legend-item">
                <span aria-hidden="true" style={{ color: "#a12f2f" }}>
                  ◯
                </span>
                selected
              </span>
            </p>
          </section>
          {selected !== null && (
            <section className="card selection-card" aria-live="polite" aria-label="Selected part">
              <strong>{merged.parts[selected.index]!.partNumber}</strong>
              <span>{mm3(selected.volume)}</span>
              <span>{watts(selected.loss)} worst case</span>
              <span>{selected.pareto ? "◆ Pareto-optimal" : "dominated by a smaller, cooler part"}</span>
              <button type="button" onClick={() => openPart(merged.parts[selected.index]!.partNumber)}>
                Open detail
              </button>
              {!shortlist.includes(merged.parts[selected.index]!.partNumber) && (
                <button type="button" onClick={() => shortlistIt(merged.parts[selected.index]!.partNumber)}>
                  + Shortlist
                </button>
              )}
            </section>
          )}
          <section className="card" aria-labelledby="front-title">
            <h2 id="front-title">Pareto-optimal parts, smallest first</h2>
            <div className="table-scroll limited">
              <table className="grid-table">
                <thead>
                  <tr>
                    <th scope="col">Part</th>
                    <th scope="col" className="num">Volume</th>
                    <th scope="col" className="num">Worst-case loss</th>
                    <th scope="col" className="num">Score</th>
                    <th scope="col">Select</th>
                  </tr>
                </thead>
                <tbody>
                  {front.map((p) => {
                    const pn = merged.parts[p.index]!.partNumber;
                    return (
                      <tr key={p.index} className={p.index === selectedIndex ? "is-shown" : undefined}>
                        <th scope="row">{pn}</th>
                        <td className="num">{mm3(p.volume)}</td>
                        <td className="num">{watts(p.loss)}</td>
                        <td className="num">{(ranking.score[p.index] ?? 0).toFixed(1)}</td>
                        <td>
                          <button type="button" onClick={() => selectPart(pn)} aria-label={`Select ${pn}`}>
                            Select
                          </button>
                        </td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
          </section>
        </>
      )}
    </div>
  );
}
