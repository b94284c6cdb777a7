import { describe, expect, it } from "vitest";
import { mergeLists } from "../../src/catalog/mergeLists.ts";
import { completePart } from "../../src/engine/partDefaults.ts";

const part = (partNumber: string, inductance: number) => completePart({ partNumber, inductance });

describe("mergeLists", () => {
  it("mergeLists keeps the later list's part for a part number in two lists and reports it", () => {
    const merged = mergeLists([
      { name: "old.csv", parts: [part("A1", 1e-6), part("A2", 2e-6)] },
      { name: "new.csv", parts: [part("a1", 1.5e-6), part("B1", 3e-6)] },
    ]);
    expect(merged.parts.map((p) => [p.partNumber, p.inductance])).toEqual([
      ["a1", 1.5e-6],
      ["A2", 2e-6],
      ["B1", 3e-6],
    ]);
    expect(merged.duplicates).toEqual([expect.objectContaining({ partNumber: "a1", kept: "new.csv", dropped: "old.csv" })]);
    expect(merged.duplicates[0]!.message).toMatch(/old\.csv.*new\.csv/);
  });

  it("mergeLists of lists without shared part numbers keeps everything in order", () => {
    const merged = mergeLists([
      { name: "a", parts: [part("A1", 1e-6)] },
      { name: "b", parts: [part("B1", 1e-6)] },
    ]);
    expect(merged.parts.map((p) => p.partNumber)).toEqual(["A1", "B1"]);
    expect(merged.duplicates).toEqual([]);
  });

  it("mergeLists of nothing is empty", () => {
    expect(mergeLists([])).toEqual({ parts: [], duplicates: [] });
  });
});
