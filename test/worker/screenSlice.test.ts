import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { importPartList } from "../../src/catalog/importPartList.ts";
import { parseSpec } from "../../src/engine/parseSpec.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { screenParts } from "../../src/engine/screenParts.ts";
import { evaluatePart } from "../../src/engine/evaluatePart.ts";
import type { Spec } from "../../src/engine/types.ts";
import { screenSlice } from "../../src/worker/screenSlice.ts";
import { finishRanking } from "../../src/worker/finishRanking.ts";
import { modeOfCode, statusOfCode } from "../../src/worker/codes.ts";

const parsed = parseSpec(JSON.parse(readFileSync("sample-parts/demo-spec.json", "utf8")));
const demoSpec = (parsed as { ok: true; spec: Spec }).spec;
const parts = importPartList(readFileSync("sample-parts/demo-parts.csv", "utf8")).parts;

const specs: [string, Spec][] = [
  ["demo buck", demoSpec],
  ["synchronous boost", makeSpec({ topology: "boost", rectifier: "synchronous", vin: { min: 3, nom: 3.6, max: 4.2 }, vout: 5, iout: { min: 0.05, max: 1 }, fsw: 1e6, targets: { lightLoadMode: "ccm" } })],
  ["inverting buck-boost, one load", makeSpec({ topology: "buck-boost", vin: { min: 9, nom: 12, max: 15 }, vout: 5, iout: 0.8, fsw: 400e3, rectifierDrop: 0.5 })],
];

describe("screenSlice", () => {
  for (const [name, spec] of specs) {
    it(`screenSlice(${name}) gives screenParts' figures, and finishRanking over slices gives its order and scores`, () => {
      const whole = screenParts(spec, parts);
      const cut = Math.floor(parts.length / 3);
      const slices = [screenSlice(spec, parts, cut, parts.length), screenSlice(spec, parts, 0, cut)];
      const ranking = finishRanking(spec, parts, slices);
      expect(Array.from(ranking.status, statusOfCode)).toEqual(whole.status);
      expect(Array.from(ranking.failures)).toEqual(Array.from(whole.failures));
      expect(Array.from(ranking.peak)).toEqual(Array.from(whole.peak));
      expect(Array.from(ranking.totalLoss)).toEqual(Array.from(whole.totalLoss));
      expect(Array.from(ranking.tempRise)).toEqual(Array.from(whole.tempRise));
      expect(Array.from(ranking.minMargin)).toEqual(Array.from(whole.minMargin));
      expect(Array.from(ranking.order)).toEqual(Array.from(whole.order));
      expect(Array.from(ranking.score)).toEqual(Array.from(whole.score));
      expect(Array.from(ranking.pareto)).toEqual(Array.from(whole.pareto));
      ranking.order.forEach((index, k) => expect(ranking.rankOf[index]).toBe(k));
      expect(ranking.passCount).toBe(whole.status.filter((s) => s === "pass").length);
    });
  }

  it("screenSlice records the mode at minimum load and both margins as evaluatePart finds them", () => {
    for (const [, spec] of specs) {
      const s = screenSlice(spec, parts, 0, 60);
      for (let i = 0; i < 60; i++) {
        const e = evaluatePart(spec, parts[i]!);
        const light = e.corners.filter((c) => c.ioutCorner === (spec.iout.min === spec.iout.max ? "max" : "min") && !c.unreachable);
        const firstOther = light.find((c) => c.mode !== "ccm");
        expect(modeOfCode(s.lightLoad[i]!)).toBe(light.length === 0 ? null : (firstOther?.mode ?? "ccm"));
        const sat = e.checks.find((c) => c.name === "saturation");
        expect(Number.isNaN(s.satMargin[i]!) ? null : s.satMargin[i]).toBe(sat?.status === "unchecked" ? null : (sat?.margin ?? null));
        const heat = e.checks.find((c) => c.name === "heating");
        expect(Number.isNaN(s.heatMargin[i]!) ? null : s.heatMargin[i]).toBe(heat?.status === "unchecked" ? null : (heat?.margin ?? null));
      }
    }
  });
});
