import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { importPartList } from "../../src/catalog/importPartList.ts";
import { demoSpec } from "../../src/state/demoScenario.ts";
import { screenSlice } from "../../src/worker/screenSlice.ts";
import { finishRanking } from "../../src/worker/finishRanking.ts";
import { distinctValues, filteredOrder, sortedOrder } from "../../src/state/rankingView.ts";
import { rejectedCsv } from "../../src/state/rejectedCsv.ts";

const parts = importPartList(readFileSync("sample-parts/demo-parts.csv", "utf8")).parts;
const spec = demoSpec();
const ranking = finishRanking(spec, parts, [screenSlice(spec, parts)]);
const none = { passOnly: false, text: "", maker: null, material: null };

describe("rankingView", () => {
  it("filteredOrder with no filter is the rank order", () => {
    expect(Array.from(filteredOrder(ranking, parts, none))).toEqual(Array.from(ranking.order));
  });

  it("filteredOrder(passOnly) keeps only passing parts, in rank order", () => {
    const pass = filteredOrder(ranking, parts, { ...none, passOnly: true });
    expect(pass.length).toBe(ranking.passCount);
    expect(Array.from(pass).every((i) => ranking.status[i] === 0)).toBe(true);
  });

  it("filteredOrder matches every word of the text in number, maker, series or material", () => {
    const maker = distinctValues(parts, (p) => p.maker)[0]!;
    const hits = filteredOrder(ranking, parts, { ...none, text: `${maker.split(" ")[0]!.toLowerCase()} 2512` });
    expect(hits.length).toBeGreaterThan(0);
    for (const i of hits) expect(`${parts[i]!.partNumber} ${parts[i]!.maker}`.toLowerCase()).toContain("2512");
  });

  it("filteredOrder by maker and material keeps exactly those parts", () => {
    const material = distinctValues(parts, (p) => p.material)[1]!;
    const hits = filteredOrder(ranking, parts, { ...none, material });
    expect(hits.length).toBe(parts.filter((p) => p.material === material).length);
  });

  it("sortedOrder by a number column sorts it, either way, with missing data last", () => {
    const all = filteredOrder(ranking, parts, none);
    const up = sortedOrder(all, ranking, parts, { column: "loss", descending: false });
    const values = Array.from(up, (i) => ranking.totalLoss[i]!).filter((x) => !Number.isNaN(x));
    expect(values).toEqual([...values].sort((a, b) => a - b));
    const down = sortedOrder(all, ranking, parts, { column: "inductance", descending: true });
    expect(parts[down[0]!]!.inductance).toBe(Math.max(...parts.map((p) => p.inductance)));
    expect(up.length).toBe(all.length);
  });

  it("sortedOrder by rank descending reverses the rank order", () => {
    const all = filteredOrder(ranking, parts, none);
    expect(Array.from(sortedOrder(all, ranking, parts, { column: "rank", descending: true }))).toEqual(Array.from(all).reverse());
  });
});

describe("rejectedCsv", () => {
  it("rejectedCsv quotes cells, defuses formulas and keeps every raw cell", () => {
    const csv = rejectedCsv([{ row: 7, field: "inductance", header: "L (µH)", reason: 'no number in "4,7 uH"', cells: ["=SUM(A1)", "4,7 uH", 'say "hi"'] }]);
    expect(csv).toBe('line,field,column,reason,cell 1,cell 2,cell 3\r\n7,inductance,L (µH),"no number in ""4,7 uH""",\'=SUM(A1),"4,7 uH","say ""hi"""\r\n');
  });
});
