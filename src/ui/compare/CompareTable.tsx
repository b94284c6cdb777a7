import { openPart, removeFromShortlist } from "../../state/workspaceActions.ts";
import { compareRows, type CompareItem } from "./compareRows.ts";
import { seriesStyle } from "../common/chartStyle.ts";

/** Shortlisted parts side by side; the best value of each row is marked with ★ and the word "best". */
export function CompareTable({ items, missing }: { items: CompareItem[]; missing: string[] }) {
  const rows = compareRows(items);
  return (
    <div className="table-scroll">
      <table className="grid-table compare-table">
        <caption className="visually-hidden">Shortlisted parts compared; ★ best marks the best value of each row</caption>
        <thead>
          <tr>
            <th scope="col">Figure</th>
            {items.map((it, k) => (
              <th scope="col" key={it.part.partNumber}>
                <span aria-hidden="true" style={{ color: seriesStyle(k).color }}>
                  {seriesStyle(k).marker}{" "}
                </span>
                <button type="button" className="link-button" onClick={() => openPart(it.part.partNumber)} title="Open in Part detail">
                  {it.part.partNumber}
                </button>
                <div>
                  <button type="button" onClick={() => removeFromShortlist(it.part.partNumber)} aria-label={`Remove ${it.part.partNumber} from the shortlist`}>
                    Remove
                  </button>
                </div>
              </th>
            ))}
            {missing.map((pn) => (
              <th scope="col" key={pn}>
                {pn}
                <div className="muted">not in the loaded lists</div>
                <button type="button" onClick={() => removeFromShortlist(pn)} aria-label={`Remove ${pn} from the shortlist`}>
                  Remove
                </button>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.label}>
              <th scope="row">{row.label}</th>
              {row.cells.map((cell, k) => {
                const best = row.best.includes(k);
                return (
                  <td key={k} className={best ? "best" : undefined}>
                    {cell}
                    {best && <span className="best-mark"> ★ best</span>}
                  </td>
                );
              })}
              {missing.map((pn) => (
                <td key={pn} className="muted">
                  —
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
