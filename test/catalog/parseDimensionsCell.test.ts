import { describe, expect, it } from "vitest";
import { parseDimensionsCell } from "../../src/catalog/parseDimensionsCell.ts";
import type { CellContext } from "../../src/catalog/parseNumberCell.ts";
import { parseUnit } from "../../src/catalog/parseUnit.ts";
import { close, si } from "./siReference.ts";

const mm: CellContext = { dimension: "length", unit: parseUnit("mm", "length"), decimalComma: false, rangePick: "high" };

describe("parseDimensionsCell", () => {
  it.each([
    ["5.0 x 5.0 x 3.0", mm, ["5 mm", "5 mm", "3 mm"]],
    ["5×5×3", mm, ["5 mm", "5 mm", "3 mm"]],
    ["5 X 5 X 3", mm, ["5 mm", "5 mm", "3 mm"]],
    ["197 x 197 x 118 mil", mm, ["197 mil", "197 mil", "118 mil"]],
    ["0.2 x 0.2 x 0.12 in", mm, ["0.2 in", "0.2 in", "0.12 in"]],
    ["5,0 x 5,0 x 3,0", { ...mm, decimalComma: true }, ["5 mm", "5 mm", "3 mm"]],
    ["5.0 (L) x 4.8 (W) x 3.0 (H)", mm, ["5 mm", "4.8 mm", "3 mm"]],
  ] as [string, CellContext, string[]][])("parseDimensionsCell(%j) matches mathjs", (raw, ctx, expected) => {
    const r = parseDimensionsCell(raw, ctx);
    expect(r.kind).toBe("value");
    if (r.kind !== "value") return;
    // Reference: mathjs conversion of each figure.
    expect(close(r.length, si(expected[0]!, "m"))).toBe(true);
    expect(close(r.width, si(expected[1]!, "m"))).toBe(true);
    expect(close(r.height, si(expected[2]!, "m"))).toBe(true);
  });

  it("parseDimensionsCell(L x W) has no height", () => {
    const r = parseDimensionsCell("4 x 4", mm);
    expect(r.kind === "value" && r.height).toBeNull();
  });

  it("parseDimensionsCell of a blank is missing, of garbage an error", () => {
    expect(parseDimensionsCell("", mm).kind).toBe("missing");
    expect(parseDimensionsCell("1210", mm).kind).toBe("error");
    expect(parseDimensionsCell("5 x y x 3", mm).kind).toBe("error");
    expect(parseDimensionsCell("1 x 2 x 3 x 4", mm).kind).toBe("error");
  });
});
