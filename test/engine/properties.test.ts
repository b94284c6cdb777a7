import { describe, expect, it } from "vitest";
import fc from "fast-check";
import type { CornerResult, Part, Spec, Topology } from "../../src/engine/types.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { evaluateCorner } from "../../src/engine/evaluateCorner.ts";
import { waveformSamples, type WaveformSample } from "../../src/engine/waveformSamples.ts";
import { RollOffCurve } from "../../src/engine/fluxCurve.ts";
import { point } from "./helpers.ts";

// Property tests over random valid specs and parts (fast-check). The engine's figures come from
// the tabulated flux integrals; these checks integrate the drawn waveform i(t) numerically
// (trapezoid rule), an independent route to the same averages.

interface Case {
  spec: Spec;
  part: Part;
  vin: number;
  iout: number;
}

const caseArb = fc
  .record({
    topology: fc.constantFrom<Topology>("buck", "boost", "buck-boost"),
    synchronous: fc.boolean(),
    vout: fc.double({ min: 1, max: 48, noNaN: true }),
    ratio: fc.double({ min: 1.25, max: 5, noNaN: true }),
    fsw: fc.double({ min: 100e3, max: 2e6, noNaN: true }),
    inductance: fc.double({ min: 0.5e-6, max: 100e-6, noNaN: true }),
    iout: fc.double({ min: 0.005, max: 5, noNaN: true }),
    switchDrop: fc.double({ min: 0, max: 0.3, noNaN: true }),
    rectifierDrop: fc.double({ min: 0, max: 0.5, noNaN: true }),
    dcr: fc.double({ min: 0, max: 0.1, noNaN: true }),
    rollOff: fc.option(fc.record({ n: fc.double({ min: 1.5, max: 10, noNaN: true }), headroom: fc.double({ min: 1.5, max: 6, noNaN: true }) })),
  })
  .map((r): Case => {
    // Buck steps down by `ratio`; boost steps up; the inverting stage does either.
    const vin = r.topology === "buck" ? r.vout * r.ratio : r.topology === "boost" ? r.vout / r.ratio : r.vout * (r.ratio - 0.75);
    const spec = makeSpec({
      topology: r.topology,
      rectifier: r.synchronous ? "synchronous" : "diode",
      vin,
      vout: r.vout,
      iout: r.iout,
      fsw: r.fsw,
      switchDrop: r.switchDrop,
      rectifierDrop: r.rectifierDrop,
    });
    const part = completePart({
      partNumber: "PROP",
      inductance: r.inductance,
      tolerance: 0,
      dcrTyp: r.dcr,
      dcrTemp: 25,
      ...(r.rollOff === null ? {} : { isat: r.rollOff.headroom * r.iout * 3, isatDrop: 0.3, rollOffExponent: r.rollOff.n }),
    });
    return { spec, part, vin, iout: r.iout };
  });

function corner(c: Case, inductance = c.part.inductance): CornerResult {
  return evaluateCorner(c.spec, c.part, point(c.vin, c.iout, inductance));
}

/** ∫ i dt and ∫ i² dt over samples with t in [from, to], by the trapezoid rule. */
function integrate(samples: WaveformSample[], from: number, to: number): { q: number; q2: number } {
  let q = 0;
  let q2 = 0;
  for (let k = 1; k < samples.length; k++) {
    const a = samples[k - 1]!;
    const b = samples[k]!;
    if (a.t < from - 1e-15 || b.t > to + 1e-15) continue;
    const dt = b.t - a.t;
    q += ((a.i + b.i) / 2) * dt;
    q2 += ((a.i * a.i + b.i * b.i) / 2) * dt;
  }
  return { q, q2 };
}

const usable = (r: CornerResult) => !r.unreachable && !r.beyondCurve;
const RUNS = { numRuns: 150, seed: 20261201 };

describe("engine properties (fast-check)", () => {
  it("the load-current relation holds: buck mean iL = Iout; boost and inverting mean rectifier current = Iout", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const r = corner(c);
        fc.pre(usable(r));
        const ts = 1 / c.spec.fsw;
        const s = waveformSamples(c.spec, c.part, r, 1, 600);
        const onEnd = r.duty * ts;
        const delivered =
          c.spec.topology === "buck" ? integrate(s, 0, ts).q / ts : integrate(s, onEnd, onEnd + r.d2 * ts).q / ts;
        expect(Math.abs(delivered - c.iout)).toBeLessThanOrEqual(2e-3 * Math.max(c.iout, r.ripple));
        const whole = integrate(s, 0, ts);
        expect(Math.abs(whole.q / ts - r.iavg)).toBeLessThanOrEqual(2e-3 * Math.max(Math.abs(r.iavg), r.ripple));
        expect(Math.abs(Math.sqrt(whole.q2 / ts) - r.irms)).toBeLessThanOrEqual(2e-3 * Math.max(r.irms, r.ripple));
      }),
      RUNS,
    );
  });

  it("ripple falls as the inductance rises, at the same operating point", () => {
    fc.assert(
      fc.property(caseArb, fc.double({ min: 1.05, max: 3, noNaN: true }), (c, factor) => {
        const small = corner(c);
        const large = corner(c, c.part.inductance * factor);
        fc.pre(usable(small) && usable(large));
        expect(large.ripple).toBeLessThanOrEqual(small.ripple * (1 + 1e-9));
      }),
      RUNS,
    );
  });

  it("with constant L and a diode, the mode agrees with the critical load current (buck ΔI/2, boost and inverting (1 − D)·ΔI/2)", () => {
    fc.assert(
      fc.property(caseArb, (raw) => {
        const c: Case = { ...raw, spec: { ...raw.spec, rectifier: "diode" }, part: { ...raw.part, isat: null } };
        const r = corner(c);
        fc.pre(!r.unreachable);
        // The same spec with a synchronous rectifier stays continuous at any load and gives the CCM
        // duty and ripple at this load (Erickson & Maksimović ch. 2); the boundary is then
        // Iout,crit = ΔI/2 (buck) or (1 − D)·ΔI/2 (boost, inverting) (ch. 5, current form).
        const forced = evaluateCorner({ ...c.spec, rectifier: "synchronous" }, c.part, point(c.vin, c.iout, c.part.inductance));
        const critical = c.spec.topology === "buck" ? forced.ripple / 2 : ((1 - forced.duty) * forced.ripple) / 2;
        if (c.iout > critical * 1.05) expect(r.mode).toBe("ccm");
        else if (c.iout < critical * 0.9) expect(r.mode).toBe("dcm");
      }),
      RUNS,
    );
  });

  it("power balance: input power = output power + switch, rectifier and winding losses of the model", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const r = corner(c);
        fc.pre(usable(r));
        const ts = 1 / c.spec.fsw;
        const s = waveformSamples(c.spec, c.part, r, 1, 600);
        const on = integrate(s, 0, r.duty * ts).q / ts;
        const off = integrate(s, r.duty * ts, (r.duty + r.d2) * ts).q / ts;
        const il = r.iavg;
        const vSw = c.spec.switchDrop + c.spec.switchResistance * il;
        const vD = c.spec.rectifierDrop + c.spec.rectifierResistance * il;
        const rl = r.dcrHot ?? 0;
        // Input current: buck and inverting draw from the source while on; the boost always.
        const pin = c.spec.topology === "boost" ? c.vin * (on + off) : c.vin * on;
        const pout = c.spec.vout * c.iout;
        // First-order drops act at the average current, the winding drop RL·IL on every interval.
        const losses = vSw * on + vD * off + rl * il * (on + off);
        expect(Math.abs(pin - (pout + losses))).toBeLessThanOrEqual(3e-3 * pin + 1e-12);
      }),
      RUNS,
    );
  });

  it("saturation curves are monotone: L(i) falls with |i| and λ(i) rises", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1.2, max: 12, noNaN: true }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        fc.array(fc.double({ min: 0, max: 40, noNaN: true }), { minLength: 2, maxLength: 20 }),
        (n, ik, currents) => {
          const curve = new RollOffCurve(10e-6, ik, n);
          const sorted = [...currents].sort((a, b) => a - b);
          for (let k = 1; k < sorted.length; k++) {
            expect(curve.inductanceAt(sorted[k]!)).toBeLessThanOrEqual(curve.inductanceAt(sorted[k - 1]!));
            expect(curve.flux(sorted[k]!)).toBeGreaterThanOrEqual(curve.flux(sorted[k - 1]!));
          }
        },
      ),
      RUNS,
    );
  });
});
