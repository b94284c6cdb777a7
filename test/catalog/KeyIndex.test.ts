import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { KeyIndex } from "../../src/catalog/KeyIndex.ts";

describe("KeyIndex", () => {
  it("KeyIndex matches keys case-insensitively and keeps the last value", () => {
    const k = new KeyIndex();
    k.set("HV-DRS6030-4U7", 1);
    expect(k.get("hv-drs6030-4u7")).toBe(1);
    k.set("hv-drs6030-4U7", 2);
    expect(k.get("HV-DRS6030-4U7")).toBe(2);
    expect(k.size).toBe(1);
    expect(k.get("other")).toBeUndefined();
    k.set("µ-part", 3);
    expect(k.get("Μ-PART")).toBe(3); // String.prototype.toUpperCase folds µ to Greek capital mu
    k.set("ff-2", 4);
    expect(k.get("\ufb00-2")).toBe(4); // the ligature ﬀ upper-cases to "FF": both spellings meet in one slot
  });

  it("KeyIndex agrees with a Map over upper-cased keys, put returning the value it replaces (reference: the built-in Map)", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.string({ maxLength: 6 }), fc.nat()), { maxLength: 3000 }), (entries) => {
        const k = new KeyIndex();
        const m = new Map<string, number>();
        for (const [key, v] of entries) {
          expect(k.put(key, v)).toBe(m.get(key.toUpperCase()));
          m.set(key.toUpperCase(), v);
        }
        for (const [key] of entries) expect(k.get(key)).toBe(m.get(key.toUpperCase()));
      }),
      { numRuns: 50 },
    );
  });
});
