import { describe, expect, it } from "vitest";
import { requirementSummary } from "../../src/report/requirementSummary.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";

describe("requirementSummary", () => {
  it("requirementSummary(boost) takes the inductor current at the lowest input", () => {
    const spec = makeSpec({ topology: "boost", vin: { min: 3, nom: 4, max: 5.5 }, vout: 12, iout: 0.5, fsw: 1e6 });
    const r = requirementSummary(spec);
    // IL = Iout/(1 − D), D = 1 − Vin/Vo (Erickson & Maksimović ch. 2): 0.5·12/3 = 2 A at Vin 3 V.
    expect(r.inductorCurrent.vin).toBe(3);
    expect(r.inductorCurrent.value).toBeCloseTo(2, 12);
    expect(r.isatGuide).toBeCloseTo(1.2 * 2 * 1.2, 12);
    expect(r.srfMin).toBe(1e7);
  });
});
