import type { RejectedRow, RowWarning } from "../../catalog/types.ts";
import { rejectedCsv } from "../../state/rejectedCsv.ts";
import { downloadText } from "../common/download.ts";

const SHOWN = 200;

/** Rows that did not become parts, with the reason and the raw cells; all of them as CSV. */
export function RejectedRows({ listName, rows }: { listName: string; rows: RejectedRow[] }) {
  if (rows.length === 0) return <p className="muted">Every data row became a part.</p>;
  return (
    <div>
      <div className="button-row">
        <button type="button" onClick={() => downloadText(`${listName.replace(/\.[^.]+$/, "")}-rejected-rows.csv`, rejectedCsv(rows), "text/csv")}>
          Download the {rows.length.toLocaleString("en")} rejected rows as CSV
        </button>
        {rows.length > SHOWN && <span className="muted">The first {SHOWN} are shown.</span>}
      </div>
      <div className="table-scroll limited">
        <table className="grid-table">
          <thead>
            <tr>
              <th scope="col" className="num">
                Line
              </th>
              <th scope="col">Field</th>
              <th scope="col">Column</th>
              <th scope="col">Reason</th>
              <th scope="col">Cells</th>
            </tr>
          </thead>
          <tbody>
            {rows.slice(0, SHOWN).map((r) => (
              <tr key={`${r.row}-${r.field}`}>
                <td className="num">{r.row}</td>
                <td>{r.field}</td>
                <td>{r.header ?? "—"}</td>
                <td className="wrap">{r.reason}</td>
                <td className="muted wrap">{r.cells.join(" | ")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

export function Warnings({ warnings }: { warnings: RowWarning[] }) {
  if (warnings.length === 0) return <p className="muted">No warnings.</p>;
  return (
    <ul className="warnings">
      {warnings.slice(0, SHOWN).map((w, k) => (
        <li key={k}>
          {w.row !== null && <strong>line {w.row}: </strong>}
          {w.message}
        </li>
      ))}
      {warnings.length > SHOWN && <li className="muted">… and {warnings.length - SHOWN} more.</li>}
    </ul>
  );
}
