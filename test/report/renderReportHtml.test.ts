import { describe, expect, it } from "vitest";
import { exportReport } from "../../src/report/exportReport.ts";
import { escapeHtml } from "../../src/report/escapeHtml.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { DEMO_NAME, DEMO_SHORTLIST, FIXED_TIME, HOSTILE_PN, demoWorkspace, hostileWorkspace } from "./fixtures.ts";

const demo = exportReport(demoWorkspace(), { generatedAt: FIXED_TIME, version: "0.1.0" }).html;
const hostile = exportReport(hostileWorkspace(), { generatedAt: FIXED_TIME, version: "0.1.0" });

/** Text content of the document: tags dropped, white space collapsed, the escaped characters decoded. */
function textOf(html: string): string {
  return html
    .replace(/<style>[\s\S]*?<\/style>/g, "")
    .replace(/<[^>]+>/g, " ")
    .replace(/\s+/g, " ")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, "&");
}

describe("renderReportHtml", () => {
  it("renderReportHtml(demo) shows title, design, date, version, the spec table and every shortlisted part", () => {
    const text = textOf(demo);
    expect(text).toContain("Inductor selection report");
    expect(text).toContain(DEMO_NAME);
    expect(demo).toContain(`datetime="${FIXED_TIME}"`);
    expect(text).toContain("Coilsift 0.1.0");
    expect(text).toContain("Converter specification");
    expect(text).toContain("targets.saturationMargin");
    expect(text).toContain("Required inductance band");
    for (const pn of DEMO_SHORTLIST) expect(text).toContain(`Part ${DEMO_SHORTLIST.indexOf(pn) + 1}: ${pn}`);
    expect(text).toContain("Shortlist compared");
    expect(text).toContain("308 parts considered");
    expect(text).toContain("No rows were rejected.");
  });

  it("renderReportHtml(demo) draws one inline SVG waveform per shortlisted part, with caption and axis titles inside the figure", () => {
    const figures = demo.match(/<figure class="chart">[\s\S]*?<\/figure>/g) ?? [];
    expect(figures).toHaveLength(DEMO_SHORTLIST.length);
    figures.forEach((f, i) => {
      expect(f).toContain("<svg");
      expect(f).toContain("<polyline");
      expect(f).toContain(`Fig. ${i + 1}: inductor current i (A)`);
      expect(f).toContain("time t (µs)");
      expect(f).toContain(`<figcaption>Figure ${i + 1}.`);
    });
  });

  it("renderReportHtml names each method's source and carries the cautions", () => {
    const text = textOf(demo);
    for (const source of ["Erickson", "IEC 60028", "Venkatachalam", "Maniktala", "common practice"]) expect(text).toContain(source);
    expect(text).toMatch(/Estimates only/);
    expect(text).toMatch(/maker's datasheet/);
    expect(text).toMatch(/on the bench/);
    expect(text).toMatch(/local codes and licensed practice/);
  });

  it("renderReportHtml is self-contained: no script, no external resource, a policy that forbids both", () => {
    expect(demo).not.toMatch(/<script/i);
    expect(demo).not.toMatch(/\bsrc=/i);
    expect(demo).not.toMatch(/<link/i);
    expect(demo.replace(/xmlns="http:\/\/www\.w3\.org\/2000\/svg"/g, "")).not.toMatch(/https?:\/\//);
    expect(demo).toContain(`content="default-src 'none'; style-src 'unsafe-inline'; img-src data:"`);
  });

  it("renderReportHtml's print stylesheet keeps charts and short tables whole and starts each part on a page", () => {
    const css = demo.match(/<style>([\s\S]*?)<\/style>/)![1]!;
    const print = css.slice(css.indexOf("@media print"));
    expect(print).toMatch(/figure\.chart[^{]*\{[^}]*break-inside: avoid/);
    expect(print).toMatch(/table\.keep[^{]*\{[^}]*break-inside: avoid/);
    expect(print).toMatch(/section\.part[^{]*\{[^}]*break-before: page/);
    expect(print).toMatch(/thead \{ display: table-header-group/);
    expect(css).toMatch(/@page \{ size: A4/);
    // Every table is either kept whole or allowed to continue with repeated headers.
    for (const table of demo.match(/<table[^>]*>/g) ?? []) expect(table).toMatch(/class="[^"]*\b(keep|long)\b/);
  });

  it("renderReportHtml escapes every text from a part list: a hostile part number shows as text", () => {
    const html = hostile.html;
    expect(hostile.model.shortlist.map((s) => s.part.partNumber)).toEqual([HOSTILE_PN, "SAFE-6U8"]);
    expect(html).not.toContain(HOSTILE_PN);
    expect(html).toContain(escapeHtml(HOSTILE_PN));
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/<img/i);
    expect(html).not.toMatch(/<iframe/i);
    expect(html).not.toMatch(/<svg onload/i);
    expect(html).not.toMatch(/<b>|<i>|<h1>Design/);
    const text = textOf(html);
    expect(text).toContain(HOSTILE_PN);
    expect(text).toContain("<script>alert('maker')</script>");
    expect(text).toContain("<b>evil</b>.csv");
    expect(text).toContain("</p><script>alert('notes')</script>");
    // The broken row is rejected, named by its line, and its reason is escaped too.
    expect(hostile.model.rejected).toHaveLength(1);
    expect(hostile.model.rejected[0]!.row).toBe(4);
    expect(text).toContain("<b>evil</b>.csv");
  });

  it("renderReportHtml keeps a hostile part number inside attribute values escaped", () => {
    const attr = hostile.html.match(/data-shortlist="([^"]*)"/)![1]!;
    expect(attr).not.toContain('"');
    expect(JSON.parse(attr.replace(/&quot;/g, '"').replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&amp;/g, "&"))).toEqual([HOSTILE_PN, "SAFE-6U8"]);
  });

  it("renderReportHtml(no lists, unreachable spec) still gives the spec, the reason for no band, the missing shortlist and the cautions", () => {
    const spec = makeSpec({ topology: "boost", vin: { min: 3, nom: 3.7, max: 4.2 }, vout: 12, iout: 1, fsw: 1e6, switchResistance: 5 });
    const { html, model } = exportReport({ name: "", notes: "", spec, lists: [], shortlist: ["X-1"] }, { generatedAt: FIXED_TIME });
    expect(model.requirement.band).toBeNull();
    const text = textOf(html);
    expect(text).toContain("Untitled design");
    expect(text).toContain("no solution: the operating point at nominal input and full load cannot be reached");
    expect(text).toContain("Shortlisted but in none of the lists: X-1");
    expect(text).toContain("0 parts considered");
    expect(text).toContain("Cautions");
  });

  it("renderReportHtml writes the same bytes for the same input", () => {
    expect(exportReport(demoWorkspace(), { generatedAt: FIXED_TIME, version: "0.1.0" }).html).toBe(demo);
  });
});
