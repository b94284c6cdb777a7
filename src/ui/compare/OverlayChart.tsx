import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { Spec } from "../../engine/types.ts";
import { waveformSamples } from "../../engine/waveformSamples.ts";
import type { CornerKey } from "../../state/extrasStore.ts";
import { AXIS, GRID, REF, seriesStyle } from "../common/chartStyle.ts";
import { niceTicks, tickText } from "../common/niceTicks.ts";
import { SeriesLegend } from "../common/SeriesLegend.tsx";
import { findCorner } from "../detail/cornerChoice.ts";
import type { CompareItem } from "./compareRows.ts";

/** The shortlisted parts' currents at the same corner, one line style each. */
export function OverlayChart({ spec, items, corner }: { spec: Spec; items: CompareItem[]; corner: CornerKey }) {
  const series = items.map((it) => {
    const index = findCorner(it.e.corners, corner);
    const c = index >= 0 ? it.e.corners[index] : undefined;
    return { name: it.part.partNumber, data: c === undefined || c.unreachable ? [] : waveformSamples(spec, it.part, c, 2).map((s) => ({ t: s.t * 1e6, i: s.i })) };
  });
  const values = series.flatMap((s) => s.data.map((d) => d.i));
  const yTicks = niceTicks(Math.min(0, ...values), Math.max(0, ...values));
  const tEnd = Math.max(1e-9, ...series.flatMap((s) => s.data.map((d) => d.t)));
  const xTicks = niceTicks(0, tEnd, 7).filter((t) => t <= tEnd * 1.0001);
  return (
    <figure className="chart-figure">
      <div className="chart" role="img" aria-label={`Inductor currents of ${items.length} parts at the same corner`}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 10, right: 24, bottom: 18, left: 8 }}>
            <CartesianGrid stroke={GRID} />
            <XAxis dataKey="t" type="number" domain={[0, tEnd]} ticks={xTicks} tick={AXIS} tickFormatter={tickText} allowDuplicatedCategory={false} label={{ value: "time (µs)", position: "insideBottom", offset: -10, fontSize: 12 }} />
            <YAxis type="number" domain={[yTicks[0]!, yTicks.at(-1)!]} ticks={yTicks} tick={AXIS} tickFormatter={tickText} label={{ value: "current (A)", angle: -90, position: "insideLeft", fontSize: 12 }} />
            <ReferenceLine y={0} stroke={REF.zero} strokeWidth={1.5} label={{ value: "0 A", position: "insideBottomRight", fontSize: 11 }} />
            {series.map((s, k) => {
              const look = seriesStyle(k);
              return <Line key={s.name} data={s.data} type="linear" dataKey="i" name={s.name} stroke={look.color} strokeDasharray={look.dash} strokeWidth={2.2} dot={false} isAnimationActive={false} />;
            })}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <SeriesLegend names={series.map((s) => s.name)} />
    </figure>
  );
}
