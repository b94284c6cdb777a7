import type { CornerResult } from "../engine/types.ts";
import { modeLabel } from "./modeLabel.ts";
import { html, type SafeHtml } from "./html.ts";
import { fmt } from "./fmt.ts";
import type { ShortlistEntry } from "./types.ts";

function inductanceLabel(c: CornerResult, tolerance: number): string {
  if (c.inductanceCorner === "nom") return "nom";
  return `${c.inductanceCorner === "min" ? "−" : "+"}${fmt.n(tolerance * 100)} %`;
}

const mw = (w: number | null) => (w === null ? "n/m" : fmt.fixed(w * 1e3, 1));

/**
 * Every corner of one part, one row each, in the order the engine evaluated them. Rows that
 * decided a worst case are marked; "n/m" is a loss the model has no data for.
 */
export function renderCornerTable(entry: ShortlistEntry, tolerance: number): SafeHtml {
  const w = entry.result.worst;
  const marks = new Map<number, string[]>();
  const mark = (index: number | undefined, tag: string) => {
    if (index === undefined || index < 0) return;
    marks.set(index, [...(marks.get(index) ?? []), tag]);
  };
  mark(w.peakMagnitude.cornerIndex, "P");
  mark(w.irms.cornerIndex, "R");
  mark(w.totalLoss.cornerIndex, "L");
  mark(w.tempRise?.cornerIndex, "T");
  return html`<table class="corners keep">
<caption class="muted">Corners of <span class="pn">${entry.part.partNumber}</span>. Marks: P largest |i|, R largest RMS, L largest loss, T largest rise. Currents in A, losses in mW (n/m: not modelled, no data).</caption>
<thead><tr><th class="num">#</th><th class="num">Vin (V)</th><th class="num">Iout (A)</th><th class="num">L</th><th class="num">L0 (µH)</th><th>Mode</th><th class="num">D</th><th class="num">D2</th><th class="num">Ipk</th><th class="num">Ivalley</th><th class="num">Iavg</th><th class="num">Irms</th><th class="num">ΔI p-p</th><th class="num">r</th><th class="num">P DCR</th><th class="num">P AC</th><th class="num">P core</th><th class="num">P total</th><th class="num">ΔT (K)</th><th class="num">T (°C)</th><th>Mark</th></tr></thead>
<tbody>
${entry.result.corners.map((c, i) => {
  const tags = marks.get(i) ?? [];
  const head = html`<td class="num">${i + 1}</td><td class="num">${fmt.n(c.vin, 4)}</td><td class="num">${fmt.n(c.iout, 4)}</td><td class="num">${inductanceLabel(c, tolerance)}</td><td class="num">${fmt.n(c.inductance * 1e6, 4)}</td>`;
  if (c.unreachable) return html`<tr class="unreachable">${head}<td colspan="15">output cannot be reached at this corner</td><td class="mark">${tags.join(" ")}</td></tr>`;
  return html`<tr class="${tags.length > 0 ? "marked" : ""}">${head}<td>${modeLabel(c.mode)}${c.beyondCurve ? " (past saturation)" : ""}</td><td class="num">${fmt.fixed(c.duty, 3)}</td><td class="num">${fmt.fixed(c.d2, 3)}</td><td class="num">${fmt.fixed(c.ipk, 3)}</td><td class="num">${fmt.fixed(c.ivalley, 3)}</td><td class="num">${fmt.fixed(c.iavg, 3)}</td><td class="num">${fmt.fixed(c.irms, 3)}</td><td class="num">${fmt.fixed(c.ripple, 3)}</td><td class="num">${fmt.fixed(c.rippleRatio, 2)}</td><td class="num">${mw(c.dcrLoss)}</td><td class="num">${mw(c.acLoss)}</td><td class="num">${mw(c.coreLoss)}</td><td class="num">${mw(c.totalLoss)}</td><td class="num">${c.tempRise === null ? "—" : fmt.fixed(c.tempRise, 1)}</td><td class="num">${fmt.fixed(c.temperature, 1)}</td><td class="mark">${tags.join(" ")}</td></tr>`;
})}
</tbody>
</table>`;
}
