import { describe, expect, it } from "vitest";
import { buildReport } from "../../src/report/buildReport.ts";
import { loadWorkspaceParts } from "../../src/report/loadWorkspaceParts.ts";
import { rankParts } from "../../src/engine/rankParts.ts";
import { screenParts } from "../../src/engine/screenParts.ts";
import { requiredInductance } from "../../src/engine/requiredInductance.ts";
import { renderReportHtml } from "../../src/report/renderReportHtml.ts";
import { DEMO_NAME, DEMO_SHORTLIST, FIXED_TIME, demoWorkspace } from "./fixtures.ts";

const workspace = demoWorkspace();
const loaded = loadWorkspaceParts(workspace);
const base = {
  workspace,
  spec: workspace.spec,
  parts: loaded.parts,
  rejected: loaded.rejected,
  imports: loaded.imports,
  generatedAt: FIXED_TIME,
  version: "9.9.9",
};
const model = buildReport(base);

describe("buildReport", () => {
  it("buildReport(demo) carries title, design name, date and version", () => {
    expect(model.title).toBe("Inductor selection report");
    expect(model.designName).toBe(DEMO_NAME);
    expect(model.generatedAt).toBe(FIXED_TIME);
    expect(model.version).toBe("9.9.9");
  });

  it("buildReport(demo) lists every spec key with its value and whether it is the default", () => {
    const keys = model.specRows.map((r) => r.key);
    expect(keys).toEqual(expect.arrayContaining(["topology", "vin.min", "vin.max", "fsw", "targets.rippleRatio.max", "targets.saturationMargin", "weights.loss"]));
    expect(model.specRows.find((r) => r.key === "fsw")?.value).toBe("500 kHz");
    expect(model.specRows.find((r) => r.key === "ambient")).toMatchObject({ value: "40 °C", isDefault: false, defaultValue: "25 °C" });
    expect(model.specRows.find((r) => r.key === "thermalExponent")).toMatchObject({ isDefault: true });
  });

  it("buildReport(demo) names a published source for every assumption", () => {
    expect(model.assumptions.length).toBeGreaterThan(10);
    for (const a of model.assumptions) expect(a.sources.length).toBeGreaterThan(0);
    const citations = model.sources.map((s) => s.citation).join("\n");
    for (const source of ["Fundamentals of Power Electronics", "IEC 60028", "Venkatachalam", "Maniktala", "common practice"]) expect(citations).toContain(source);
  });

  it("buildReport(demo) gives the required-inductance band of the engine", () => {
    expect(model.requirement.band).toEqual(requiredInductance(workspace.spec));
    expect(model.requirement.band!.min).toBeGreaterThan(1e-6);
    expect(model.requirement.band!.max).toBeGreaterThan(model.requirement.band!.min);
  });

  it("buildReport(demo) evaluates every shortlisted part with its corners, checks and a waveform at the worst corner", () => {
    expect(model.shortlist.map((s) => s.part.partNumber)).toEqual(DEMO_SHORTLIST);
    for (const entry of model.shortlist) {
      expect(entry.result.corners).toHaveLength(18);
      expect(entry.cornerLabels).toHaveLength(18);
      expect(entry.result.checks.length).toBeGreaterThan(3);
      expect(entry.waveform).not.toBeNull();
      const w = entry.waveform!;
      expect(w.cornerIndex).toBe(entry.result.worst.peakMagnitude.cornerIndex);
      const peak = Math.max(...w.samples.map((s) => s.i));
      expect(peak).toBeCloseTo(w.corner.ipk, 6);
    }
  });

  it("buildReport(demo) states the saturation character of each part and why", () => {
    const basis = (pn: string, label: string) =>
      model.shortlist.find((s) => s.part.partNumber === pn)!.basis.find((b) => b.label === label)!;
    expect(basis("HV-DRS12060-6U8", "Saturation character").basis).toBe('from material column: "Ferrite drum, shielded" → hard');
    expect(basis("QC-PIR6035-6U8", "Saturation character").basis).toMatch(/^from material column: ".*powder.*" → soft$/i);
    expect(basis("HV-DRS12060-6U8", "Roll-off exponent n")).toMatchObject({ value: "8", basis: "default for hard saturation" });
    expect(basis("HV-DRS12060-6U8", "Core loss data").basis).toBe("core loss not modelled (no data)");
  });

  it("buildReport(demo) counts the parts considered and shows the top of the ranking", () => {
    expect(model.partsConsidered).toBe(loaded.parts.length);
    expect(model.counts.pass + model.counts.incomplete + model.counts.fail).toBe(loaded.parts.length);
    expect(model.ranking).toHaveLength(20);
    expect(model.ranking.map((r) => r.rank)).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
    expect(model.ranking.filter((r) => r.shortlisted).map((r) => r.partNumber).sort()).toEqual([...DEMO_SHORTLIST].sort());
    expect(model.rejectedTotal).toBe(0);
  });

  it("buildReport gives the same model from full results, from a screening and from neither", () => {
    const fromResults = buildReport({ ...base, results: rankParts(workspace.spec, loaded.parts) });
    const fromScreening = buildReport({ ...base, screening: screenParts(workspace.spec, loaded.parts) });
    expect(renderReportHtml(fromResults)).toBe(renderReportHtml(model));
    expect(renderReportHtml(fromScreening)).toBe(renderReportHtml(model));
  });

  it("buildReport keeps shortlisted part numbers that are in no list and matches others case-insensitively", () => {
    const m = buildReport({ ...base, workspace: { ...workspace, shortlist: ["hv-drs12060-6u8", "NOT-THERE"] } });
    expect(m.shortlist.map((s) => s.part.partNumber)).toEqual(["HV-DRS12060-6U8"]);
    expect(m.missingShortlist).toEqual(["NOT-THERE"]);
  });

  it("buildReport refuses an invalid generatedAt with a RangeError naming it", () => {
    expect(() => buildReport({ ...base, generatedAt: "yesterday" })).toThrow(RangeError);
    expect(() => buildReport({ ...base, generatedAt: "yesterday" })).toThrow(/generatedAt/);
  });

  it("buildReport(demo) carries the cautions", () => {
    const text = model.cautions.join(" ");
    expect(text).toMatch(/estimate/i);
    expect(text).toMatch(/datasheet/);
    expect(text).toMatch(/bench/);
    expect(text).toMatch(/codes/);
    expect(text).toMatch(/licensed/);
  });
});
