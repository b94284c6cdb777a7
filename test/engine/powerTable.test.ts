import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { PowerTable, powerTable } from "../../src/engine/powerTable.ts";

// The reference is the runtime's own Math.pow (ECMAScript, a general-purpose library): the table
// must agree with it to a few parts in 1e13 wherever the thermal law can take it.
describe("PowerTable", () => {
  it("PowerTable.pow agrees with Math.pow within 2e-13 relative for exponents 0.3–2 and u over 280 decades", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.3, max: 2, noNaN: true }), fc.double({ min: -140, max: 140, noNaN: true }), (k, decade) => {
        const u = Math.pow(10, decade);
        const expected = Math.pow(u, k);
        const got = new PowerTable(k).pow(u);
        expect(Math.abs(got - expected) / expected).toBeLessThan(2e-13);
      }),
      { numRuns: 2000 },
    );
  });

  it("PowerTable.pow is exact at powers of two and at u = 1, where the mantissa is 1", () => {
    const t = new PowerTable(0.833);
    expect(t.pow(1)).toBe(1);
    expect(t.pow(8)).toBe(Math.pow(2, 3 * 0.833));
    expect(t.pow(0.25)).toBe(Math.pow(2, -2 * 0.833));
  });

  it("PowerTable.pow of zero, a subnormal, infinity and NaN follows Math.pow", () => {
    const t = new PowerTable(0.8);
    expect(t.pow(0)).toBe(0);
    expect(Math.abs(t.pow(5e-324) / Math.pow(5e-324, 0.8) - 1)).toBeLessThan(1e-13);
    expect(t.pow(Infinity)).toBe(Infinity);
    expect(t.pow(NaN)).toBeNaN();
  });

  it("PowerTable.pow is monotone across an interval boundary of its table", () => {
    const t = new PowerTable(0.833);
    const m = 1 + 37 / 512;
    expect(t.pow(m - 1e-12)).toBeLessThan(t.pow(m));
    expect(t.pow(m)).toBeLessThan(t.pow(m + 1e-12));
  });

  it("powerTable keeps the table of the last exponent and builds a new one when it changes", () => {
    const a = powerTable(0.833);
    expect(powerTable(0.833)).toBe(a);
    expect(powerTable(0.9).exponent).toBe(0.9);
  });
});
