import { html, type SafeHtml } from "./html.ts";
import { CAUTION_SUMMARY } from "./reportCautions.ts";
import type { ReportModel } from "./types.ts";

/** Title, design name, date and version, the caution line and the designer's notes. */
export function renderHeadSection(model: ReportModel): SafeHtml {
  const lists = model.lists.length;
  return html`<header class="report-head">
<h1>${model.title}</h1>
<p class="design">${model.designName === "" ? "Untitled design" : model.designName}</p>
<p class="meta">Generated <time class="generated" datetime="${model.generatedAt}">${model.generatedAt.replace("T", " ").replace(/\.\d+Z$/, " UTC").replace(/Z$/, " UTC")}</time> · Coilsift ${model.version} · ${model.partsConsidered} parts considered from ${lists} ${lists === 1 ? "list" : "lists"} · ${model.shortlist.length} shortlisted</p>
</header>
<p class="caution-box" role="note">${CAUTION_SUMMARY}</p>
${model.notes.trim() === "" ? null : html`<section class="keep"><h2>Design notes</h2><p class="notes">${model.notes}</p></section>`}`;
}
