import { CartesianGrid, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { CornerResult, Part } from "../../engine/types.ts";
import { partCurve } from "../../engine/evaluateCorner.ts";
import { AXIS, GRID, REF } from "../common/chartStyle.ts";
import { amps, henries } from "../common/format.ts";
import { niceTicks, tickText } from "../common/niceTicks.ts";

const POINTS = 160;

/** The modelled L(i) at the corner's temperature, with the current range the corner sweeps shaded. */
export function InductanceChart({ part, corner }: { part: Part; corner: CornerResult }) {
  const curve = partCurve(part, corner.inductance, corner.temperature);
  const isat = corner.isatAtTemp ?? part.isat;
  const low = Math.min(0, corner.ivalley * 1.1);
  const lTicks = niceTicks(0, corner.inductance * 1e6 * 1.05, 5);
  const xTicks = niceTicks(low, Math.max(corner.ipk, isat ?? 0) * 1.3 || 1);
  const high = xTicks.at(-1)!;
  const data = Array.from({ length: POINTS + 1 }, (_, k) => {
    const i = xTicks[0]! + ((high - xTicks[0]!) * k) / POINTS;
    return { i, l: curve.inductanceAt(Math.abs(i)) * 1e6 };
  });
  return (
    <figure className="chart-figure">
      <div className="chart" role="img" aria-label={`Inductance against current: ${henries(corner.inductance)} at zero bias, ${henries(corner.inductanceAtPeak)} at the peak`}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 10, right: 24, bottom: 18, left: 8 }}>
            <CartesianGrid stroke={GRID} />
            <XAxis dataKey="i" type="number" domain={[xTicks[0]!, high]} ticks={xTicks} tick={AXIS} tickFormatter={tickText} label={{ value: "current (A)", position: "insideBottom", offset: -10, fontSize: 12 }} />
            <YAxis type="number" domain={[0, lTicks.at(-1)!]} ticks={lTicks} tick={AXIS} tickFormatter={tickText} label={{ value: "L (µH)", angle: -90, position: "insideLeft", fontSize: 12 }} />
            <ReferenceArea x1={Math.min(corner.ivalley, corner.ipk)} x2={Math.max(corner.ivalley, corner.ipk)} fill={REF.shade} fillOpacity={0.6} stroke="#7fa3bd" strokeDasharray="3 3" label={{ value: "operating range", position: "insideBottom", fontSize: 11 }} />
            {isat !== null && <ReferenceLine x={isat} stroke={REF.isat} strokeDasharray="6 3" strokeWidth={2} label={{ value: `Isat ${amps(isat)}`, position: "insideTopRight", fontSize: 11, fill: REF.isat }} />}
            <Line type="monotone" dataKey="l" stroke="#1f5f8b" strokeWidth={2.2} dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="chart-caption">
        {curve.constant
          ? "Constant inductance: the list gives no saturation current, so no roll-off is modelled."
          : `L0/(1 + (|i|/Ik)^${part.rollOffExponent}) (${part.saturation} saturation), ${Math.round(part.isatDrop * 100)} % down at Isat; ${henries(corner.inductanceAtPeak)} at the peak of this corner.`}
      </figcaption>
    </figure>
  );
}
