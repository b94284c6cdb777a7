import { describe, expect, it } from "vitest";
import { mkdtempSync, readFileSync, writeFileSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { runCli } from "../../src/cli/main.ts";
import { exportReport } from "../../src/report/exportReport.ts";
import { resultsCsv } from "../../src/report/resultsCsv.ts";
import { loadWorkspaceParts } from "../../src/report/loadWorkspaceParts.ts";
import { rankParts } from "../../src/engine/rankParts.ts";
import { saveProject } from "../../src/state/projectFile.ts";
import type { Workspace } from "../../src/state/workspace.ts";
import { DEMO_NAME, DEMO_PARTS_FILE, DEMO_SHORTLIST, DEMO_SPEC_FILE, FIXED_TIME, HOSTILE_LIST, demoWorkspace, withoutTimestamp } from "./fixtures.ts";

function run(args: string[]): { code: number; out: string; err: string } {
  let out = "";
  let err = "";
  const code = runCli(args, (t) => (out += t), (t) => (err += t));
  return { code, out, err };
}

const tmp = mkdtempSync(join(tmpdir(), "coilsift-report-"));
const path = (name: string) => join(tmp, name);

function demoProject(): Workspace {
  return {
    ...demoWorkspace(),
    lists: demoWorkspace().lists.map((l) => ({ ...l, mapping: [...l.mapping], seriesSaturation: { ...l.seriesSaturation } })),
    shortlist: [...DEMO_SHORTLIST],
    view: {
      screen: "compare",
      selectedPart: null,
      rankingSort: null,
      rankingFilter: { passOnly: false, text: "", maker: null, material: null },
      cautionsAcknowledged: true,
    },
  };
}

const reportArgs = ["report", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--shortlist", DEMO_SHORTLIST.join(","), "--name", DEMO_NAME];

describe("cli report", () => {
  it("report writes the same HTML as the browser's exportReport for the same inputs", () => {
    const r = run([...reportArgs, "--out", path("a.html"), "--generated-at", FIXED_TIME]);
    expect(r.code).toBe(0);
    expect(r.out).toContain("308 parts considered, 3 shortlisted");
    const browser = exportReport(demoWorkspace(), { generatedAt: FIXED_TIME }).html;
    expect(readFileSync(path("a.html"), "utf8")).toBe(browser);
  });

  it("report output differs from the browser's only in the timestamp when the times differ", () => {
    expect(run([...reportArgs, "--out", path("b.html")]).code).toBe(0);
    const cli = readFileSync(path("b.html"), "utf8");
    const browser = exportReport(demoWorkspace(), { generatedAt: "2001-01-01T00:00:00Z" }).html;
    expect(cli).not.toBe(browser);
    expect(withoutTimestamp(cli)).toBe(withoutTimestamp(browser));
  });

  it("report --project writes the same report as --spec/--parts/--shortlist", () => {
    writeFileSync(path("demo.coilsift.json"), saveProject(demoProject()));
    const r = run(["report", "--project", path("demo.coilsift.json"), "--out", path("c.html"), "--generated-at", FIXED_TIME]);
    expect(r.code).toBe(0);
    expect(readFileSync(path("c.html"), "utf8")).toBe(exportReport(demoWorkspace(), { generatedAt: FIXED_TIME }).html);
  });

  it("report refuses a shortlisted part number that is in no list, with exit 2 and no file written", () => {
    const r = run(["report", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--shortlist", "HV-DRS12060-6U8,NO-SUCH-PART", "--out", path("d.html")]);
    expect(r.code).toBe(2);
    expect(r.err).toBe('coilsift: --shortlist: "NO-SUCH-PART" is in none of the part lists');
    expect(existsSync(path("d.html"))).toBe(false);
  });

  it("report names what is missing or wrong in one line", () => {
    const cases: [string[], RegExp][] = [
      [["report", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--shortlist", "X"], /--out <report.html> is required/],
      [["report", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--out", path("e.html")], /--shortlist <pn,pn,…> is required/],
      [["report", "--parts", DEMO_PARTS_FILE, "--shortlist", "X", "--out", path("e.html")], /--spec <spec.json> is required/],
      [[...reportArgs, "--out", path("e.html"), "--generated-at", "soon"], /--generated-at "soon" is not a date/],
      [["report", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--shortlist", "a,b,c,d,e,f,g", "--out", path("e.html")], /at most 6/],
      [["report", "--spec", DEMO_SPEC_FILE, "--parts", "no/such.csv", "--shortlist", "X", "--out", path("e.html")], /no\/such\.csv: cannot read the part list/],
      [[...reportArgs, "--out", join(tmp, "no-dir", "f.html")], /cannot write the report/],
      [["report", "--project", path("demo.coilsift.json"), "--spec", DEMO_SPEC_FILE, "--out", path("e.html")], /drop --spec/],
    ];
    for (const [args, message] of cases) {
      const r = run(args);
      expect(r.code, args.join(" ")).toBe(2);
      expect(r.err).toMatch(message);
      expect(r.err.trim().split("\n")).toHaveLength(1);
    }
  });

  it("report --project refuses a damaged project file, naming the file", () => {
    writeFileSync(path("broken.json"), '{"format": "coilsift-project", "version": 1, "workspace": {');
    const r = run(["report", "--project", path("broken.json"), "--out", path("g.html")]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${path("broken.json")}: not a Coilsift project file: the file is not JSON`);
    writeFileSync(path("newer.json"), JSON.stringify({ format: "coilsift-project", version: 7 }));
    expect(run(["rank", "--project", path("newer.json")]).err).toMatch(/newer Coilsift \(project format version 7\)/);
  });
});

describe("cli rank --csv and --project", () => {
  it("rank --csv prints exactly the CSV of the browser's export", () => {
    const r = run(["rank", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--csv"]);
    expect(r.code).toBe(0);
    const ws = demoWorkspace();
    const loaded = loadWorkspaceParts(ws);
    expect(r.out).toBe(resultsCsv(ws.spec, rankParts(ws.spec, loaded.parts), loaded.parts));
    expect(r.out.split("\r\n")).toHaveLength(loaded.parts.length + 2);
  });

  it("rank --project gives the same results as --spec/--parts", () => {
    writeFileSync(path("demo2.coilsift.json"), saveProject(demoProject()));
    const fromProject = JSON.parse(run(["rank", "--project", path("demo2.coilsift.json"), "--json"]).out);
    const fromFiles = JSON.parse(run(["rank", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--json"]).out);
    expect(fromProject.results).toEqual(fromFiles.results);
    expect(fromProject.spec).toEqual(fromFiles.spec);
    expect(run(["rank", "--project", path("demo2.coilsift.json"), "--csv"]).out).toBe(run(["rank", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--csv"]).out);
  });

  it("rank --project reports rejected rows with the list they came from", () => {
    const ws = { ...demoProject(), lists: [{ id: "h", name: "hostile.csv", text: HOSTILE_LIST, mapping: [], seriesSaturation: {}, addedAt: FIXED_TIME }], shortlist: [] };
    writeFileSync(path("hostile.coilsift.json"), saveProject(ws));
    const j = JSON.parse(run(["rank", "--project", path("hostile.coilsift.json"), "--json"]).out);
    expect(j.rejected).toEqual([expect.objectContaining({ file: "hostile.csv", row: 4, field: "inductance" })]);
  });

  it("rank refuses --csv with --json", () => {
    const r = run(["rank", "--spec", DEMO_SPEC_FILE, "--parts", DEMO_PARTS_FILE, "--csv", "--json"]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--csv and --json are alternatives/);
  });
});
