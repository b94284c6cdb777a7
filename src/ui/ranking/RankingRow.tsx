import { memo, type CSSProperties, type Ref } from "react";
import type { Part, Spec } from "../../engine/types.ts";
import type { Ranking } from "../../worker/finishRanking.ts";
import { addToShortlist, openPart, removeFromShortlist } from "../../state/workspaceActions.ts";
import { toggleExpanded } from "../../state/extrasStore.ts";
import { notify } from "../../state/noticeStore.ts";
import { CheckMark } from "../common/StatusMark.tsx";
import { CHECK_LABEL } from "../common/format.ts";
import { COLUMNS, GRID_TEMPLATE } from "./columns.tsx";
import { reasonLines, useRowEvaluation } from "./rowEvaluation.ts";

export interface RowProps {
  index: number;
  virtualIndex: number;
  parts: readonly Part[];
  ranking: Ranking;
  spec: Spec;
  serial: number;
  expanded: boolean;
  shortlisted: boolean;
  selected: boolean;
  style: CSSProperties;
  /** Set on expanded rows only: the others have the fixed row height and need no measuring. */
  ref: Ref<HTMLDivElement> | undefined;
}

function toggleShortlist(partNumber: string, on: boolean): void {
  if (on) return removeFromShortlist(partNumber);
  const r = addToShortlist(partNumber);
  if (r === "full") notify("warning", "The shortlist holds six parts: remove one on the Compare screen first.");
}

/** One ranked part: its figures, its verdict with the first reason (all reasons on hover or expand). */
function RankingRowView({ ref, ...p }: RowProps) {
  const part = p.parts[p.index]!;
  const e = useRowEvaluation(p.serial, p.spec, part, p.index);
  const lines = e === null ? [] : reasonLines(e);
  const reason = e === null || e.status === "pass" ? null : (e.failures[0] ?? e.unchecked[0] ?? null);
  const ctx = { parts: p.parts, r: p.ranking, reason };
  const status = p.ranking.status[p.index];
  const cls = `rrow${status === 2 ? " is-fail" : ""}${p.selected ? " is-selected" : ""}`;
  const reasonsId = `reasons-${p.index}`;
  return (
    <div ref={ref} data-index={p.virtualIndex} role="row" className={cls} style={{ ...p.style, gridTemplateColumns: GRID_TEMPLATE }} title={lines.length > 0 ? lines.join("\n") : undefined}>
      {COLUMNS.map((c) => {
        if (c.id === "part") {
          return (
            <span key={c.id} role="cell" className="cell-part">
              <button type="button" onClick={() => openPart(part.partNumber)} title={`Open ${part.partNumber} in Part detail`}>
                {part.partNumber}
              </button>
            </span>
          );
        }
        if (c.id === "actions") {
          return (
            <span key={c.id} role="cell" className="cell-actions">
              <button type="button" aria-expanded={p.expanded} aria-controls={p.expanded ? reasonsId : undefined} onClick={() => toggleExpanded(part.partNumber)} aria-label={`Reasons for ${part.partNumber}`}>
                {p.expanded ? "▾ Why" : "▸ Why"}
              </button>
              <button type="button" aria-pressed={p.shortlisted} onClick={() => toggleShortlist(part.partNumber, p.shortlisted)} aria-label={`${p.shortlisted ? "Remove from" : "Add to"} shortlist: ${part.partNumber}`}>
                {p.shortlisted ? "✓ Shortlisted" : "+ Shortlist"}
              </button>
            </span>
          );
        }
        return (
          <span key={c.id} role="cell" className={c.num === true ? "num" : undefined}>
            {c.cell(p.index, ctx)}
          </span>
        );
      })}
      {p.expanded && (
        <div id={reasonsId} className="rreasons" role="cell">
          <ul>
            {(e?.checks ?? []).map((c) => (
              <li key={c.name}>
                <CheckMark status={c.status} /> <strong>{CHECK_LABEL[c.name]}</strong>: {c.reason}
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}

/** Rows are memoised: while scrolling, rows that stay in view are not rendered again. */
export const RankingRow = memo(RankingRowView, (a, b) => a.index === b.index && a.virtualIndex === b.virtualIndex && a.serial === b.serial && a.parts === b.parts && a.ranking === b.ranking && a.spec === b.spec && a.expanded === b.expanded && a.shortlisted === b.shortlisted && a.selected === b.selected && a.style.transform === b.style.transform && a.ref === b.ref);
