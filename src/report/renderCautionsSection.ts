import { html, type SafeHtml } from "./html.ts";
import type { ReportModel } from "./types.ts";

/** The cautions in full, last in the report so that they close every printout. */
export function renderCautionsSection(model: ReportModel): SafeHtml {
  return html`<section id="cautions" class="keep">
<h2>Cautions</h2>
<ul>
${model.cautions.map((c) => html`<li>${c}</li>`)}
</ul>
<footer class="report-foot">Coilsift ${model.version}. Estimates only: verify against the maker's datasheet and on the bench.</footer>
</section>`;
}
