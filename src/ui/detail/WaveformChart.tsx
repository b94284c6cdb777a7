import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { CornerResult, Part, Spec } from "../../engine/types.ts";
import { waveformSamples } from "../../engine/waveformSamples.ts";
import { AXIS, GRID, REF } from "../common/chartStyle.ts";
import { amps, MODE_LONG } from "../common/format.ts";
import { niceTicks, tickText } from "../common/niceTicks.ts";
import { SideLabel } from "../common/SideLabel.tsx";

const PERIODS = 3;
/** Isat further above the peak than this is named in the caption instead of squashing the waveform. */
const ISAT_IN_VIEW = 2.5;

/** Inductor current over three periods at one corner, with zero, Isat, peak, valley and average marked. */
export function WaveformChart({ spec, part, corner }: { spec: Spec; part: Part; corner: CornerResult }) {
  if (corner.unreachable) return <p className="field-error">This corner cannot reach the output (drops too large or duty at its limit): no waveform.</p>;
  const data = waveformSamples(spec, part, corner, PERIODS).map((s) => ({ t: s.t * 1e6, i: s.i }));
  const isat = corner.isatAtTemp ?? part.isat;
  // In DCM the valley sits on the zero line: one label for both keeps them legible.
  const valleyAtZero = Math.abs(corner.ivalley) <= 0.01 * corner.ripple;
  const peak = Math.max(corner.ipk, -corner.ivalley);
  const isatShown = isat !== null && isat <= ISAT_IN_VIEW * peak;
  const top = Math.max(corner.ipk, isatShown ? isat : -Infinity, 0);
  const bottom = Math.min(corner.ivalley, 0);
  const pad = 0.06 * (top - bottom || 1);
  const yTicks = niceTicks(bottom - pad, top + pad);
  // Lines closer than a label's height on the plot (≈ 230 px tall) get their labels pushed apart.
  const px = (a: number, b: number) => (Math.abs(a - b) / (yTicks.at(-1)! - yTicks[0]!)) * 230;
  const crowdedTop = px(corner.ipk, corner.iavg) < 13;
  const crowdedBottom = px(corner.iavg, corner.ivalley) < 13;
  const tEnd = data.at(-1)?.t ?? 1;
  const xTicks = niceTicks(0, tEnd, 7).filter((t) => t <= tEnd * 1.0001);
  return (
    <figure className="chart-figure">
      <div className="chart" role="img" aria-label={`Inductor current over ${PERIODS} periods: peak ${amps(corner.ipk)}, valley ${amps(corner.ivalley)}, average ${amps(corner.iavg)}`}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 10, right: 96, bottom: 18, left: 8 }}>
            <CartesianGrid stroke={GRID} />
            <XAxis dataKey="t" type="number" domain={[0, tEnd]} ticks={xTicks} tick={AXIS} tickFormatter={tickText} label={{ value: "time (µs)", position: "insideBottom", offset: -10, fontSize: 12 }} />
            <YAxis type="number" domain={[yTicks[0]!, yTicks.at(-1)!]} ticks={yTicks} tick={AXIS} tickFormatter={tickText} label={{ value: "current (A)", angle: -90, position: "insideLeft", fontSize: 12 }} />
            <ReferenceLine y={0} stroke={REF.zero} strokeWidth={1.5} label={<SideLabel text={valleyAtZero ? "0 A = valley" : "0 A"} dy={valleyAtZero && crowdedBottom ? 7 : 0} />} />
            {isatShown && <ReferenceLine y={isat} stroke={REF.isat} strokeDasharray="6 3" strokeWidth={2} label={<SideLabel text={`Isat ${amps(isat)}`} fill={REF.isat} dy={px(isat, corner.ipk) < 13 ? -7 : 0} />} />}
            <ReferenceLine y={corner.ipk} stroke={REF.peak} strokeDasharray="2 2" label={<SideLabel text={`peak ${amps(corner.ipk)}`} dy={crowdedTop ? -7 : 0} />} />
            {!valleyAtZero && <ReferenceLine y={corner.ivalley} stroke={REF.valley} strokeDasharray="2 2" label={<SideLabel text={`valley ${amps(corner.ivalley)}`} dy={crowdedBottom ? 7 : 0} />} />}
            <ReferenceLine y={corner.iavg} stroke={REF.average} strokeDasharray="10 4" label={<SideLabel text={`average ${amps(corner.iavg)}`} />} />
            <Line type="linear" dataKey="i" stroke="#1f5f8b" strokeWidth={2.2} dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="chart-caption">
        <strong>Mode: {MODE_LONG[corner.mode]}.</strong> Duty {corner.duty.toFixed(3)}, rectifier {corner.d2.toFixed(3)}
        {corner.idle > 0 ? `, idle ${corner.idle.toFixed(3)}` : ""}; ripple {amps(corner.ripple)} peak to peak (ratio {corner.rippleRatio.toFixed(2)}).
        {isat !== null && !isatShown && ` Isat at ${Math.round(corner.temperature)} °C is ${amps(isat)}, above the chart.`}
        {isat === null && " The list gives no saturation current: the inductance is taken as constant."}
        {corner.beyondCurve && " ✗ The current leaves the modelled curve: the core is driven past saturation."}
      </figcaption>
    </figure>
  );
}
