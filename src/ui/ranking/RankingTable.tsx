import { useEffect, useRef } from "react";
import { useVirtualizer } from "@tanstack/react-virtual";
import type { Part, Spec } from "../../engine/types.ts";
import type { Ranking } from "../../worker/finishRanking.ts";
import { sortBy } from "../../state/workspaceActions.ts";
import type { RankingSort } from "../../state/rankingView.ts";
import { useExtras } from "../../state/extrasStore.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { COLUMNS, GRID_TEMPLATE, TABLE_WIDTH } from "./columns.tsx";
import { RankingRow } from "./RankingRow.tsx";
import { BUSY_MARK_DELAY_MS } from "../common/busyMark.ts";
import { useDelayedFlag } from "../common/useDelayedFlag.ts";

const ROW_HEIGHT = 30;
/** A first guess for a row with its reasons open; it is measured once drawn. */
const EXPANDED_HEIGHT = 170;

function SortHeader({ id, label, title, num, sort }: { id: string; label: string; title: string; num: boolean; sort: RankingSort }) {
  const active = sort === null ? id === "rank" : sort.column === id;
  const descending = sort?.descending === true;
  const ariaSort = active ? (descending ? "descending" : "ascending") : "none";
  return (
    <span role="columnheader" aria-sort={ariaSort} className={num ? "num" : undefined}>
      <button type="button" className="sort-button" title={`${title}. Click to sort.`} onClick={() => sortBy(id)}>
        {label}
        {active && <span aria-hidden="true">{descending ? " ▼" : " ▲"}</span>}
      </button>
    </span>
  );
}

export interface RankingTableProps {
  indices: Int32Array;
  parts: readonly Part[];
  ranking: Ranking;
  spec: Spec;
  serial: number;
  stale: boolean;
}

/**
 * Every ranked part in one scrolling grid; only the rows in view (plus a margin) exist in the
 * page, so 100 000 parts scroll as smoothly as 100.
 */
export function RankingTable({ indices, parts, ranking, spec, serial, stale }: RankingTableProps) {
  // aria-busy says so at once; the table is dimmed only for a ranking that takes a while.
  const showStale = useDelayedFlag(stale, BUSY_MARK_DELAY_MS);
  const scroller = useRef<HTMLDivElement>(null);
  const sort = useWorkspace((w) => w.view.rankingSort);
  const shortlist = useWorkspace((w) => w.shortlist);
  const selected = useWorkspace((w) => w.view.selectedPart);
  const expanded = useExtras((e) => e.expanded);
  // The virtualizer hands out fresh functions each render by design; nothing here is memoised on them.
  // eslint-disable-next-line react-hooks/incompatible-library
  const virtualizer = useVirtualizer({
    count: indices.length,
    getScrollElement: () => scroller.current,
    estimateSize: (k) => (expanded.includes(parts[indices[k] ?? -1]?.partNumber ?? "") ? EXPANDED_HEIGHT : ROW_HEIGHT),
    overscan: 8,
    getItemKey: (k) => indices[k] ?? k,
  });
  // Sizes measured while a row was open would outlive its closing: start the sizes afresh.
  useEffect(() => {
    virtualizer.measure();
  }, [expanded, virtualizer]);
  return (
    <div
      ref={scroller}
      className={`rtable${showStale ? " stale" : ""}`}
      role="table"
      aria-label="Ranked parts"
      aria-rowcount={indices.length + 1}
      aria-busy={stale}
      data-serial={serial}
      data-rows={indices.length}
      tabIndex={0}
    >
      <div className="rtable-inner" style={{ width: TABLE_WIDTH }}>
        <div role="rowgroup" className="rhead">
          <div role="row" className="rrow" style={{ gridTemplateColumns: GRID_TEMPLATE }}>
            {COLUMNS.map((c) =>
              c.sortable === false ? (
                <span key={c.id} role="columnheader" className="plain-header">
                  {c.label}
                </span>
              ) : (
                <SortHeader key={c.id} id={c.id} label={c.label} title={c.title} num={c.num === true} sort={sort} />
              ),
            )}
          </div>
        </div>
        <div role="rowgroup" className="rbody" style={{ height: virtualizer.getTotalSize() }}>
          {virtualizer.getVirtualItems().map((item) => {
            const index = indices[item.index]!;
            const pn = parts[index]!.partNumber;
            return (
              <RankingRow
                key={item.key}
                index={index}
                virtualIndex={item.index}
                parts={parts}
                ranking={ranking}
                spec={spec}
                serial={serial}
                expanded={expanded.includes(pn)}
                shortlisted={shortlist.includes(pn)}
                selected={selected === pn}
                ref={expanded.includes(pn) ? virtualizer.measureElement : undefined}
                style={expanded.includes(pn) ? { transform: `translateY(${item.start}px)` } : { transform: `translateY(${item.start}px)`, height: ROW_HEIGHT }}
              />
            );
          })}
        </div>
      </div>
    </div>
  );
}
