import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { AXIS, GRID, REF, seriesStyle } from "../common/chartStyle.ts";
import { niceTicks, tickText } from "../common/niceTicks.ts";
import { SeriesLegend } from "../common/SeriesLegend.tsx";

export interface Series {
  name: string;
  data: { x: number; y: number | null }[];
}

export interface Marker {
  at: number;
  label: string;
  axis: "x" | "y";
}

/** One quantity of every shortlisted part against a swept variable, with its figures in a table. */
export function SweepChart({ title, xLabel, yLabel, series, markers = [], format, xFormat }: { title: string; xLabel: string; yLabel: string; series: Series[]; markers?: Marker[]; format: (y: number | null) => string; xFormat: (x: number) => string }) {
  const xs = series.flatMap((s) => s.data.map((d) => d.x));
  const ys = series.flatMap((s) => s.data.flatMap((d) => (d.y === null ? [] : [d.y])));
  const yMarkers = markers.filter((m) => m.axis === "y").map((m) => m.at);
  const xTicks = niceTicks(Math.min(...xs), Math.max(...xs));
  const yTicks = niceTicks(Math.min(0, ...ys), Math.max(...ys, ...yMarkers, 1e-12));
  const id = title.replace(/\W+/g, "-").toLowerCase();
  return (
    <section className="card" aria-labelledby={id}>
      <h2 id={id}>{title}</h2>
      <div className="chart" role="img" aria-label={`${title}: ${series.length} parts`}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 10, right: 24, bottom: 18, left: 8 }}>
            <CartesianGrid stroke={GRID} />
            <XAxis dataKey="x" type="number" domain={[xTicks[0]!, xTicks.at(-1)!]} ticks={xTicks} tick={AXIS} tickFormatter={tickText} allowDuplicatedCategory={false} label={{ value: xLabel, position: "insideBottom", offset: -10, fontSize: 12 }} />
            <YAxis type="number" domain={[yTicks[0]!, yTicks.at(-1)!]} ticks={yTicks} tick={AXIS} tickFormatter={tickText} label={{ value: yLabel, angle: -90, position: "insideLeft", fontSize: 12 }} />
            {markers.map((m) =>
              m.axis === "x" ? (
                <ReferenceLine key={m.label} x={m.at} stroke={REF.zero} strokeDasharray="4 3" label={{ value: m.label, position: "insideTopLeft", fontSize: 11 }} />
              ) : (
                <ReferenceLine key={m.label} y={m.at} stroke={REF.isat} strokeDasharray="6 3" label={{ value: m.label, position: "insideTopRight", fontSize: 11, fill: REF.isat }} />
              ),
            )}
            {series.map((s, k) => {
              const look = seriesStyle(k);
              return <Line key={s.name} data={s.data} dataKey="y" name={s.name} type="monotone" stroke={look.color} strokeDasharray={look.dash} strokeWidth={2.2} dot={false} connectNulls={false} isAnimationActive={false} />;
            })}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <SeriesLegend names={series.map((s) => s.name)} />
      <details>
        <summary>Figures</summary>
        <div className="table-scroll limited">
          <table className="grid-table">
            <thead>
              <tr>
                <th scope="col" className="num">
                  {xLabel}
                </th>
                {series.map((s) => (
                  <th key={s.name} scope="col" className="num">
                    {s.name}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {(series[0]?.data ?? []).map((d, k) => (
                <tr key={k}>
                  <th scope="row" className="num">
                    {xFormat(d.x)}
                  </th>
                  {series.map((s) => (
                    <td key={s.name} className="num">
                      {format(s.data[k]?.y ?? null)}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </section>
  );
}
