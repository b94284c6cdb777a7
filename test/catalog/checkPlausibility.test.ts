import { describe, expect, it } from "vitest";
import { checkPlausibility, PlausibilityCheck } from "../../src/catalog/checkPlausibility.ts";
import { completePart, type PartInput } from "../../src/engine/partDefaults.ts";
import { si } from "./siReference.ts";

const part = (partNumber: string, uh: number, extra: Omit<PartInput, "partNumber" | "inductance"> = {}) =>
  completePart({ partNumber, inductance: si(`${uh} uH`, "H"), ...extra }); // mathjs

describe("checkPlausibility", () => {
  it("checkPlausibility flags a value a thousand times off the median, naming its row", () => {
    const parts = [part("A", 4.7), part("B", 10), part("C", 2.2), part("D", 4.7e6)];
    const w = checkPlausibility(parts, [2, 3, 4, 5]);
    expect(w).toHaveLength(1);
    expect(w[0]).toMatchObject({ row: 5, field: "inductance" });
    expect(w[0]!.message).toMatch(/4\.7 H.*outside the usual.*far from the list's median/);
  });

  it("checkPlausibility flags DCR max below typical and hot Isat above cold Isat", () => {
    const w = checkPlausibility([part("A", 4.7, { dcrTyp: 0.05, dcrMax: 0.04, isat: 3, isatHot: 3.5 })], [2]);
    expect(w.map((x) => x.field)).toEqual(["dcrMax", "isatHot"]);
  });

  it("checkPlausibility of ordinary parts says nothing", () => {
    expect(checkPlausibility([part("A", 4.7, { dcrMax: 0.045, isat: 3.2, srf: 40e6 }), part("B", 10)], [2, 3])).toEqual([]);
    expect(checkPlausibility([], [])).toEqual([]);
  });

  it("checkPlausibility over 10 000 parts still finds the one a thousand times off the median (the sample thins evenly)", () => {
    const parts = Array.from({ length: 10_000 }, (_, i) => part(`P${i}`, i % 2 === 0 ? 10 : 22, { isat: 2 + (i % 7) }));
    parts[6543] = part("X", 10, { isat: 0.002 });
    const w = checkPlausibility(parts, parts.map((_, i) => i + 2));
    expect(w).toEqual([expect.objectContaining({ row: 6545, field: "isat", message: expect.stringMatching(/far from the list's median of 5 A/) })]);
  });

  it("PlausibilityCheck reports no contradiction for a part added and later replaced", () => {
    const check = new PlausibilityCheck();
    const replaced = part("A", 4.7, { dcrTyp: 0.05, dcrMax: 0.04 });
    const kept = part("A", 4.7, { dcrTyp: 0.04, dcrMax: 0.05 });
    check.add(replaced, 2);
    check.add(kept, 3);
    expect(check.warnings([kept], [3])).toEqual([]);
  });
});
