import { describe, expect, it } from "vitest";
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { runCli } from "../../src/cli/main.ts";

const SPEC = "sample-parts/demo-spec.json";
const PARTS = "sample-parts/demo-parts.csv";

function run(args: string[]): { code: number; out: string; err: string } {
  let out = "";
  let err = "";
  const code = runCli(args, (t) => (out += t), (t) => (err += t));
  return { code, out, err };
}

const tmp = mkdtempSync(join(tmpdir(), "coilsift-cli-"));
function file(name: string, text: string): string {
  const path = join(tmp, name);
  writeFileSync(path, text);
  return path;
}

describe("cli parse", () => {
  it("parse --json prints parts in SI, rejected rows and the mapping (DESIGN.md contract)", () => {
    const r = run(["parse", PARTS, "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(Object.keys(j)).toEqual(expect.arrayContaining(["parts", "rejected", "mapping"]));
    const p = j.parts[0];
    for (const key of ["partNumber", "inductance", "tolerance", "dcrTyp", "dcrMax", "isat", "irms", "srf", "length", "width", "height", "price", "maker", "series", "material", "isatDrop", "rollOffExponent"]) {
      expect(p).toHaveProperty(key);
    }
    expect(p.inductance).toBeLessThan(1e-3);
    expect(p.length).toBeLessThan(0.1);
  });

  it("parse reports a bad row with its reason and keeps the good ones", () => {
    const path = file("bad.csv", "Part Number,Inductance (uH),Isat (A)\nGOOD-1,4.7,3\nBAD-1,abc,3\nGOOD-2,10,2\n");
    const j = JSON.parse(run(["parse", path, "--json"]).out);
    expect(j.parts.map((p: { partNumber: string }) => p.partNumber)).toEqual(["GOOD-1", "GOOD-2"]);
    expect(j.rejected).toHaveLength(1);
    expect(j.rejected[0].row).toBe(3);
    expect(j.rejected[0].reason).toMatch(/abc/);
  });
});

describe("cli rank", () => {
  it("rank --json returns results in rank order with the corner fields of the contract", () => {
    const r = run(["rank", "--spec", SPEC, "--parts", PARTS, "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.results.length).toBeGreaterThan(100);
    expect(j.results.map((x: { rank: number }) => x.rank)).toEqual(j.results.map((_: unknown, i: number) => i + 1));
    const first = j.results[0];
    expect(first.pass).toBe(true);
    for (const key of ["partNumber", "rank", "pass", "failures", "score", "worst", "corners"]) expect(first).toHaveProperty(key);
    expect(first.corners).toHaveLength(18);
    for (const key of ["vin", "iout", "inductance", "mode", "duty", "ipk", "ivalley", "iavg", "irms", "ripple", "dcrLoss", "coreLoss", "tempRise"]) {
      expect(first.corners[0]).toHaveProperty(key);
    }
    expect(first.corners[0].coreLoss).toBeNull();
    const failing = j.results.find((x: { pass: boolean }) => !x.pass);
    expect(failing.failures[0]).toMatch(/Vin [\d.]+ V, Iout [\d.]+ A/);
  });

  it("rank with two lists flags a duplicate part number and keeps the later list's part", () => {
    const a = file("a.csv", "Part Number,Inductance (uH),DCR (mOhm)\nDUP-1,4.7,20\n");
    const b = file("b.csv", "Part Number,Inductance (uH),DCR (mOhm)\nDUP-1,6.8,25\n");
    const j = JSON.parse(run(["rank", "--spec", SPEC, "--parts", a, "--parts", b, "--json"]).out);
    expect(j.results).toHaveLength(1);
    expect(j.duplicates[0].partNumber).toBe("DUP-1");
    expect(j.results[0].corners.find((c: { inductanceCorner: string }) => c.inductanceCorner === "nom").inductance).toBeCloseTo(6.8e-6, 12);
  });

  it("rank refuses an impossible spec with exit 2 and a one-line message naming the file and key", () => {
    const spec = file("spec.json", JSON.stringify({ topology: "buck", vin: 3, vout: 5, iout: 1, fsw: 1e5 }));
    const r = run(["rank", "--spec", spec, "--parts", PARTS]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/spec\.json: vout: /);
    expect(r.err.trim().split("\n")).toHaveLength(1);
  });

  it("rank refuses unknown spec keys naming them", () => {
    const spec = file("spec2.json", JSON.stringify({ topology: "buck", vin: 12, vout: 5, iout: 1, fsw: 1e5, fws: 3 }));
    expect(run(["rank", "--spec", spec, "--parts", PARTS]).err).toMatch(/fws: unknown key/);
  });
});

describe("cli waveform", () => {
  it("waveform --json gives samples over at least one period and the solved corner", () => {
    const r = run(["waveform", "--spec", SPEC, "--parts", PARTS, "--part", "HV-DRS12060-6U8", "--vin", "13.2", "--iout", "0.2", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    const period = 1 / 500e3;
    expect(j.samples.at(-1).t).toBeGreaterThanOrEqual(period);
    expect(j.corner.vin).toBe(13.2);
    expect(j.corner.mode).toBe("dcm");
    expect(Math.max(...j.samples.map((s: { i: number }) => s.i))).toBeCloseTo(j.corner.ipk, 9);
  });

  it("waveform names an unknown part", () => {
    const r = run(["waveform", "--spec", SPEC, "--parts", PARTS, "--part", "NOPE"]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/NOPE/);
  });
});

describe("cli as a process", () => {
  it("npm run --silent cli -- rank prints JSON on stdout and exits 0; a missing file exits 2 with one stderr line", () => {
    const out = execFileSync("node", ["--import", "tsx", "src/cli/main.ts", "rank", "--spec", SPEC, "--parts", PARTS, "--json"], { encoding: "utf8", maxBuffer: 1 << 28 });
    expect(JSON.parse(out).results.length).toBeGreaterThan(0);
    const bad = spawnSync("node", ["--import", "tsx", "src/cli/main.ts", "parse", "missing.csv"], { encoding: "utf8" });
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim()).toMatch(/^coilsift: missing\.csv: /);
  });
});
