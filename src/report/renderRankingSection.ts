import { html, type SafeHtml } from "./html.ts";
import { fmt } from "./fmt.ts";
import { statusBadge } from "./statusBadge.ts";
import type { ReportModel } from "./types.ts";

/** The top of the ranking with the counts behind it, then every rejected row with its reason. */
export function renderRankingSection(model: ReportModel): SafeHtml {
  const { counts } = model;
  return html`<section id="ranking" class="page">
<h2>Ranking</h2>
<p>${model.partsConsidered} parts considered: ${counts.pass} pass every check, ${counts.incomplete} incomplete (nothing failed, some checks without data), ${counts.fail} fail. ${model.rejectedTotal} ${model.rejectedTotal === 1 ? "row was" : "rows were"} rejected while reading the lists and took no part. The top ${model.ranking.length} are shown; ◆ marks a shortlisted part.</p>
<table class="long ranking">
<thead><tr><th class="num">Rank</th><th>Part</th><th>Verdict</th><th class="num">Score</th><th class="num">L0</th><th class="num">Isat</th><th class="num">Irated</th><th class="num">Worst |i|</th><th class="num">Worst RMS</th><th class="num">Worst loss</th><th class="num">Worst ΔT</th><th>First problem</th></tr></thead>
<tbody>
${model.ranking.map(
  (r) =>
    html`<tr class="${r.shortlisted ? "marked" : ""}"><td class="num">${r.shortlisted ? "◆ " : ""}${r.rank}</td><td class="pn">${r.partNumber}</td><td>${statusBadge(r.status)}</td><td class="num">${fmt.fixed(r.score, 1)}</td><td class="num">${fmt.q(r.inductance, "H")}</td><td class="num">${fmt.q(r.isat, "A")}</td><td class="num">${fmt.q(r.irated, "A")}</td><td class="num">${fmt.q(r.peak, "A")}</td><td class="num">${fmt.q(r.irms, "A")}</td><td class="num">${fmt.q(r.totalLoss, "W")}</td><td class="num">${fmt.kelvin(r.tempRise)}</td><td>${r.firstProblem}</td></tr>`,
)}
</tbody>
</table>
<h3>Rejected rows</h3>
${
  model.rejectedTotal === 0
    ? html`<p>No rows were rejected.</p>`
    : html`<table class="long rejected"><thead><tr><th>List</th><th class="num">Line</th><th>Field</th><th>Reason</th></tr></thead><tbody>
${model.rejected.map((r) => html`<tr><td>${r.list}</td><td class="num">${r.row}</td><td>${r.field ?? "—"}</td><td>${r.reason}</td></tr>`)}
</tbody></table>${model.rejectedTotal > model.rejected.length ? html`<p class="muted">and ${model.rejectedTotal - model.rejected.length} more rejected rows (the first ${model.rejected.length} are listed).</p>` : null}`
}
</section>`;
}
