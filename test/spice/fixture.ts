/**
 * Shape of the committed ngspice reference figures (test/fixtures/spice/*.json) and their loader.
 * Kept free of any ngspice dependency so the unit test can read fixtures on machines without it.
 */
import { readdirSync, readFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import type { Mode, Rectifier, Topology } from "../../src/engine/types.ts";

export const FIXTURE_DIR = resolve(dirname(fileURLToPath(import.meta.url)), "../fixtures/spice");

export interface MeasuredFigures {
  ipk: number;
  ivalley: number;
  iavg: number;
  irms: number;
  idleFraction: number;
  negativeFraction: number;
}

export interface SteadyStateEvidence {
  /** Length of the verification run from the periodic initial state. */
  periods: number;
  /** (buck: mean iL, others: mean rectifier current) − iout, relative to iout, over the measured period. */
  chargeBalance: number;
  /** Change of flux linkage over the measured period, relative to its swing. */
  fluxDrift: number;
  /** Change of the output capacitor voltage over the measured period, relative to vout. */
  voutDrift: number;
}

export interface SpiceFixture {
  case: string;
  netlist: string;
  source: string;
  topology: Topology;
  rectifier: Rectifier;
  /** Mode classified from the simulated waveform (see classifyMode in ngspice.ts). */
  mode: Mode;
  vin: number;
  /** Magnitude of the mean output voltage. */
  vout: number;
  iout: number;
  fsw: number;
  duty: number;
  inductance: number;
  rollOff: null | { n: number; ik: number };
  dcr: number;
  switchResistance: number;
  rectifierDrop: number;
  rectifierResistance: number;
  measured: MeasuredFigures;
  steadyState: SteadyStateEvidence;
  notes: string;
}

export function fixtureNames(): string[] {
  return readdirSync(FIXTURE_DIR)
    .filter((f) => f.endsWith(".cir"))
    .map((f) => f.slice(0, -4))
    .sort();
}

export function fixturePath(name: string, ext: "cir" | "json"): string {
  return join(FIXTURE_DIR, `${name}.${ext}`);
}

export function loadFixture(name: string): SpiceFixture {
  return JSON.parse(readFileSync(fixturePath(name, "json"), "utf8")) as SpiceFixture;
}
