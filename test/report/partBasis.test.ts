import { describe, expect, it } from "vitest";
import { partBasis, saturationBasis } from "../../src/report/partBasis.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { importPartList } from "../../src/catalog/importPartList.ts";
import type { ReportListSource } from "../../src/report/types.ts";
import { demoSpec } from "./fixtures.ts";

const list = (seriesSaturation: Record<string, "soft" | "hard"> = {}): ReportListSource => ({
  id: "l",
  name: "l.csv",
  text: "",
  mapping: [],
  seriesSaturation,
  addedAt: "2026-01-01T00:00:00.000Z",
});

describe("saturationBasis", () => {
  it('saturationBasis(ferrite part) says "from material column: … → hard"', () => {
    const part = completePart({ partNumber: "A", inductance: 1e-6, material: "Ferrite drum" });
    expect(saturationBasis(part, null)).toBe('from material column: "Ferrite drum" → hard');
  });

  it("saturationBasis(part without material) says it is the default", () => {
    expect(saturationBasis(completePart({ partNumber: "A", inductance: 1e-6 }), null)).toBe("default: hard (no material given)");
  });

  it("saturationBasis(part with an unrecognised material) says the default was used and why", () => {
    const part = completePart({ partNumber: "A", inductance: 1e-6, material: "unobtainium" });
    expect(saturationBasis(part, null)).toBe('default: hard (material "unobtainium" not recognised)');
  });

  it("saturationBasis(part of a series the user set) names the user's choice ahead of the material", () => {
    const text = "Part Number,Series,Material,Inductance (uH)\nP1,XS,ferrite,4.7\n";
    const result = importPartList(text, { seriesSaturation: { xs: "soft" } });
    const part = result.parts[0]!;
    expect(part.saturation).toBe("soft");
    expect(saturationBasis(part, { list: list({ xs: "soft" }), mapping: result.mapping })).toBe('user\'s choice for series "XS": soft');
  });
});

describe("partBasis", () => {
  it("partBasis says which figures came from the list and which are defaults", () => {
    const text = "Part Number,Inductance (uH),DCR (mOhm),Isat (A),Irms (A)\nP1,4.7,20,6,5\n";
    const result = importPartList(text);
    const rows = partBasis(demoSpec(), result.parts[0]!, { list: list(), mapping: result.mapping });
    const basis = (label: string) => rows.find((r) => r.label === label)!;
    expect(basis("Tolerance")).toMatchObject({ value: "±20 %", basis: "assumed (the list gives none; spec assumedTolerance)" });
    expect(basis("Saturation current").basis).toBe("Isat from the list; drop default 30 % (none given)");
    expect(basis("Rated heating current").basis).toBe("rating from the list; rise default 40 K (none given)");
    expect(basis("Self-resonant frequency")).toMatchObject({ value: "not rated", basis: "not given: SRF not checked" });
    expect(basis("Core loss data").basis).toBe("core loss not modelled (no data)");
    expect(basis("Roll-off exponent n").basis).toBe("default for hard saturation");
  });

  it("partBasis credits the list for a roll-off exponent column", () => {
    const text = "Part Number,Inductance (uH),Isat (A),Roll-off exponent\nP1,4.7,6,3.5\n";
    const result = importPartList(text);
    const rows = partBasis(demoSpec(), result.parts[0]!, { list: list(), mapping: result.mapping });
    expect(rows.find((r) => r.label === "Roll-off exponent n")).toMatchObject({ value: "3.5", basis: "from the list" });
  });
});
