import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { rankParts } from "../../src/engine/rankParts.ts";
import { paretoFront } from "../../src/engine/paretoFront.ts";
import { rankOrder } from "../../src/engine/rankOrder.ts";
import { scoreParts } from "../../src/engine/scoreParts.ts";
import { DEFAULT_WEIGHTS } from "../../src/engine/specDefaults.ts";

const spec = makeSpec({ topology: "buck", vin: { min: 10.8, nom: 12, max: 13.2 }, vout: 3.3, iout: { min: 0.2, max: 3 }, fsw: 500e3 });
const base = { tolerance: 0.2, dcrTyp: 0.02, dcrMax: 0.024, isat: 7, irms: 5, srf: 40e6, length: 5e-3, width: 5e-3, height: 3e-3, price: 0.3 };

describe("rankParts", () => {
  it("rankParts puts passing parts first, then incomplete, then failing, ranks numbered from 1", () => {
    const parts = [
      completePart({ partNumber: "FAILS", inductance: 5.6e-6, ...base, isat: 2 }),
      completePart({ partNumber: "NODATA", inductance: 5.6e-6, ...base, srf: null }),
      completePart({ partNumber: "PASSES", inductance: 5.6e-6, ...base }),
    ];
    const results = rankParts(spec, parts);
    expect(results.map((r) => r.partNumber)).toEqual(["PASSES", "NODATA", "FAILS"]);
    expect(results.map((r) => r.rank)).toEqual([1, 2, 3]);
    expect(results[0]!.pass).toBe(true);
    expect(results[1]!.pass).toBe(false);
    expect(results[2]!.failures[0]).toMatch(/^saturation: /);
  });

  it("rankParts scores the cheaper, lower-loss part higher among equals", () => {
    const results = rankParts(spec, [
      completePart({ partNumber: "DEAR", inductance: 5.6e-6, ...base, price: 0.9, dcrMax: 0.03 }),
      completePart({ partNumber: "CHEAP", inductance: 5.6e-6, ...base, price: 0.2, dcrMax: 0.015 }),
    ]);
    expect(results[0]!.partNumber).toBe("CHEAP");
    expect(results[0]!.score).toBeGreaterThan(results[1]!.score);
  });
});

describe("scoreParts", () => {
  it("scoreParts gives 100 to a part best on every figure and 0 for missing figures", () => {
    const scores = scoreParts(
      { loss: [0.1, NaN], footprint: [1, NaN], height: [1, NaN], price: [1, NaN], margin: [0.5, NaN] },
      [1, 1],
      DEFAULT_WEIGHTS,
    );
    expect(scores[0]).toBeCloseTo(100, 10);
    expect(scores[1]).toBe(0);
  });
});

describe("paretoFront", () => {
  it("paretoFront flags exactly the undominated points of (loss, volume)", () => {
    const loss = [1, 2, 3, 2, 4, null];
    const volume = [5, 3, 1, 4, 0.5, 0.1];
    expect(paretoFront(loss, volume)).toEqual([true, true, true, false, true, false]);
  });

  it("paretoFront keeps both of two identical undominated points", () => {
    expect(paretoFront([1, 1, 2], [2, 2, 3])).toEqual([true, true, false]);
  });

  it("paretoFront agrees with the definition of dominance on random lists with ties and gaps", () => {
    // The definition checked pair by pair (O(n²)): on the front unless another point is at least
    // as good on both costs and better on one; a missing or non-finite cost is never on it.
    const cost = fc.oneof(fc.integer({ min: 0, max: 12 }), fc.double({ min: 0, max: 1e3, noNaN: true }), fc.constantFrom(null, NaN, Infinity));
    fc.assert(
      fc.property(fc.array(fc.tuple(cost, cost), { maxLength: 400 }), (points) => {
        const a = points.map((p) => p[0]);
        const b = points.map((p) => p[1]);
        const finite = (x: number | null): x is number => x !== null && Number.isFinite(x);
        const expected = points.map(([pa, pb], i) => {
          if (!finite(pa) || !finite(pb)) return false;
          return !points.some(([qa, qb], k) => k !== i && finite(qa) && finite(qb) && qa <= pa && qb <= pb && (qa < pa || qb < pb));
        });
        expect(paretoFront(a, b)).toEqual(expected);
      }),
      { numRuns: 300 },
    );
  });
});

describe("rankOrder", () => {
  it("rankOrder sorts by status then score (high first) with ties in list order, like a comparator would", () => {
    const status = ["fail", "pass", "incomplete", "pass", "pass"] as const;
    const score = [99, 50, 70, 80, 50];
    expect(Array.from(rankOrder(status, score))).toEqual([3, 1, 4, 2, 0]);
  });
});

describe("rankOrder among failing parts", () => {
  it("rankOrder puts failing parts with fewer failed checks first, whatever their score", () => {
    const status = ["fail", "fail", "fail"] as const;
    expect(Array.from(rankOrder(status, [90, 10, 50], [3, 1, 1]))).toEqual([2, 1, 0]);
  });

  it("rankOrder equals a comparator sort on status, failure class, score quantised to 1e-4 and list order", () => {
    // The definition, written as the comparator the radix sort replaces.
    const rank = { pass: 0, incomplete: 1, fail: 2 } as const;
    const part = fc.record({
      status: fc.constantFrom("pass", "incomplete", "fail" as const),
      failures: fc.integer({ min: 0, max: 20 }),
      score: fc.oneof(fc.double({ min: -5, max: 105, noNaN: true }), fc.constantFrom(NaN, 0, 100, 50.00004, 50.00006)),
    });
    fc.assert(
      fc.property(fc.array(part, { maxLength: 300 }), (parts) => {
        const quantised = (s: number) => (Number.isFinite(s) ? Math.min(2 ** 20 - 1, Math.max(0, Math.round((100 - s) * 1e4))) : 2 ** 20 - 1);
        const expected = parts
          .map((_, i) => i)
          .sort((a, b) => {
            const p = parts[a]!;
            const q = parts[b]!;
            return rank[p.status] - rank[q.status] || Math.min(15, p.failures) - Math.min(15, q.failures) || quantised(p.score) - quantised(q.score) || a - b;
          });
        const got = rankOrder(parts.map((p) => p.status), parts.map((p) => p.score), parts.map((p) => p.failures));
        expect(Array.from(got)).toEqual(expected);
      }),
      { numRuns: 300 },
    );
  });
});
