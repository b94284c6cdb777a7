import type { Spec } from "../engine/types.ts";
import { effectiveTolerance } from "../engine/cornerPoints.ts";
import { html, type SafeHtml } from "./html.ts";
import { fmt } from "./fmt.ts";
import { statusBadge } from "./statusBadge.ts";
import { waveformChart } from "./waveformChart.ts";
import { renderCornerTable } from "./renderCornerTable.ts";
import { CHECK_LABEL } from "../engine/checkLabels.ts";
import { modeLabel } from "./modeLabel.ts";
import type { ShortlistEntry } from "./types.ts";

function cornerName(entry: ShortlistEntry, index: number | undefined): string {
  return index === undefined || index < 0 ? "" : (entry.cornerLabels[index] ?? "");
}

function lossesTable(spec: Spec, entry: ShortlistEntry): SafeHtml {
  const { worst, corners } = entry.result;
  // With Fr = 1 every corner's AC excess is zero: there is no deciding corner to name.
  let acWorst = -1;
  corners.forEach((c, i) => {
    if (!c.unreachable && c.acLoss > 0 && (acWorst < 0 || c.acLoss > (corners[acWorst]?.acLoss ?? 0))) acWorst = i;
  });
  const hottest = worst.tempRise === null ? null : corners[worst.tempRise.cornerIndex];
  return html`<table class="keep losses">
<thead><tr><th>Loss and temperature (worst case)</th><th class="num">Value</th><th>Corner</th></tr></thead>
<tbody>
<tr><td>Winding loss at DC resistance (hot)</td><td class="num">${fmt.q(worst.dcrLoss.value, "W")}</td><td>${cornerName(entry, worst.dcrLoss.cornerIndex)}</td></tr>
<tr><td>AC winding loss on the ripple (Fr ${fmt.n(entry.part.acFactor)})</td><td class="num">${acWorst < 0 ? "0 W" : fmt.q(corners[acWorst]?.acLoss ?? null, "W")}</td><td>${cornerName(entry, acWorst)}</td></tr>
<tr><td>Core loss</td><td class="num">${worst.coreLoss === null ? "not modelled (no data)" : fmt.q(worst.coreLoss.value, "W")}</td><td>${cornerName(entry, worst.coreLoss?.cornerIndex)}</td></tr>
<tr><td>Total loss</td><td class="num">${fmt.q(worst.totalLoss.value, "W")}</td><td>${cornerName(entry, worst.totalLoss.cornerIndex)}</td></tr>
<tr><td>Temperature rise</td><td class="num">${worst.tempRise === null ? "not modelled (no rated current or DCR)" : fmt.kelvin(worst.tempRise.value)}</td><td>${cornerName(entry, worst.tempRise?.cornerIndex)}</td></tr>
<tr><td>Winding temperature there (ambient ${fmt.n(spec.ambient)} °C)</td><td class="num">${hottest === undefined || hottest === null ? "—" : fmt.celsius(hottest.temperature)}</td><td>${hottest === undefined || hottest === null || hottest.dcrHot === null ? "" : `DCR hot ${fmt.q(hottest.dcrHot, "Ω")}`}</td></tr>
</tbody>
</table>`;
}

/** One shortlisted part in full: data basis, waveform at the worst corner, checks, losses and every corner. */
export function renderPartSection(spec: Spec, entry: ShortlistEntry, figure: number): SafeHtml {
  const { part, result } = entry;
  const facts = [part.maker, part.series, part.material].filter((x): x is string => x !== null);
  const wave = entry.waveform;
  return html`<section class="part" id="part-${figure}">
<div class="part-head"><h2>Part ${figure}: <span class="pn">${part.partNumber}</span></h2>${statusBadge(result.status)}</div>
<p>${facts.length === 0 ? "No maker, series or material given" : facts.join(" · ")}${entry.list === null ? "" : ` · from ${entry.list}`} · rank ${result.rank} · score ${fmt.fixed(result.score, 1)}${result.pareto ? " · on the loss–volume trade-off front" : ""}</p>
<table class="keep basis">
<thead><tr><th>Data used</th><th class="num">Value</th><th>Where it came from</th></tr></thead>
<tbody>
${entry.basis.map((b) => html`<tr><td>${b.label}</td><td class="num">${b.value}</td><td>${b.basis}</td></tr>`)}
</tbody>
</table>
<table class="keep checks">
<thead><tr><th>Check</th><th>Verdict</th><th class="num">Margin</th><th>Reason</th></tr></thead>
<tbody>
${result.checks.map(
  (c) => html`<tr><td>${CHECK_LABEL[c.name]}</td><td>${statusBadge(c.status)}</td><td class="num">${c.status === "unchecked" ? "—" : fmt.pct(c.margin)}</td><td>${c.reason}</td></tr>`,
)}
</tbody>
</table>
${lossesTable(spec, entry)}
${
  wave === null
    ? html`<p class="keep"><strong>No waveform:</strong> the output cannot be reached at any corner of this part.</p>`
    : waveformChart({
        figure,
        samples: wave.samples,
        isat: wave.isat,
        caption: `${part.partNumber}: inductor current over two switching periods at ${wave.cornerLabel} (${modeLabel(wave.corner.mode)}, D ${fmt.fixed(wave.corner.duty, 3)}, peak ${fmt.q(wave.corner.ipk, "A")}, valley ${fmt.q(wave.corner.ivalley, "A")}, ${fmt.celsius(wave.corner.temperature)}), ${wave.why}.`,
      })
}
${renderCornerTable(entry, effectiveTolerance(spec, part))}
</section>`;
}
