import { html, trustedHtml } from "./html.ts";
import { REPORT_STYLES } from "./reportStyles.ts";
import { renderHeadSection } from "./renderHeadSection.ts";
import { renderSpecSection } from "./renderSpecSection.ts";
import { renderAssumptionsSection } from "./renderAssumptionsSection.ts";
import { renderComparisonSection } from "./renderComparisonSection.ts";
import { renderPartSection } from "./renderPartSection.ts";
import { renderRankingSection } from "./renderRankingSection.ts";
import { renderCautionsSection } from "./renderCautionsSection.ts";
import type { ReportModel } from "./types.ts";

/**
 * The report as one self-contained HTML document: inline stylesheet, inline SVG, no script and
 * no external resource, so it opens offline anywhere and prints cleanly. Every text that came
 * from a part list or the workspace is escaped by the `html` template.
 */
export function renderReportHtml(model: ReportModel): string {
  const title = `${model.title}: ${model.designName === "" ? "Untitled design" : model.designName}`;
  const doc = html`<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="Coilsift ${model.version}">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">
<title>${title}</title>
<style>${trustedHtml(REPORT_STYLES)}</style>
</head>
<body>
${renderHeadSection(model)}
${renderSpecSection(model)}
${renderAssumptionsSection(model)}
${renderComparisonSection(model)}
${model.shortlist.map((entry, i) => renderPartSection(model.spec, entry, i + 1))}
${renderRankingSection(model)}
${renderCautionsSection(model)}
</body>
</html>
`;
  return doc.value;
}
