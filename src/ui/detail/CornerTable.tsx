import type { CornerResult, Part } from "../../engine/types.ts";
import { describeCorner } from "../../engine/cornerPoints.ts";
import { amps, kelvin, MODE_SHORT, percent, watts } from "../common/format.ts";

/** Every corner with its currents, losses and margins; one row is the corner on the charts. */
export function CornerTable({ part, corners, tolerance, shown, onShow }: { part: Part; corners: readonly CornerResult[]; tolerance: number; shown: number; onShow: (index: number) => void }) {
  return (
    <div className="table-scroll limited">
      <table className="grid-table">
        <caption className="visually-hidden">Every operating corner of {part.partNumber}</caption>
        <thead>
          <tr>
            <th scope="col">Corner</th>
            <th scope="col">Mode</th>
            <th scope="col" className="num">Duty</th>
            <th scope="col" className="num">Peak</th>
            <th scope="col" className="num">Valley</th>
            <th scope="col" className="num">Average</th>
            <th scope="col" className="num">RMS</th>
            <th scope="col" className="num">Ripple</th>
            <th scope="col" className="num">DCR loss</th>
            <th scope="col" className="num">Core loss</th>
            <th scope="col" className="num">Total</th>
            <th scope="col" className="num">Rise</th>
            <th scope="col" className="num">Isat margin</th>
            <th scope="col" className="num">Heat margin</th>
            <th scope="col">Chart</th>
          </tr>
        </thead>
        <tbody>
          {corners.map((c, k) => {
            const peak = Math.max(c.ipk, -c.ivalley);
            const isat = c.isatAtTemp ?? part.isat;
            const name = describeCorner(c, tolerance);
            return (
              <tr key={k} className={k === shown ? "is-shown" : undefined}>
                <th scope="row">
                  {k === shown && <span aria-hidden="true">▶ </span>}
                  {name}
                </th>
                {c.unreachable ? (
                  <td colSpan={13} className="field-error">
                    ✗ cannot reach the output
                  </td>
                ) : (
                  <>
                    <td>{MODE_SHORT[c.mode]}</td>
                    <td className="num">{c.duty.toFixed(3)}</td>
                    <td className="num">{amps(c.ipk)}</td>
                    <td className="num">{amps(c.ivalley)}</td>
                    <td className="num">{amps(c.iavg)}</td>
                    <td className="num">{amps(c.irms)}</td>
                    <td className="num">{amps(c.ripple)}</td>
                    <td className="num">{watts(c.dcrLoss)}</td>
                    <td className="num">{c.coreLoss === null ? "not modelled" : watts(c.coreLoss)}</td>
                    <td className="num">{watts(c.totalLoss)}</td>
                    <td className="num">{kelvin(c.tempRise)}</td>
                    <td className="num">{isat === null ? "—" : percent(c.beyondCurve ? -1 : isat / peak - 1)}</td>
                    <td className="num">{part.irms === null ? "—" : percent(part.irms / c.irms - 1)}</td>
                  </>
                )}
                <td>
                  {k === shown ? (
                    <span className="muted">shown</span>
                  ) : (
                    <button type="button" onClick={() => onShow(k)} aria-label={`Show ${name} on the charts`}>
                      Show
                    </button>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
