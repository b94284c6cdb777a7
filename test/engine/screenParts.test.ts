import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { importPartList } from "../../src/catalog/importPartList.ts";
import { parseSpec } from "../../src/engine/parseSpec.ts";
import { joinFigures, PartScreener, rankFigures, screenFigures, screenParts } from "../../src/engine/screenParts.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { evaluatePart } from "../../src/engine/evaluatePart.ts";
import { rankedResults, rankParts } from "../../src/engine/rankParts.ts";
import type { Spec } from "../../src/engine/types.ts";

const parsed = parseSpec(JSON.parse(readFileSync("sample-parts/demo-spec.json", "utf8")));
const spec = (parsed as { ok: true; spec: Spec }).spec;
const parts = importPartList(readFileSync("sample-parts/demo-parts.csv", "utf8")).parts;

describe("screenParts", () => {
  it("screenParts agrees with evaluatePart on every part's status and worst figures (one code path)", () => {
    const s = screenParts(spec, parts);
    parts.forEach((part, i) => {
      const e = evaluatePart(spec, part);
      expect(s.status[i]).toBe(e.status);
      expect(s.failures[i]).toBe(e.failures.length);
      if (e.worst.totalLoss.cornerIndex >= 0) expect(s.totalLoss[i]).toBe(e.worst.totalLoss.value);
      expect(s.peak[i]).toBe(e.worst.peakMagnitude.value);
      expect(Number.isNaN(s.minMargin[i]!) ? null : s.minMargin[i]).toBe(e.minMargin);
    });
  });

  it("a PartScreener re-aimed at another spec judges as a fresh one for that spec does", () => {
    const boost = makeSpec({ topology: "boost", vin: { min: 3, nom: 3.6, max: 4.2 }, vout: 5, iout: { min: 0.05, max: 1 }, fsw: 1e6, ambient: 60 });
    const reused = new PartScreener(spec);
    const sample = parts.slice(0, 40);
    for (const p of sample) reused.screen(p);
    reused.aim(boost);
    const fresh = new PartScreener(boost);
    for (const p of sample) expect({ ...reused.screen(p) }).toEqual({ ...fresh.screen(p) });
    reused.aim(spec);
    const first = new PartScreener(spec);
    for (const p of sample) expect({ ...reused.screen(p) }).toEqual({ ...first.screen(p) });
  });

  it("screenFigures over slices joined gives the same ranking as one pass", () => {
    const whole = screenParts(spec, parts);
    const cut = Math.floor(parts.length / 3);
    const joined = rankFigures(spec, parts, joinFigures([screenFigures(spec, parts, 0, cut), screenFigures(spec, parts, cut, parts.length)]));
    expect(Array.from(joined.order)).toEqual(Array.from(whole.order));
    expect(Array.from(joined.score)).toEqual(Array.from(whole.score));
  });

  it("rankedResults materialises the requested ranks with reasons, in order", () => {
    const s = screenParts(spec, parts);
    const page = rankedResults(spec, parts, s, 10, 15);
    expect(page.map((r) => r.rank)).toEqual([11, 12, 13, 14, 15]);
    expect(page.map((r) => r.partNumber)).toEqual(Array.from(s.order.slice(10, 15), (i) => parts[i]!.partNumber));
    expect(page.find((r) => !r.pass)?.failures[0]).toMatch(/at Vin/);
  });
});

describe("rankParts", () => {
  it("rankParts gives the same order and scores as screenParts (it ranks from the full evaluations)", () => {
    const s = screenParts(spec, parts);
    const results = rankParts(spec, parts);
    expect(results.map((r) => r.partNumber)).toEqual(Array.from(s.order, (i) => parts[i]!.partNumber));
    expect(results.map((r) => r.score)).toEqual(Array.from(s.order, (i) => s.score[i]!));
  });
});
