import type { Part, Result } from "../../engine/types.ts";
import { formatQuantity, formatPercent } from "../../engine/formatQuantity.ts";

const STATUS_LABEL: Record<Result["status"], string> = { pass: "✓ pass", incomplete: "? incomplete", fail: "✗ fail" };

/** Ranked parts, one row each; the reasons of a failure show on hover and in the last column. */
export function RankingTable({ results, parts, limit = 200 }: { results: Result[]; parts: Part[]; limit?: number }) {
  const byNumber = new Map(parts.map((p) => [p.partNumber, p]));
  const shown = results.slice(0, limit);
  return (
    <div className="table-wrap">
      <table className="ranking">
        <thead>
          <tr>
            <th scope="col">#</th>
            <th scope="col">Part</th>
            <th scope="col">Maker</th>
            <th scope="col">L</th>
            <th scope="col">DCR max</th>
            <th scope="col">Isat</th>
            <th scope="col">Rated</th>
            <th scope="col">Peak</th>
            <th scope="col">RMS</th>
            <th scope="col">Loss</th>
            <th scope="col">Rise</th>
            <th scope="col">Margin</th>
            <th scope="col">Score</th>
            <th scope="col">Result</th>
          </tr>
        </thead>
        <tbody>
          {shown.map((r) => {
            const p = byNumber.get(r.partNumber);
            const problems = [...r.failures, ...r.unchecked];
            return (
              <tr key={r.partNumber} className={`status-${r.status}`} title={problems.join("\n")}>
                <td className="num">{r.rank}</td>
                <td>{r.partNumber}</td>
                <td>{p?.maker ?? "—"}</td>
                <td className="num">{formatQuantity(p?.inductance ?? null, "H")}</td>
                <td className="num">{formatQuantity(p?.dcrMax ?? p?.dcrTyp ?? null, "Ω")}</td>
                <td className="num">{formatQuantity(p?.isat ?? null, "A")}</td>
                <td className="num">{formatQuantity(p?.irms ?? null, "A")}</td>
                <td className="num">{formatQuantity(r.worst.peakMagnitude.value, "A")}</td>
                <td className="num">{formatQuantity(r.worst.irms.value, "A")}</td>
                <td className="num">{formatQuantity(r.worst.totalLoss.value, "W")}</td>
                <td className="num">{r.worst.tempRise === null ? "—" : `${r.worst.tempRise.value.toFixed(1)} K`}</td>
                <td className="num">{formatPercent(r.minMargin)}</td>
                <td className="num">{r.score.toFixed(1)}</td>
                <td className="result">
                  <span className="badge">{STATUS_LABEL[r.status]}</span>
                  {problems.length > 0 && <span className="reason">{problems[0]}</span>}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {results.length > limit && <p className="more">Showing the first {limit} of {results.length} parts.</p>}
    </div>
  );
}
