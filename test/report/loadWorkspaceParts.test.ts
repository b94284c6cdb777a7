import { describe, expect, it } from "vitest";
import { listsInMergeOrder, loadWorkspaceParts } from "../../src/report/loadWorkspaceParts.ts";
import { FIXED_TIME } from "./fixtures.ts";

describe("loadWorkspaceParts", () => {
  it("loadWorkspaceParts lets the list added later win a duplicate part number, whatever the array order", () => {
    const a = { id: "a", name: "a.csv", text: "Part Number,Inductance (uH)\nDUP-1,4.7\n", mapping: [], seriesSaturation: {}, addedAt: "2026-01-02T00:00:00.000Z" };
    const b = { id: "b", name: "b.csv", text: "Part Number,Inductance (uH)\nDUP-1,6.8\n", mapping: [], seriesSaturation: {}, addedAt: "2026-01-01T00:00:00.000Z" };
    expect(listsInMergeOrder([a, b]).map((l) => l.id)).toEqual(["b", "a"]);
    const loaded = loadWorkspaceParts({ lists: [a, b] });
    expect(loaded.parts).toHaveLength(1);
    expect(loaded.parts[0]!.inductance).toBeCloseTo(4.7e-6, 15);
    expect(loaded.duplicates[0]!.kept).toBe("a.csv");
  });

  it("loadWorkspaceParts applies each list's column choices", () => {
    const list = { id: "m", name: "m.csv", text: "PN,Value\nX-1,4700\n", mapping: [{ header: "PN", quantity: "partNumber" as const, unit: null }, { header: "Value", quantity: "inductance" as const, unit: "nH" }], seriesSaturation: {}, addedAt: FIXED_TIME };
    const loaded = loadWorkspaceParts({ lists: [list] });
    expect(loaded.parts[0]!.inductance).toBeCloseTo(4.7e-6, 15);
  });
});
