import { describe, expect, it } from "vitest";
import { screenSlice } from "../../src/worker/screenSlice.ts";
import { finishRanking } from "../../src/worker/finishRanking.ts";
import { tradeoffPoints } from "../../src/ui/tradeoff/tradeoffData.ts";
import { demoParts, demoSpec } from "./fixtures.ts";

const ranking = finishRanking(demoSpec, demoParts, [screenSlice(demoSpec, demoParts)]);

describe("tradeoffPoints", () => {
  it("tradeoffPoints keeps the passing parts and marks exactly the undominated ones", () => {
    const points = tradeoffPoints(ranking, demoParts, false);
    expect(points.length).toBe(ranking.passCount);
    for (const p of points) {
      const dominated = points.some((q) => q !== p && q.loss <= p.loss && q.volume <= p.volume && (q.loss < p.loss || q.volume < p.volume));
      expect(p.pareto).toBe(!dominated);
    }
    expect(points.some((p) => p.pareto)).toBe(true);
  });
});
