import { describe, expect, it } from "vitest";
import { mapColumns } from "../../src/catalog/mapColumns.ts";

describe("mapColumns", () => {
  it("mapColumns maps recognised headers, keeps the rest, and marks a second column of a quantity as duplicate", () => {
    const m = mapColumns(["Part Number", "Inductance (uH)", "Stock", "L (nH)"], null, []);
    expect(m.mapping.map((c) => [c.header, c.quantity, c.status])).toEqual([
      ["Part Number", "partNumber", "mapped"],
      ["Inductance (uH)", "inductance", "mapped"],
      ["Stock", null, "unrecognised"],
      ["L (nH)", null, "duplicate"],
    ]);
    expect(m.plans.map((p) => p.quantity)).toEqual(["partNumber", "inductance"]);
  });

  it("mapColumns lets an override take a quantity from a recognised column", () => {
    const m = mapColumns(["Inductance (uH)", "L (nH)"], null, [{ header: "l (NH)", quantity: "inductance", unit: null }]);
    expect(m.mapping[1]).toMatchObject({ quantity: "inductance", unit: "nH", status: "mapped" });
    expect(m.mapping[0]!.status).toBe("duplicate");
  });

  it("mapColumns appends the unit-row cell to the header and names blank headers by position", () => {
    const m = mapColumns(["Inductance", ""], ["µH", ""], []);
    expect(m.names).toEqual(["Inductance [µH]", "column 2"]);
    expect(m.mapping[0]).toMatchObject({ unit: "µH", unitSource: "unit row" });
  });

  it("mapColumns states the unit it assumes when there is none", () => {
    const m = mapColumns(["Part Number", "Inductance"], null, []);
    expect(m.mapping[1]).toMatchObject({ unit: "µH", unitSource: "default" });
    expect(m.mapping[1]!.note).toMatch(/no unit given/);
  });

  it("mapColumns reports an override for a header that is not there", () => {
    expect(mapColumns(["A"], null, [{ header: "B", quantity: "isat", unit: null }]).warnings[0]!.message).toMatch(/"B".*no column/);
  });
});
