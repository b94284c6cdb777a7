/**
 * `npm run verify:spice` re-simulates every netlist in test/fixtures/spice with ngspice and fails,
 * naming case and figure, when a committed figure has moved beyond its tolerance or when the run
 * is not in periodic steady state. `--update` first re-finds the periodic initial state by shooting
 * (rewriting only the netlist's `.param vc0=… lam0=…` line) and then rewrites the JSON figures.
 * `--case name` restricts the run to one case (repeatable).
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { basename } from "node:path";
import { fixtureNames, fixturePath, type SpiceFixture } from "./fixture.ts";
import { extract, NGSPICE_MISSING, ngspiceAvailable, parseNetlist, runNgspice, shoot, withInitialState, type Extracted } from "./ngspice.ts";

/**
 * Same simulator, same netlist: figures reproduce to many digits on one machine; the tolerances
 * leave room for other builds and platforms of ngspice 39 while catching any real change.
 */
const REL = 1e-3;
/** Near-zero valleys (leakage in DCM, the tuned boundary case) are compared against the peak. */
const VALLEY_ABS_OF_PEAK = 5e-3;
const NEAR_ZERO_OF_PEAK = 0.1;
const FRACTION_ABS = 1e-3;
const DROP_ABS = 1e-4;

/** Steady-state evidence limits: a run that is still settling would fail these by orders of magnitude. */
const CHARGE_BALANCE_MAX = 1e-4;
const DRIFT_MAX = 1e-5;

interface Figure {
  name: string;
  committed: number;
  now: number;
  tol: number;
}

function figures(committed: SpiceFixture, now: SpiceFixture): Figure[] {
  const ipk = Math.abs(committed.measured.ipk);
  const rel = (name: string, a: number, b: number): Figure => ({ name, committed: a, now: b, tol: REL * Math.abs(a) });
  const abs = (name: string, a: number, b: number, tol: number): Figure => ({ name, committed: a, now: b, tol });
  const valleyTol = Math.abs(committed.measured.ivalley) < NEAR_ZERO_OF_PEAK * ipk ? VALLEY_ABS_OF_PEAK * ipk : REL * Math.abs(committed.measured.ivalley);
  return [
    rel("vout", committed.vout, now.vout),
    rel("iout", committed.iout, now.iout),
    abs("duty", committed.duty, now.duty, FRACTION_ABS),
    abs("rectifierDrop", committed.rectifierDrop, now.rectifierDrop, Math.max(DROP_ABS, REL * committed.rectifierDrop)),
    rel("ipk", committed.measured.ipk, now.measured.ipk),
    abs("ivalley", committed.measured.ivalley, now.measured.ivalley, valleyTol),
    rel("iavg", committed.measured.iavg, now.measured.iavg),
    rel("irms", committed.measured.irms, now.measured.irms),
    abs("idleFraction", committed.measured.idleFraction, now.measured.idleFraction, FRACTION_ABS),
    abs("negativeFraction", committed.measured.negativeFraction, now.measured.negativeFraction, FRACTION_ABS),
  ];
}

/** Rounds to 7 significant digits: far below every tolerance, and the JSON stays readable. */
function round(value: unknown): unknown {
  if (typeof value === "number") return value === 0 ? 0 : Number(value.toPrecision(7));
  if (Array.isArray(value)) return value.map(round);
  if (value !== null && typeof value === "object") return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, round(v)]));
  return value;
}

interface Outcome {
  name: string;
  fixture: SpiceFixture;
  problems: string[];
  seconds: number;
}

async function runCase(name: string, update: boolean, log: (msg: string) => void): Promise<Outcome> {
  const started = Date.now();
  const cirPath = fixturePath(name, "cir");
  let text = readFileSync(cirPath, "utf8");
  const problems: string[] = [];
  if (update) {
    const state = await shoot(text, (m) => log(`${name}:${m}`));
    const next = withInitialState(text, state.vc0, state.lam0);
    if (next !== text) writeFileSync(cirPath, next);
    text = next;
  }
  const info = parseNetlist(text);
  const wf = await runNgspice(text);
  const ex: Extracted = extract(wf, info);
  const fixture = round({ case: name, netlist: basename(cirPath), ...ex.fixture }) as SpiceFixture;

  const ss = ex.fixture.steadyState;
  if (Math.abs(ss.chargeBalance) > CHARGE_BALANCE_MAX) problems.push(`not in steady state: charge balance off by ${ss.chargeBalance.toExponential(2)} (limit ${CHARGE_BALANCE_MAX})`);
  if (Math.abs(ss.fluxDrift) > DRIFT_MAX) problems.push(`not in steady state: flux linkage drifts ${ss.fluxDrift.toExponential(2)} of its swing per period (limit ${DRIFT_MAX})`);
  if (Math.abs(ss.voutDrift) > DRIFT_MAX) problems.push(`not in steady state: vout drifts ${ss.voutDrift.toExponential(2)} per period (limit ${DRIFT_MAX})`);
  // Across the whole run from the initial state, not just the last period: catches a slow mode.
  const vc0 = info.params["vc0"] ?? Number.NaN;
  const runDrift = Math.abs(ex.endState.vc - vc0) / Math.abs(vc0);
  if (runDrift > 10 * DRIFT_MAX) problems.push(`not in steady state: vout moved ${runDrift.toExponential(2)} over the run (limit ${10 * DRIFT_MAX})`);
  if (ex.fixture.mode !== info.intendedMode) problems.push(`mode is ${ex.fixture.mode}, the netlist says it shows ${info.intendedMode}`);

  const jsonPath = fixturePath(name, "json");
  if (update) {
    writeFileSync(jsonPath, `${JSON.stringify(fixture, null, 2)}\n`);
  } else if (!existsSync(jsonPath)) {
    problems.push(`no committed figures (${basename(jsonPath)}); run with --update`);
  } else {
    const committed = JSON.parse(readFileSync(jsonPath, "utf8")) as SpiceFixture;
    for (const f of figures(committed, fixture)) {
      if (!(Math.abs(f.now - f.committed) <= f.tol)) {
        problems.push(`${f.name}: committed ${f.committed}, simulated ${f.now} (tolerance ±${f.tol.toPrecision(3)})`);
      }
    }
  }
  return { name, fixture, problems, seconds: (Date.now() - started) / 1000 };
}

function table(outcomes: Outcome[]): string {
  const head = ["case", "mode", "vout V", "iout A", "duty", "ipk A", "ivalley A", "iavg A", "irms A", "idle", "neg", "s", "status"];
  const rows = outcomes.map((o) => {
    const f = o.fixture;
    const m = f.measured;
    return [
      o.name,
      f.mode,
      f.vout.toFixed(4),
      f.iout.toFixed(4),
      f.duty.toFixed(4),
      m.ipk.toFixed(4),
      m.ivalley.toFixed(4),
      m.iavg.toFixed(4),
      m.irms.toFixed(4),
      m.idleFraction.toFixed(4),
      m.negativeFraction.toFixed(4),
      o.seconds.toFixed(1),
      o.problems.length === 0 ? "ok" : "FAIL",
    ];
  });
  const widths = head.map((h, k) => Math.max(h.length, ...rows.map((r) => (r[k] ?? "").length)));
  return [head, ...rows].map((r) => r.map((c, k) => c.padEnd(widths[k] ?? 0)).join("  ")).join("\n");
}

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const update = args.includes("--update");
  const only = args.flatMap((a, k) => (a === "--case" && args[k + 1] !== undefined ? [args[k + 1] as string] : []));
  if (!ngspiceAvailable()) {
    console.error(NGSPICE_MISSING);
    return 1;
  }
  const names = fixtureNames().filter((n) => only.length === 0 || only.includes(n));
  if (names.length === 0) {
    console.error(`no netlists matched in test/fixtures/spice (${only.join(", ")})`);
    return 1;
  }
  const started = Date.now();
  // Two cases at a time (the ngspice runner also caps processes at two), so each case's time is its own.
  const outcomes: Outcome[] = new Array<Outcome>(names.length);
  let next = 0;
  const worker = async (): Promise<void> => {
    for (let k = next++; k < names.length; k = next++) {
      const n = names[k] as string;
      outcomes[k] = await runCase(n, update, (m) => console.log(m)).catch(
        (e: unknown): Outcome => ({ name: n, fixture: placeholder(n), problems: [`simulation failed: ${e instanceof Error ? e.message : String(e)}`], seconds: 0 }),
      );
    }
  };
  await Promise.all([worker(), worker()]);
  console.log(table(outcomes));
  const failed = outcomes.filter((o) => o.problems.length > 0);
  for (const o of failed) for (const p of o.problems) console.error(`${o.name}: ${p}`);
  const what = update ? "updated" : "verified";
  console.log(`${outcomes.length - failed.length}/${outcomes.length} cases ${what} against ngspice in ${((Date.now() - started) / 1000).toFixed(1)} s`);
  return failed.length === 0 ? 0 : 1;
}

function placeholder(name: string): SpiceFixture {
  const nan = Number.NaN;
  return {
    case: name,
    netlist: `${name}.cir`,
    source: "",
    topology: "buck",
    rectifier: "diode",
    mode: "ccm",
    vin: nan,
    vout: nan,
    iout: nan,
    fsw: nan,
    duty: nan,
    inductance: nan,
    rollOff: null,
    dcr: nan,
    switchResistance: nan,
    rectifierDrop: nan,
    rectifierResistance: nan,
    measured: { ipk: nan, ivalley: nan, iavg: nan, irms: nan, idleFraction: nan, negativeFraction: nan },
    steadyState: { periods: 0, chargeBalance: nan, fluxDrift: nan, voutDrift: nan },
    notes: "",
  };
}

process.exitCode = await main();
