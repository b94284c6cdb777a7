import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { importPartList } from "../../src/catalog/importPartList.ts";
import { overridesAfter, unitProblem } from "../../src/ui/parts/mappingEdits.ts";

describe("mappingEdits", () => {
  it("unitProblem accepts the quantity's units and names the wrong dimension", () => {
    expect(unitProblem("inductance", "nH")).toBeNull();
    expect(unitProblem("inductance", "µH")).toBeNull();
    expect(unitProblem("inductance", "mA")).toMatch(/current, not a inductance|is a current/);
    expect(unitProblem("inductance", "nX")).toMatch(/not a unit/);
    expect(unitProblem("partNumber", "mm")).toMatch(/takes no unit/);
    expect(unitProblem("ignore", "anything")).toBeNull();
  });

  it("overridesAfter, applied by the importer, reads an unrecognised column as the chosen quantity", () => {
    const text = readFileSync("sample-parts/demo-variant-tabbed.tsv", "utf8").replace("L0 [nH]", "Wert");
    const before = importPartList(text);
    expect(before.parts).toHaveLength(0);
    const column = before.mapping.find((m) => m.header === "Wert")!.column;
    const overrides = overridesAfter([], before.mapping, { [column]: { quantity: "inductance", unit: "nH" } });
    expect(overrides).toEqual([{ header: "Wert", quantity: "inductance", unit: "nH" }]);
    const after = importPartList(text, { mapping: overrides });
    expect(after.parts).toHaveLength(60);
    expect(after.parts[0]!.inductance).toBeCloseTo(330e-9, 15);
  });

  it("overridesAfter keeps earlier choices for other columns and replaces the edited one", () => {
    const mapping = importPartList(readFileSync("sample-parts/demo-variant-tabbed.tsv", "utf8")).mapping;
    const stock = mapping.find((m) => m.header === "Stock")!;
    const earlier = [
      { header: "Stock", quantity: "ignore" as const, unit: null },
      { header: "Packaging", quantity: "ignore" as const, unit: null },
    ];
    expect(overridesAfter(earlier, mapping, { [stock.column]: { quantity: "price", unit: "" } })).toEqual([
      { header: "Packaging", quantity: "ignore", unit: null },
      { header: "Stock", quantity: "price", unit: null },
    ]);
  });
});
