/**
 * Engine against ngspice 39 transient simulations (netlists and committed figures in
 * test/fixtures/spice; `npm run verify:spice` re-simulates them). This test reads only the JSON,
 * so it runs without ngspice. Each case is fed to the engine with the simulation's measured vout
 * and iout, its driven switch and rectifier resistances and its measured rectifier drop.
 */
import { describe, expect, it } from "vitest";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { completePart } from "../../src/engine/partDefaults.ts";
import { evaluateCorner } from "../../src/engine/evaluateCorner.ts";
import type { CornerResult } from "../../src/engine/types.ts";
import { fixtureNames, loadFixture, type SpiceFixture } from "./fixture.ts";

/** Near-ideal switches and diode: the engine's piecewise-linear flux solution should be exact. */
const IDEAL_REL = 0.01;
/**
 * Cases with a winding resistance or a real rectifier drop. The engine takes those drops at the
 * average current (first order), so each ramp is straight, whereas in the simulation the slope
 * (V − R·i)/L changes by R·ΔI/|V| along it (about 1.3 % on the boost's on-ramp: 0.1 Ω·0.63 A/5 V).
 * The bowed ramp moves the segment means, and with them iavg and the peak, by about
 * ΔI·(R·ΔI/|V|)/12 ≈ 0.7 mA, 0.05 % of iavg. 0.5 % leaves ten times that for the rest of the
 * second-order terms, and still fails an engine that dropped the DCR (iavg would move about 2.5 %).
 */
const LOSSY_REL = 0.005;
/** Simulated DCM valleys are switch leakage (µA), not 0, and the boundary case is tuned to ≈ 0. */
const VALLEY_ABS_OF_PEAK = 0.01;
const NEAR_ZERO_OF_PEAK = 0.1;
/** Fractions of the period (idle, negative current), absolute. */
const FRACTION_ABS = 0.01;

/** A rectifier drop above this is a real drop, not the near-ideal diode's fraction of a millivolt. */
const REAL_DROP = 0.05;

function isLossy(f: SpiceFixture): boolean {
  return f.dcr > 0 || f.rectifierDrop > REAL_DROP;
}

function evaluate(f: SpiceFixture): CornerResult {
  const ambient = 25;
  const spec = makeSpec({
    topology: f.topology,
    rectifier: f.rectifier,
    vin: f.vin,
    vout: f.vout,
    iout: f.iout,
    fsw: f.fsw,
    switchResistance: f.switchResistance,
    switchDrop: 0,
    rectifierDrop: f.rectifierDrop,
    rectifierResistance: f.rectifierResistance,
    ambient,
  });
  // isatDrop 0.5 makes the knee Ik = Isat·((1 − x)/x)^(1/n) equal to Isat, so isat carries ik
  // directly; no heating current means no temperature rise, and dcrTemp = ambient keeps the DCR as simulated.
  const part = completePart({
    partNumber: f.case,
    inductance: f.inductance,
    dcrTyp: f.dcr,
    dcrMax: f.dcr,
    dcrTemp: ambient,
    isat: f.rollOff === null ? null : f.rollOff.ik,
    isatDrop: 0.5,
    rollOffExponent: f.rollOff === null ? 2 : f.rollOff.n,
    irms: null,
    tolerance: 0,
  });
  return evaluateCorner(spec, part, {
    vin: f.vin,
    iout: f.iout,
    vinCorner: "nom",
    ioutCorner: "max",
    inductanceCorner: "nom",
    inductance: f.inductance,
  });
}

function expectClose(what: string, engine: number, spice: number, tol: number): void {
  expect(Math.abs(engine - spice), `${what}: engine ${engine}, ngspice ${spice}, tolerance ±${tol.toPrecision(3)}`).toBeLessThanOrEqual(tol);
}

const names = fixtureNames();

describe("ngspice 39 transient fixtures (test/fixtures/spice)", () => {
  it("cover every topology, conduction mode, a lossy case and saturating inductors", () => {
    const fixtures = names.map(loadFixture);
    expect(fixtures.length).toBeGreaterThanOrEqual(9);
    for (const topology of ["buck", "boost", "buck-boost"] as const) {
      expect(fixtures.filter((f) => f.topology === topology && f.mode === "ccm").length, `${topology} ccm`).toBeGreaterThan(0);
      expect(fixtures.filter((f) => f.topology === topology && f.mode === "dcm").length, `${topology} dcm`).toBeGreaterThan(0);
    }
    for (const mode of ["bcm", "forced-continuous"] as const) expect(fixtures.some((f) => f.mode === mode), mode).toBe(true);
    expect(fixtures.some(isLossy)).toBe(true);
    expect(fixtures.some((f) => f.rollOff !== null)).toBe(true);
  });

  it.each(names)("%s was measured in periodic steady state", (name) => {
    const f = loadFixture(name);
    expect(f.source).toBe("ngspice 39 transient");
    // Same limits as verifySpice.ts: a run still settling misses them by orders of magnitude.
    expect(Math.abs(f.steadyState.chargeBalance)).toBeLessThanOrEqual(1e-4);
    expect(Math.abs(f.steadyState.fluxDrift)).toBeLessThanOrEqual(1e-5);
    expect(Math.abs(f.steadyState.voutDrift)).toBeLessThanOrEqual(1e-5);
  });

  it.each(names)("engine matches %s (ngspice 39 transient simulation)", (name) => {
    const f = loadFixture(name);
    const r = evaluate(f);
    const m = f.measured;
    const rel = isLossy(f) ? LOSSY_REL : IDEAL_REL;

    expect(r.unreachable).toBe(false);
    expect(r.beyondCurve).toBe(false);
    expect(r.mode).toBe(f.mode);
    expectClose("duty", r.duty, f.duty, rel * f.duty);
    expectClose("ipk", r.ipk, m.ipk, rel * Math.abs(m.ipk));
    const valleyTol = Math.abs(m.ivalley) < NEAR_ZERO_OF_PEAK * m.ipk ? VALLEY_ABS_OF_PEAK * m.ipk : rel * Math.abs(m.ivalley);
    expectClose("ivalley", r.ivalley, m.ivalley, valleyTol);
    expectClose("iavg", r.iavg, m.iavg, rel * Math.abs(m.iavg));
    expectClose("irms", r.irms, m.irms, rel * m.irms);
    expectClose("idle fraction", r.idle, m.idleFraction, FRACTION_ABS);
    expectClose("negative fraction", r.negativeFraction, m.negativeFraction, FRACTION_ABS);
  });
});
