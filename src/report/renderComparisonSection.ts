import type { CheckName, Result } from "../engine/types.ts";
import { lossDcr } from "../engine/evaluateCorner.ts";
import { html, type HtmlValue, type SafeHtml } from "./html.ts";
import { fmt } from "./fmt.ts";
import { statusBadge } from "./statusBadge.ts";
import type { ReportModel, ShortlistEntry } from "./types.ts";

function margin(result: Result, name: CheckName): string {
  const check = result.checks.find((c) => c.name === name);
  if (check === undefined) return "—";
  if (check.status === "unchecked") return "not checked";
  return fmt.pct(check.margin);
}

function verdict(result: Result, name: CheckName): HtmlValue {
  const check = result.checks.find((c) => c.name === name);
  return check === undefined ? "—" : statusBadge(check.status);
}

function hottest(e: ShortlistEntry): string {
  const at = e.result.worst.tempRise?.cornerIndex;
  const corner = at === undefined ? undefined : e.result.corners[at];
  return corner === undefined ? "—" : fmt.celsius(corner.temperature);
}

function size(e: ShortlistEntry): string {
  const p = e.part;
  if (p.length === null || p.width === null) return "—";
  const mm = (x: number | null) => (x === null ? "?" : fmt.n(x * 1e3, 4));
  return `${mm(p.length)} × ${mm(p.width)} × ${mm(p.height)} mm`;
}

const ROWS: [string, (e: ShortlistEntry, model: ReportModel) => HtmlValue][] = [
  ["Verdict", (e) => statusBadge(e.result.status)],
  ["Rank", (e, m) => `${e.result.rank} of ${m.partsConsidered}`],
  ["Score (0–100)", (e) => fmt.fixed(e.result.score, 1)],
  ["Maker", (e) => e.part.maker ?? "—"],
  ["Series", (e) => e.part.series ?? "—"],
  ["Saturation character", (e) => e.part.saturation],
  ["Inductance L0", (e) => fmt.q(e.part.inductance, "H")],
  ["Tolerance", (e, m) => (e.part.tolerance === null ? `±${fmt.pct(m.spec.assumedTolerance)} (assumed)` : `±${fmt.pct(e.part.tolerance)}`)],
  ["DCR used for losses", (e) => fmt.q(lossDcr(e.part), "Ω")],
  ["Isat", (e) => fmt.q(e.part.isat, "A")],
  ["Rated heating current", (e) => fmt.q(e.part.irms, "A")],
  ["SRF", (e) => fmt.q(e.part.srf, "Hz")],
  ["Size L × W × H", size],
  ["Price", (e) => fmt.n(e.part.price, 4)],
  ["Worst |i| (peak)", (e) => fmt.q(e.result.worst.peakMagnitude.value, "A")],
  ["Saturation margin", (e) => margin(e.result, "saturation")],
  ["Worst RMS current", (e) => fmt.q(e.result.worst.irms.value, "A")],
  ["Heating margin", (e) => margin(e.result, "heating")],
  ["Worst ripple p-p", (e) => fmt.q(e.result.worst.ripple.value, "A")],
  ["Ripple-ratio window", (e) => verdict(e.result, "rippleRatio")],
  ["Worst total loss", (e) => fmt.q(e.result.worst.totalLoss.value, "W")],
  ["Worst core loss", (e) => (e.result.worst.coreLoss === null ? "not modelled (no data)" : fmt.q(e.result.worst.coreLoss.value, "W"))],
  ["Worst temperature rise", (e) => (e.result.worst.tempRise === null ? "not modelled" : fmt.kelvin(e.result.worst.tempRise.value))],
  ["Hottest winding", (e) => hottest(e)],
  ["Checks failed", (e) => String(e.result.failures.length)],
  ["Checks without data", (e) => String(e.result.unchecked.length)],
];

/** The shortlisted parts side by side, one column each. */
export function renderComparisonSection(model: ReportModel): SafeHtml {
  const entries = model.shortlist;
  const missing =
    model.missingShortlist.length === 0
      ? null
      : html`<p class="muted">Shortlisted but in none of the lists: ${model.missingShortlist.map((pn, i) => html`${i > 0 ? ", " : ""}<span class="pn">${pn}</span>`)}</p>`;
  if (entries.length === 0) {
    return html`<section id="shortlist" class="page" data-shortlist="${JSON.stringify([])}"><h2>Shortlist</h2><p>No part was shortlisted.</p>${missing}</section>`;
  }
  return html`<section id="shortlist" class="page" data-shortlist="${JSON.stringify(entries.map((e) => e.part.partNumber))}">
<h2>Shortlist compared</h2>
<table class="compare keep">
<thead><tr><th></th>${entries.map((e) => html`<th class="num pn">${e.part.partNumber}</th>`)}</tr></thead>
<tbody>
${ROWS.map(([label, cell]) => html`<tr><th scope="row">${label}</th>${entries.map((e) => html`<td>${cell(e, model)}</td>`)}</tr>`)}
</tbody>
</table>
${missing}
</section>`;
}
