import type { WaveformSample } from "../engine/waveformSamples.ts";
import { html, type SafeHtml } from "./html.ts";
import { fmt } from "./fmt.ts";

export interface WaveformChartInput {
  /** Figure number, shown in the caption and in the chart's own axis title (the print check pairs them). */
  figure: number;
  samples: readonly WaveformSample[];
  /** Saturation current at the corner's temperature, A; drawn when it lies near the trace. */
  isat: number | null;
  caption: string;
}

const WIDTH = 680;
const HEIGHT = 250;
const PAD = { left: 58, right: 18, top: 30, bottom: 42 };
/** Isat is drawn when it lies within this factor of the largest plotted current; beyond, it is named in the chart. */
const ISAT_DRAW_FACTOR = 1.6;

/** Tick step of 1, 2 or 5 × 10^k giving about `target` intervals. */
function niceStep(span: number, target: number): number {
  const raw = span / target;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const unit = raw / power;
  return (unit <= 1 ? 1 : unit <= 2 ? 2 : unit <= 5 ? 5 : 10) * power;
}

function ticks(min: number, max: number, target: number): { values: number[]; decimals: number } {
  const step = niceStep(max - min, target);
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const values: number[] = [];
  for (let v = Math.ceil(min / step - 1e-9) * step; v <= max + step * 1e-9; v += step) values.push(Math.abs(v) < step * 1e-9 ? 0 : v);
  return { values, decimals };
}

const px = (x: number) => x.toFixed(2);

/**
 * Inductor current over two switching periods as an inline SVG figure: no script, no external
 * resource, fixed number formats, so the same samples give the same bytes everywhere.
 */
export function waveformChart(input: WaveformChartInput): SafeHtml {
  const { samples } = input;
  const tMax = samples.reduce((m, s) => Math.max(m, s.t), 0) * 1e6;
  let lo = 0;
  let hi = 0;
  for (const s of samples) {
    lo = Math.min(lo, s.i);
    hi = Math.max(hi, s.i);
  }
  const drawIsat = input.isat !== null && input.isat > 0 && input.isat <= Math.max(hi, 1e-12) * ISAT_DRAW_FACTOR;
  if (drawIsat) hi = Math.max(hi, input.isat as number);
  const span = hi - lo > 0 ? hi - lo : 1;
  lo -= span * 0.04;
  hi += span * 0.08;
  const x0 = PAD.left;
  const x1 = WIDTH - PAD.right;
  const y0 = HEIGHT - PAD.bottom;
  const y1 = PAD.top;
  const sx = (tUs: number) => x0 + ((x1 - x0) * tUs) / (tMax > 0 ? tMax : 1);
  const sy = (i: number) => y0 - ((y0 - y1) * (i - lo)) / (hi - lo);
  const xt = ticks(0, tMax > 0 ? tMax : 1, 8);
  const yt = ticks(lo, hi, 5);
  const points = samples.map((s) => `${px(sx(s.t * 1e6))},${px(sy(s.i))}`).join(" ");
  const isatNote =
    input.isat === null ? "Isat not rated" : drawIsat ? null : `Isat at this temperature ${fmt.q(input.isat, "A")}, above the plotted range`;
  return html`<figure class="chart">
<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${WIDTH} ${HEIGHT}" width="${WIDTH}" height="${HEIGHT}" role="img" aria-label="${input.caption}">
<rect x="${x0}" y="${y1}" width="${px(x1 - x0)}" height="${px(y0 - y1)}" class="plot"/>
${xt.values.map((v) => html`<line x1="${px(sx(v))}" y1="${y1}" x2="${px(sx(v))}" y2="${y0}" class="grid"/><text x="${px(sx(v))}" y="${y0 + 15}" class="tick" text-anchor="middle">${v.toFixed(xt.decimals)}</text>`)}
${yt.values.map((v) => html`<line x1="${x0}" y1="${px(sy(v))}" x2="${x1}" y2="${px(sy(v))}" class="grid"/><text x="${x0 - 6}" y="${px(sy(v) + 3.5)}" class="tick" text-anchor="end">${v.toFixed(yt.decimals)}</text>`)}
${lo < 0 && hi > 0 ? html`<line x1="${x0}" y1="${px(sy(0))}" x2="${x1}" y2="${px(sy(0))}" class="zero"/>` : null}
${drawIsat ? html`<line x1="${x0}" y1="${px(sy(input.isat as number))}" x2="${x1}" y2="${px(sy(input.isat as number))}" class="isat"/><text x="${x1 - 4}" y="${px(sy(input.isat as number) - 5)}" class="label isat-label" text-anchor="end">Isat at corner temperature ${fmt.q(input.isat, "A")}</text>` : null}
<polyline points="${points}" class="trace"/>
<text x="${x0}" y="${y1 - 10}" class="axis">Fig. ${input.figure}: inductor current i (A)</text>
${isatNote === null ? null : html`<text x="${x1}" y="${y1 - 10}" class="label" text-anchor="end">${isatNote}</text>`}
<text x="${px((x0 + x1) / 2)}" y="${HEIGHT - 8}" class="axis" text-anchor="middle">time t (µs)</text>
</svg>
<figcaption>Figure ${input.figure}. ${input.caption}</figcaption>
</figure>`;
}
