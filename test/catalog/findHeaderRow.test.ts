import { describe, expect, it } from "vitest";
import { findHeaderRow, isUnitRow } from "../../src/catalog/findHeaderRow.ts";

describe("findHeaderRow", () => {
  it("findHeaderRow skips title rows to the row naming the most quantities", () => {
    const rows = [["Stock list, spring"], [""], ["Part Number", "Inductance", "Isat"], ["A1", "4.7", "3"]];
    expect(findHeaderRow(rows)).toEqual({ header: 2, unitRow: -1 });
  });

  it("findHeaderRow finds a unit row below or above the header", () => {
    expect(findHeaderRow([["Part Number", "Inductance"], ["", "µH"], ["A1", "4.7"]])).toEqual({ header: 0, unitRow: 1 });
    expect(findHeaderRow([["", "[µH]"], ["Part Number", "Inductance"], ["A1", "4.7"]])).toEqual({ header: 1, unitRow: 0 });
  });

  it("findHeaderRow without known names takes the first content row", () => {
    expect(findHeaderRow([[""], ["foo", "bar"], ["1", "2"]])).toEqual({ header: 1, unitRow: -1 });
    expect(findHeaderRow([[""], [" "]])).toEqual({ header: -1, unitRow: -1 });
  });

  it("isUnitRow accepts only units and blanks", () => {
    expect(isUnitRow(["", "µH", "mΩ", "A", "%", "-"])).toBe(true);
    expect(isUnitRow(["A1", "4.7"])).toBe(false);
    expect(isUnitRow(["", ""])).toBe(false);
  });
});
