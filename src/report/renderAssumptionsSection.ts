import { html, type SafeHtml } from "./html.ts";
import { METHOD_SOURCES } from "./methodSources.ts";
import type { ListSummary, ReportModel } from "./types.ts";

/** Warnings listed per part list; the rest are counted. */
const WARNINGS_SHOWN = 30;

const SOURCE_LABEL: Record<keyof typeof METHOD_SOURCES, string> = {
  erickson: "Erickson & Maksimović",
  maniktala: "Maniktala",
  iec60028: "IEC 60028",
  igse: "Venkatachalam et al. 2002 (iGSE)",
  iec62024: "IEC 62024-2",
  mclyman: "McLyman",
  textbook: "textbook",
  practice: "common practice",
  coilsift: "Coilsift",
};

function renderList(list: ListSummary): SafeHtml {
  const mapped = list.mapping.filter((m) => m.status === "mapped");
  const other = list.mapping.filter((m) => m.status !== "mapped");
  return html`<h3>List <span class="pn">${list.name}</span></h3>
<p>${list.parts === null ? "" : `${list.parts} parts from ${list.dataRows ?? "?"} data rows, `}${list.rejected} rejected rows · ${list.characters} characters · checksum FNV-1a <code>${list.checksum}</code>${
    list.seriesSaturation.length === 0
      ? ""
      : ` · saturation chosen per series: ${list.seriesSaturation.map(([series, character]) => `${series} → ${character}`).join(", ")}`
  }</p>
${
  mapped.length === 0
    ? null
    : html`<table class="long mapping"><thead><tr><th>Column</th><th>Read as</th><th>Unit</th><th>Unit from</th><th>Note</th></tr></thead><tbody>
${mapped.map((m) => html`<tr><td>${m.header}</td><td>${m.quantity ?? ""}</td><td>${m.unit ?? "—"}</td><td>${m.unitSource ?? "—"}</td><td>${m.note ?? ""}</td></tr>`)}
</tbody></table>`
}
${other.length === 0 ? null : html`<p class="muted">Columns not used: ${other.map((m) => `${m.header} (${m.status})`).join("; ")}</p>`}
${
  list.warnings.length === 0
    ? null
    : html`<p class="muted">Import warnings:</p><ul class="warnings muted">${list.warnings.slice(0, WARNINGS_SHOWN).map((w) => html`<li>${w}</li>`)}${
        list.warnings.length > WARNINGS_SHOWN ? html`<li>and ${list.warnings.length - WARNINGS_SHOWN} more</li>` : null
      }</ul>`
}`;
}

/** Every model and default with its source, the numbered source list, and how each part list was read. */
export function renderAssumptionsSection(model: ReportModel): SafeHtml {
  return html`<section id="assumptions">
<h2>Methods, assumptions and defaults</h2>
<table class="long assumptions">
<thead><tr><th>Topic</th><th>What was assumed</th><th>Source</th></tr></thead>
<tbody>
${model.assumptions.map((a) => html`<tr><td>${a.topic}</td><td>${a.statement}</td><td class="src">${a.sources.map((s) => SOURCE_LABEL[s]).join("; ")}</td></tr>`)}
</tbody>
</table>
<h3>Sources</h3>
<ul class="sources">
${model.sources.map((s) => html`<li><strong>${SOURCE_LABEL[s.key]}</strong>: ${s.citation}</li>`)}
</ul>
</section>
<section id="lists">
<h2>Part lists and how they were read</h2>
${model.lists.length === 0 ? html`<p>No part lists.</p>` : model.lists.map(renderList)}
${model.duplicates.length === 0 ? null : html`<h3>Duplicate part numbers</h3><ul>${model.duplicates.map((d) => html`<li>${d}</li>`)}</ul>`}
</section>`;
}
