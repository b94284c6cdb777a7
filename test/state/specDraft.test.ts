import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { parseSpec } from "../../src/engine/parseSpec.ts";
import type { Spec } from "../../src/engine/types.ts";
import { draftFromSpec, fieldErrors, groupErrors, readDraft } from "../../src/state/specDraft.ts";
import { FIELD_GROUPS, SPEC_FIELDS } from "../../src/state/specFields.ts";

const demo = (parseSpec(JSON.parse(readFileSync("sample-parts/demo-spec.json", "utf8"))) as { ok: true; spec: Spec }).spec;

describe("specDraft", () => {
  it("readDraft(draftFromSpec(spec)) gives the spec back", () => {
    const reading = readDraft(draftFromSpec(demo));
    expect(reading.spec).toEqual(demo);
  });

  it("draftFromSpec writes engineering notation a designer would type", () => {
    const d = draftFromSpec(demo);
    expect(d["fsw"]).toBe("500k");
    expect(d["switchResistance"]).toBe("30m");
    expect(d["vin.max"]).toBe("13.2");
    expect(d["targets.saturationMargin"]).toBe("20");
    expect(d["targets.maxHeight"]).toBe("");
  });

  it("readDraft shows each parsed value with its unit", () => {
    const reading = readDraft({ ...draftFromSpec(demo), fsw: "1.2 MHz", "targets.maxHeight": "3.1" });
    expect(reading.fields["fsw"]).toEqual({ ok: true, value: 1.2e6, shown: "1.2 MHz" });
    expect(reading.fields["targets.maxHeight"]).toMatchObject({ ok: true, shown: "3.1 mm" });
    expect(reading.spec?.targets.maxHeight).toBeCloseTo(3.1e-3, 12);
  });

  it("readDraft keeps a field that does not read, with its message, and gives no spec", () => {
    const reading = readDraft({ ...draftFromSpec(demo), "vin.max": "13.2x" });
    expect(reading.spec).toBeNull();
    expect(fieldErrors(reading, "vin.max")[0]).toMatch(/not a unit/);
  });

  it("readDraft puts parseSpec's cross-field errors beside the field or group they name", () => {
    const buckUp = readDraft({ ...draftFromSpec(demo), vout: "15" });
    expect(fieldErrors(buckUp, "vout")[0]).toMatch(/buck needs vout below vin/);
    const order = readDraft({ ...draftFromSpec(demo), "vin.min": "14" });
    expect(groupErrors(order, FIELD_GROUPS.find((g) => g.id === "vin")!)).toEqual(["vin: must satisfy min ≤ nom ≤ max"]);
  });

  it("readDraft reads blanks as the default, no limit, or a missing required value", () => {
    const d = draftFromSpec(demo);
    const reading = readDraft({ ...d, switchDrop: "", "vin.nom": "", fsw: "" });
    expect(reading.fields["switchDrop"]).toMatchObject({ ok: true, shown: "default: 0 V" });
    expect(reading.fields["vin.nom"]).toMatchObject({ ok: true, shown: "default: midpoint of min and max" });
    expect(fieldErrors(reading, "fsw")).toEqual(["enter a value"]);
    const noNom = readDraft({ ...d, "vin.nom": "" });
    expect(noNom.spec?.vin.nom).toBeCloseTo((10.8 + 13.2) / 2, 12);
  });

  it("every field key is one parseSpec accepts", () => {
    const reading = readDraft(draftFromSpec(demo));
    expect(reading.specErrors).toEqual([]);
    expect(SPEC_FIELDS.length).toBeGreaterThan(30);
  });
});
