/**
 * The report's only stylesheet, inlined so that the file opens offline anywhere. The print rules
 * keep every chart and every short table on one page (break-inside: avoid), start each part on
 * a new page, repeat table headers where a long table must continue, and never leave a heading
 * alone at the foot of a page.
 */
export const REPORT_STYLES = `
:root { --ink: #1b2430; --muted: #5a6572; --rule: #c9d1da; --band: #f1f4f7; --accent: #0f5c6e;
  --pass: #2e6b3a; --incomplete: #7a5c00; --fail: #a3271f; }
* { box-sizing: border-box; }
html { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
body { margin: 0 auto; max-width: 1040px; padding: 24px 28px 48px; color: var(--ink);
  font: 13px/1.45 "DejaVu Sans", "Segoe UI", Helvetica, Arial, sans-serif; }
header.report-head { border-bottom: 3px solid var(--accent); padding-bottom: 10px; margin-bottom: 14px; }
header.report-head h1 { margin: 0; font-size: 24px; letter-spacing: 0.01em; }
header.report-head .design { margin: 4px 0 0; font-size: 17px; font-weight: 600; }
header.report-head .meta { margin: 6px 0 0; color: var(--muted); font-size: 12px; }
h2 { font-size: 17px; margin: 22px 0 8px; color: var(--accent); border-bottom: 1px solid var(--rule); padding-bottom: 3px; }
h3 { font-size: 14px; margin: 16px 0 6px; }
p { margin: 6px 0; }
.caution-box { border: 2px solid var(--fail); background: #fbf1ef; padding: 8px 12px; margin: 10px 0 14px; font-weight: 600; }
.notes { white-space: pre-wrap; border-left: 3px solid var(--rule); padding: 4px 10px; color: var(--ink); }
table { border-collapse: collapse; width: 100%; margin: 6px 0 12px; font-size: 12px; }
th, td { border: 1px solid var(--rule); padding: 3px 6px; text-align: left; vertical-align: top; }
thead th { background: var(--band); font-weight: 600; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
tr.default td { color: var(--muted); }
tr.marked td { background: #fff8e1; }
table.compare th[scope="row"] { width: 22%; background: var(--band); font-weight: 600; }
table.compare td { text-align: right; font-variant-numeric: tabular-nums; }
table.corners { font-size: 10.5px; }
table.corners th, table.corners td { padding: 2px 4px; }
.status { font-weight: 700; text-transform: uppercase; font-size: 11px; letter-spacing: 0.04em; }
.status-pass { color: var(--pass); }
.status-incomplete { color: var(--incomplete); }
.status-fail { color: var(--fail); }
.sources li { margin: 2px 0; }
ul.warnings { font-size: 11px; margin: 2px 0 10px; }
.src { color: var(--muted); font-size: 11px; }
table.assumptions td:first-child { width: 13%; font-weight: 600; }
table.assumptions td.src { width: 19%; }
table.ranking td.pn { white-space: nowrap; overflow-wrap: normal; }
table.ranking th:last-child { width: 34%; }
td.mark { white-space: nowrap; }
.muted { color: var(--muted); }
.part-head { display: flex; align-items: baseline; gap: 12px; flex-wrap: wrap; border-bottom: 1px solid var(--rule); margin: 22px 0 8px; }
.part-head h2 { flex: 1 1 auto; border-bottom: none; margin: 0; padding-bottom: 3px; }
.pn { font-family: "DejaVu Sans Mono", Consolas, monospace; overflow-wrap: anywhere; }
figure.chart { margin: 8px 0 14px; padding: 6px; border: 1px solid var(--rule); }
figure.chart svg { display: block; width: 100%; height: auto; max-width: 680px; margin: 0 auto; }
figure.chart figcaption { font-size: 11.5px; color: var(--muted); margin-top: 4px; }
svg .plot { fill: #fbfcfd; stroke: var(--rule); }
svg .grid { stroke: #e3e8ee; stroke-width: 1; }
svg .zero { stroke: #7d8894; stroke-width: 1; }
svg .isat { stroke: var(--fail); stroke-width: 1.4; stroke-dasharray: 6 4; }
svg .trace { fill: none; stroke: var(--accent); stroke-width: 2; stroke-linejoin: round; }
svg text { font-family: "DejaVu Sans", Helvetica, Arial, sans-serif; fill: var(--ink); }
svg .tick { font-size: 11px; fill: var(--muted); }
svg .axis { font-size: 12px; font-weight: 600; }
svg .label { font-size: 11px; }
svg .isat-label { fill: var(--fail); }
footer.report-foot { margin-top: 28px; border-top: 1px solid var(--rule); padding-top: 6px; color: var(--muted); font-size: 11px; }
@page { size: A4; margin: 14mm 12mm 15mm; }
@media print {
  body { max-width: none; padding: 0; font-size: 9.5pt; }
  h2 { font-size: 13pt; }
  table { font-size: 8.5pt; }
  table.corners { font-size: 7.6pt; }
  h2, h3, .part-head { break-after: avoid; page-break-after: avoid; }
  figure.chart, table.keep, .caution-box, .keep { break-inside: avoid; page-break-inside: avoid; }
  table.long { break-inside: auto; }
  table.long thead { display: table-header-group; }
  tr, th, td { break-inside: avoid; page-break-inside: avoid; }
  section.part, section.page { break-before: page; page-break-before: always; }
}
`;
