/**
 * Runs the ngspice reference netlists (test/fixtures/spice/*.cir) and turns the last simulated
 * period into the figures the engine is compared with. Conventions every netlist follows:
 *  - header comments `* topology: …`, `* rectifier: …`, `* mode: …` (the mode the case is meant
 *    to show) and `* notes: …`;
 *  - literal `.param` values for vin, fsw, duty, l0, rload, ron, roff, and where used dcr, ik, vdrop;
 *  - the periodic initial state as `.param vc0=… lam0=…` (output capacitor voltage and flux linkage),
 *    applied with `uic`;
 *  - one `tran tstep tstop tstart tmax uic` line whose saved window ends on a period boundary;
 *  - `wrdata fixture.dat` of v(gate), i(vl) (inductor current), v(lam), v(out), i(vio) (load current),
 *    i(vrs) (rectifier current, positive when conducting forward) and vfwd (rectifier forward voltage).
 */
import { spawn, spawnSync } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { availableParallelism, tmpdir } from "node:os";
import { join } from "node:path";
import type { Mode, Rectifier, Topology } from "../../src/engine/types.ts";
import type { MeasuredFigures, SpiceFixture, SteadyStateEvidence } from "./fixture.ts";

export const SOURCE = "ngspice 39 transient";
export const NGSPICE_MISSING = "ngspice was not found on PATH: install it with apt-get install -y ngspice";

/** Classification band, same idea as the engine's BCM test: valley within 1 % of the ripple of zero. */
export const BCM_BAND = 0.01;

export interface NetlistInfo {
  topology: Topology;
  rectifier: Rectifier;
  intendedMode: Mode;
  notes: string;
  params: Record<string, number>;
  tran: { tstep: number; tstop: number; tstart: number; tmax: number };
}

export type Waveform = Map<string, Float64Array>;

const SUFFIX: [RegExp, number][] = [
  [/meg$/i, 1e6],
  [/mil$/i, 25.4e-6],
  [/t$/i, 1e12],
  [/g$/i, 1e9],
  [/k$/i, 1e3],
  [/m$/i, 1e-3],
  [/u$/i, 1e-6],
  [/n$/i, 1e-9],
  [/p$/i, 1e-12],
  [/f$/i, 1e-15],
];

/** SPICE number with an optional scale suffix ("4.7u", "10meg"); NaN when it is an expression. */
export function parseSpiceNumber(text: string): number {
  const m = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)([a-z]*)$/i.exec(text.trim());
  if (m === null) return Number.NaN;
  const mantissa = Number(m[1]);
  const suffix = m[2] ?? "";
  if (suffix === "") return mantissa;
  for (const [re, scale] of SUFFIX) if (re.test(suffix)) return mantissa * scale;
  return Number.NaN;
}

function headerField(text: string, key: string): string[] {
  const re = new RegExp(`^\\*\\s*${key}:\\s*(.*)$`, "gim");
  return [...text.matchAll(re)].map((m) => (m[1] ?? "").trim());
}

export function parseNetlist(text: string): NetlistInfo {
  const params: Record<string, number> = {};
  for (const line of text.split(/\r?\n/)) {
    if (!/^\.param\s/i.test(line)) continue;
    for (const m of line.matchAll(/(\w+)\s*=\s*([^\s{}]+)(?=\s|$)/g)) {
      const value = parseSpiceNumber(m[2] ?? "");
      if (Number.isFinite(value)) params[(m[1] ?? "").toLowerCase()] = value;
    }
  }
  const tranMatch = /^\s*tran\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s+uic\s*$/im.exec(text);
  if (tranMatch === null) throw new Error("netlist has no `tran tstep tstop tstart tmax uic` line");
  const [tstep, tstop, tstart, tmax] = tranMatch.slice(1, 5).map((s) => parseSpiceNumber(s ?? ""));
  const topology = headerField(text, "topology")[0];
  const rectifier = headerField(text, "rectifier")[0];
  const intendedMode = headerField(text, "mode")[0];
  if (topology !== "buck" && topology !== "boost" && topology !== "buck-boost") throw new Error(`bad topology header: ${topology}`);
  if (rectifier !== "diode" && rectifier !== "synchronous") throw new Error(`bad rectifier header: ${rectifier}`);
  if (intendedMode !== "ccm" && intendedMode !== "bcm" && intendedMode !== "dcm" && intendedMode !== "forced-continuous") {
    throw new Error(`bad mode header: ${intendedMode}`);
  }
  for (const key of ["vin", "fsw", "duty", "l0", "rload", "ron", "roff", "vc0", "lam0"]) {
    if (params[key] === undefined) throw new Error(`netlist lacks a literal .param ${key}`);
  }
  return {
    topology,
    rectifier,
    intendedMode,
    notes: headerField(text, "notes").join(" "),
    params,
    tran: { tstep: tstep ?? Number.NaN, tstop: tstop ?? Number.NaN, tstart: tstart ?? Number.NaN, tmax: tmax ?? Number.NaN },
  };
}

function param(info: NetlistInfo, key: string): number {
  const v = info.params[key];
  if (v === undefined) throw new Error(`missing .param ${key}`);
  return v;
}

/** Replaces the periodic-state parameters; 12 significant digits keep the Newton result intact. */
export function withInitialState(text: string, vc0: number, lam0: number): string {
  const line = `.param vc0=${vc0.toPrecision(12)} lam0=${lam0.toPrecision(12)}`;
  const out = text.replace(/^\.param\s+vc0=\S+\s+lam0=\S+\s*$/im, line);
  if (out === text && !text.includes(line)) throw new Error("netlist lacks a `.param vc0=… lam0=…` line");
  return out;
}

function withTran(text: string, tstop: number, tstart: number, info: NetlistInfo): string {
  return text.replace(/^(\s*)tran\s+.*uic\s*$/im, `$1tran ${info.tran.tstep} ${tstop} ${tstart} ${info.tran.tmax} uic`);
}

export function ngspiceAvailable(): boolean {
  const r = spawnSync("ngspice", ["-v"], { encoding: "utf8" });
  return r.error === undefined && r.status === 0;
}

// Two cores on the target machines: more parallel runs only thrash.
let slots = Math.max(1, Math.min(2, availableParallelism()));
const waiting: (() => void)[] = [];
async function acquire(): Promise<void> {
  if (slots > 0) {
    slots--;
    return;
  }
  await new Promise<void>((resolve) => waiting.push(resolve));
}
function release(): void {
  const next = waiting.shift();
  if (next !== undefined) next();
  else slots++;
}

function parseWrdata(text: string): Waveform {
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== "");
  const header = (lines[0] ?? "").trim().split(/\s+/);
  const cols = header.map(() => [] as number[]);
  for (const line of lines.slice(1)) {
    const fields = line.trim().split(/\s+/);
    fields.forEach((f, k) => cols[k]?.push(Number(f)));
  }
  const wf: Waveform = new Map();
  header.forEach((name, k) => wf.set(name.toLowerCase(), Float64Array.from(cols[k] ?? [])));
  return wf;
}

/** Runs one netlist text in a scratch directory and returns the vectors it wrote. */
export async function runNgspice(text: string): Promise<Waveform> {
  await acquire();
  const dir = await mkdtemp(join(tmpdir(), "coilsift-spice-"));
  try {
    await writeFile(join(dir, "case.cir"), text);
    const { code, output } = await new Promise<{ code: number | null; output: string }>((resolve, reject) => {
      const child = spawn("ngspice", ["-b", "case.cir"], { cwd: dir, stdio: ["ignore", "pipe", "pipe"] });
      let output = "";
      child.stdout.on("data", (d: Buffer) => (output += d.toString()));
      child.stderr.on("data", (d: Buffer) => (output += d.toString()));
      child.on("error", reject);
      child.on("close", (c) => resolve({ code: c, output }));
    });
    if (code !== 0) throw new Error(`ngspice exited with ${String(code)}:\n${output.split("\n").slice(-15).join("\n")}`);
    return parseWrdata(await readFile(join(dir, "fixture.dat"), "utf8"));
  } finally {
    await rm(dir, { recursive: true, force: true });
    release();
  }
}

function vec(wf: Waveform, name: string): Float64Array {
  const v = wf.get(name);
  if (v === undefined) throw new Error(`ngspice output lacks ${name} (has ${[...wf.keys()].join(", ")})`);
  return v;
}

function last(a: Float64Array): number {
  const v = a[a.length - 1];
  if (v === undefined) throw new Error("empty vector");
  return v;
}

/** One period of samples, ending at the last saved time point. */
interface Period {
  t: Float64Array;
  span: number;
  at(name: string): Float64Array;
}

function lastPeriod(wf: Waveform, ts: number): Period {
  const time = vec(wf, "time");
  const tEnd = last(time);
  // The saved window starts on a period boundary; the slack only absorbs round-off in tstart.
  let k0 = time.findIndex((t) => t >= tEnd - ts * (1 + 1e-9));
  if (k0 < 0) k0 = 0;
  const t = time.subarray(k0);
  const span = tEnd - (t[0] ?? tEnd);
  if (Math.abs(span - ts) > 1e-6 * ts) throw new Error(`saved window is ${span} s, expected one period of ${ts} s`);
  return { t, span, at: (name) => vec(wf, name).subarray(k0) };
}

/** Trapezoidal mean: exact for the piecewise-linear current between time points. */
function mean(p: Period, y: Float64Array): number {
  let s = 0;
  for (let k = 1; k < p.t.length; k++) s += 0.5 * ((y[k] ?? 0) + (y[k - 1] ?? 0)) * ((p.t[k] ?? 0) - (p.t[k - 1] ?? 0));
  return s / p.span;
}

/** RMS with the exact integral of a linear segment, Σ dt·(a² + ab + b²)/3. */
function rms(p: Period, y: Float64Array): number {
  let s = 0;
  for (let k = 1; k < p.t.length; k++) {
    const a = y[k - 1] ?? 0;
    const b = y[k] ?? 0;
    s += ((a * a + a * b + b * b) / 3) * ((p.t[k] ?? 0) - (p.t[k - 1] ?? 0));
  }
  return Math.sqrt(s / p.span);
}

/** Fraction of the period with y below level, interpolating linearly inside each step. */
function fractionBelow(p: Period, y: Float64Array, level: number): number {
  let s = 0;
  for (let k = 1; k < p.t.length; k++) {
    const a = y[k - 1] ?? 0;
    const b = y[k] ?? 0;
    const dt = (p.t[k] ?? 0) - (p.t[k - 1] ?? 0);
    if (a < level && b < level) s += dt;
    else if (a < level || b < level) s += (dt * (level - Math.min(a, b))) / Math.abs(b - a);
  }
  return s / p.span;
}

function max(a: Float64Array): number {
  return a.reduce((m, v) => Math.max(m, v), -Infinity);
}
function min(a: Float64Array): number {
  return a.reduce((m, v) => Math.min(m, v), Infinity);
}

export function classifyMode(rectifier: Rectifier, m: MeasuredFigures): Mode {
  const ripple = m.ipk - m.ivalley;
  if (m.idleFraction > BCM_BAND) return "dcm";
  if (Math.abs(m.ivalley) <= BCM_BAND * ripple) return "bcm";
  if (rectifier === "synchronous" && m.ivalley < 0) return "forced-continuous";
  return "ccm";
}

export interface Extracted {
  fixture: Omit<SpiceFixture, "case" | "netlist">;
  /** End-of-run state, for the periodicity check against the netlist's initial state. */
  endState: { vc: number; lam: number };
}

/** Switch threshold used by every netlist's switch model (0.45 of the 1 V gate swing, REFERENCES.md §9). */
const GATE_THRESHOLD = 0.45;

export function extract(wf: Waveform, info: NetlistInfo): Extracted {
  const ts = 1 / param(info, "fsw");
  const p = lastPeriod(wf, ts);
  const il = p.at("i(vl)");
  const lam = p.at("v(lam)");
  const vout = p.at("v(out)");
  const iload = p.at("i(vio)");
  const irect = p.at("i(vrs)");
  const vfwd = p.at("vfwd");
  const gate = p.at("v(gate)");

  const ipk = max(il);
  const ivalley = min(il);
  // Time inside a band |i| < ε is idle + k·ε, k from the ramps crossing the band; two band widths
  // remove the ramp part (Richardson), so a current that only passes through zero gives 0. Off-state
  // leakage through the 10 MΩ switch is about a µA, well inside ε = 2e-5 of the peak.
  const idleLevel = 2e-5 * ipk;
  const band = (eps: number): number => fractionBelow(p, il, eps) - fractionBelow(p, il, -eps);
  const idleFraction = ivalley < idleLevel ? Math.max(0, 2 * band(idleLevel) - band(2 * idleLevel)) : 0;
  const measured: MeasuredFigures = {
    ipk,
    ivalley,
    iavg: mean(p, il),
    irms: rms(p, il),
    idleFraction,
    negativeFraction: fractionBelow(p, il, 0),
  };
  const voutMean = Math.abs(mean(p, vout));
  const iout = Math.abs(mean(p, iload));
  const duty = 1 - fractionBelow(p, gate, GATE_THRESHOLD);

  let rectifierDrop = 0;
  if (info.rectifier === "diode") {
    // Volt-seconds are what the inductor sees, so the equivalent fixed drop is the time average
    // of the forward voltage over the conduction interval.
    const conducting = 1e-3 * ipk;
    let s = 0;
    let span = 0;
    for (let k = 1; k < p.t.length; k++) {
      if ((irect[k] ?? 0) > conducting && (irect[k - 1] ?? 0) > conducting) {
        const dt = (p.t[k] ?? 0) - (p.t[k - 1] ?? 0);
        s += 0.5 * ((vfwd[k] ?? 0) + (vfwd[k - 1] ?? 0)) * dt;
        span += dt;
      }
    }
    rectifierDrop = span > 0 ? s / span : 0;
  }

  const fed = info.topology === "buck" ? measured.iavg : mean(p, irect);
  const steadyState: SteadyStateEvidence = {
    periods: Math.round(info.tran.tstop / ts),
    chargeBalance: (fed - iout) / iout,
    fluxDrift: (last(lam) - (lam[0] ?? 0)) / (max(lam) - min(lam)),
    voutDrift: (last(vout) - (vout[0] ?? 0)) / voutMean,
  };

  const ik = info.params["ik"];
  const ron = param(info, "ron");
  const mode = classifyMode(info.rectifier, measured);
  return {
    fixture: {
      source: SOURCE,
      topology: info.topology,
      rectifier: info.rectifier,
      mode,
      vin: param(info, "vin"),
      vout: voutMean,
      iout,
      fsw: param(info, "fsw"),
      duty,
      inductance: param(info, "l0"),
      rollOff: ik === undefined ? null : { n: 2, ik },
      dcr: info.params["dcr"] ?? 0,
      switchResistance: ron,
      rectifierDrop,
      rectifierResistance: info.rectifier === "synchronous" ? ron : 0,
      measured,
      steadyState,
      notes: info.notes,
    },
    endState: { vc: last(vec(wf, "v(out)")), lam: last(vec(wf, "v(lam)")) },
  };
}

/**
 * Periodic steady state by shooting: Newton on x ↦ P(x) − x, where P is the map of the state
 * (output capacitor voltage, flux linkage) over one period. A plain long run would need many
 * output-filter time constants (milliseconds) and can look settled while the mean current is
 * still off (REFERENCES.md §9); Newton converges in a few one-period runs.
 */
export async function shoot(text: string, log: (msg: string) => void = () => {}): Promise<{ vc0: number; lam0: number; iterations: number }> {
  const info = parseNetlist(text);
  const ts = 1 / param(info, "fsw");
  const oneperiod = withTran(text, ts, 0, info);
  const map = async (vc: number, lam: number): Promise<{ vc: number; lam: number; swing: number }> => {
    const wf = await runNgspice(withInitialState(oneperiod, vc, lam));
    const l = vec(wf, "v(lam)");
    return { vc: last(vec(wf, "v(out)")), lam: last(l), swing: max(l) - min(l) };
  };
  let vc = param(info, "vc0");
  let lam = param(info, "lam0");
  for (let it = 1; it <= 8; it++) {
    const base = await map(vc, lam);
    const dv = 1e-4 * Math.abs(vc);
    const dl = 1e-4 * (base.swing + Math.abs(lam));
    const [pv, pl] = await Promise.all([map(vc + dv, lam), map(vc, lam + dl)]);
    const f = [base.vc - vc, base.lam - lam];
    // Jacobian of P − I by forward differences; the map is close to linear, so this is ample.
    const a = (pv.vc - base.vc) / dv - 1;
    const b = (pl.vc - base.vc) / dl;
    const c = (pv.lam - base.lam) / dv;
    const d = (pl.lam - base.lam) / dl - 1;
    const det = a * d - b * c;
    const stepV = -(d * (f[0] ?? 0) - b * (f[1] ?? 0)) / det;
    const stepL = -(-c * (f[0] ?? 0) + a * (f[1] ?? 0)) / det;
    vc += stepV;
    lam += stepL;
    log(`  shoot ${it}: residual vc ${(f[0] ?? 0).toExponential(2)} V, lam ${(f[1] ?? 0).toExponential(2)} V·s; step ${stepV.toExponential(2)} V, ${stepL.toExponential(2)} V·s`);
    // 0.1 ppm of the state: far below any tolerance, and above the noise that the slow output mode
    // (P − I nearly singular at light load) amplifies from the 13-digit ngspice output.
    if (Math.abs(stepV) < 1e-7 * Math.abs(vc) && Math.abs(stepL) < 1e-7 * base.swing) return { vc0: vc, lam0: lam, iterations: it };
  }
  throw new Error("shooting did not converge in 8 Newton steps");
}
