import { describe, expect, it } from "vitest";
import { specRows } from "../../src/report/specRows.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";

describe("specRows", () => {
  it("specRows(spec) marks keys left at the default and formats values with units", () => {
    const rows = specRows(makeSpec({ topology: "boost", vin: { min: 3, nom: 3.7, max: 4.2 }, vout: 5, iout: 1, fsw: 1.2e6, ambient: 25, targets: { maxHeight: 0.0012 } }));
    const row = (key: string) => rows.find((r) => r.key === key)!;
    expect(row("fsw")).toMatchObject({ value: "1.2 MHz", defaultValue: null, isDefault: false });
    expect(row("ambient")).toMatchObject({ value: "25 °C", isDefault: true });
    expect(row("targets.maxHeight")).toMatchObject({ value: "1.2 mm", defaultValue: "none", isDefault: false });
    expect(row("targets.maxTemperature")).toMatchObject({ value: "not checked", isDefault: true });
  });
});
