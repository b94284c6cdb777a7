import { describe, expect, it } from "vitest";
import { niceTicks } from "../../src/ui/common/niceTicks.ts";

describe("niceTicks", () => {
  it("niceTicks(−0.35, 4.78) covers the range on a 1-2-5 step", () => {
    expect(niceTicks(-0.35, 4.78)).toEqual([-1, 0, 1, 2, 3, 4, 5]);
  });
  it("niceTicks(0, 6) ends on the range", () => {
    expect(niceTicks(0, 6)).toEqual([0, 1, 2, 3, 4, 5, 6]);
  });
  it("niceTicks of a tiny range steps in small decades", () => {
    expect(niceTicks(0.0012, 0.0049, 4)).toEqual([0.001, 0.002, 0.003, 0.004, 0.005]);
  });
  it("niceTicks of an empty range still gives two ticks", () => {
    expect(niceTicks(2, 2).length).toBeGreaterThanOrEqual(2);
  });
});
