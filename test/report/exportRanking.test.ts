import { describe, expect, it } from "vitest";
import { exportRanking } from "../../src/report/exportRanking.ts";
import { FIXED_TIME, demoWorkspace } from "./fixtures.ts";

describe("exportRanking", () => {
  it("exportRanking(workspace) returns CSV and JSON with file names of the design and date", () => {
    const out = exportRanking(demoWorkspace(), FIXED_TIME);
    expect(out.csvFileName).toBe("coilsift-ranking-demo-12-v-to-3-3-v-point-of-load-buck-2026-03-01.csv");
    expect(out.jsonFileName).toMatch(/\.json$/);
    const j = JSON.parse(out.json);
    expect(Object.keys(j)).toEqual(["spec", "results", "rejected", "duplicates"]);
    expect(j.results).toHaveLength(308);
    expect(out.csv.split("\r\n")).toHaveLength(310);
  });
});
