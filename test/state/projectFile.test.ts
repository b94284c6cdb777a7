import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { openProject, saveProject, PROJECT_FORMAT, PROJECT_VERSION } from "../../src/state/projectFile.ts";
import type { Workspace } from "../../src/state/workspace.ts";
import { parseSpec } from "../../src/engine/parseSpec.ts";

const DEMO_SPEC = JSON.parse(readFileSync("sample-parts/demo-spec.json", "utf8"));

function workspace(): Workspace {
  const spec = parseSpec(DEMO_SPEC);
  if (!spec.ok) throw new Error("demo spec");
  return {
    name: "Demo buck",
    notes: "Chosen for the 2nd revision.\nCheck the hot Isat.",
    spec: spec.spec,
    lists: [
      {
        id: "l1",
        name: "demo-parts.csv",
        text: readFileSync("sample-parts/demo-parts.csv", "utf8"),
        mapping: [{ header: "Irms (A)", quantity: "irms", unit: "A" }],
        seriesSaturation: { DRS: "soft" },
        addedAt: "2026-01-01T00:00:00.000Z",
      },
    ],
    shortlist: ["HV-DRS12060-6U8"],
    view: {
      screen: "compare",
      selectedPart: "HV-DRS12060-6U8",
      rankingSort: { column: "score", descending: true },
      rankingFilter: { passOnly: true, text: "DRS", maker: null, material: null },
      cautionsAcknowledged: true,
    },
  };
}

const expectError = (text: string, message: RegExp) => {
  const opened = openProject(text);
  expect(opened.ok).toBe(false);
  if (!opened.ok) expect(opened.error).toMatch(message);
};

describe("saveProject", () => {
  it(`saveProject(workspace) writes { format: "${PROJECT_FORMAT}", version: ${PROJECT_VERSION}, workspace }`, () => {
    const file = JSON.parse(saveProject(workspace()));
    expect(Object.keys(file)).toEqual(["format", "version", "workspace"]);
    expect(file.format).toBe(PROJECT_FORMAT);
    expect(file.version).toBe(PROJECT_VERSION);
    expect(file.workspace).toEqual(workspace());
  });

  it("saveProject(workspace) leaves the workspace as it was", () => {
    const ws = workspace();
    const before = structuredClone(ws);
    saveProject(ws);
    expect(ws).toEqual(before);
  });

  it("saveProject refuses a workspace that could not be reopened, with a RangeError naming the field", () => {
    const ws = workspace();
    ws.spec = { ...ws.spec, fsw: NaN };
    expect(() => saveProject(ws)).toThrow(RangeError);
    expect(() => saveProject(ws)).toThrow(/workspace\.spec\.fsw/);
  });
});

describe("openProject", () => {
  it("openProject(saveProject(w)) gives w back exactly", () => {
    expect(openProject(saveProject(workspace()))).toEqual({ ok: true, workspace: workspace() });
  });

  it("openProject keeps a series named __proto__ as a series", () => {
    const ws = workspace();
    const series: Record<string, "soft" | "hard"> = {};
    Object.defineProperty(series, "__proto__", { value: "hard", enumerable: true, writable: true, configurable: true });
    ws.lists[0]!.seriesSaturation = series;
    const opened = openProject(saveProject(ws));
    expect(opened.ok).toBe(true);
    if (opened.ok) expect(Object.entries(opened.workspace.lists[0]!.seriesSaturation)).toEqual([["__proto__", "hard"]]);
  });

  it("openProject accepts a file that starts with a byte-order mark", () => {
    expect(openProject(`\uFEFF${saveProject(workspace())}`).ok).toBe(true);
  });

  it("openProject(text that is not JSON) says so", () => {
    expectError("", /^not a Coilsift project file: the file is not JSON/);
    expectError("Part Number,Inductance\nA,1\n", /^not a Coilsift project file: the file is not JSON/);
  });

  it("openProject(foreign JSON) says it is not a Coilsift project file", () => {
    expectError("[1, 2]", /^not a Coilsift project file: expected a JSON object/);
    expectError(JSON.stringify(DEMO_SPEC), /^not a Coilsift project file: it has no "format": "coilsift-project" field$/);
    expectError(JSON.stringify({ format: "other-tool", version: 1 }), /^not a Coilsift project file: its format is "other-tool", not "coilsift-project"$/);
  });

  it("openProject(newer version) says a newer Coilsift saved it", () => {
    expectError(
      JSON.stringify({ format: PROJECT_FORMAT, version: PROJECT_VERSION + 1, workspace: {} }),
      new RegExp(`^this project was saved by a newer Coilsift \\(project format version ${PROJECT_VERSION + 1}\\); this version opens versions 0 to ${PROJECT_VERSION}`),
    );
  });

  it("openProject(damaged file) names the first problems by their path", () => {
    const file = JSON.parse(saveProject(workspace()));
    file.workspace.spec.fsw = "500k";
    delete file.workspace.notes;
    file.workspace.lists[0].mapping[0].quantity = "voltage";
    expectError(JSON.stringify(file), /^damaged project file: .*workspace\.notes: missing; .*workspace\.spec\.fsw: must be a number/);
    expectError(JSON.stringify({ format: PROJECT_FORMAT, version: "1" }), /^damaged project file: "version" must be a whole number from 0 to 1, got "1"$/);
  });

  it("openProject refuses an impossible spec with the engine's message", () => {
    const file = JSON.parse(saveProject(workspace()));
    file.workspace.spec.vout = 20;
    expectError(JSON.stringify(file), /^damaged project file: workspace\.spec\.vout: a buck needs vout below vin/);
  });

  it("openProject refuses unknown keys, a shortlist over six parts and repeated list ids", () => {
    const file = JSON.parse(saveProject(workspace()));
    expectError(JSON.stringify({ ...file, extra: 1 }), /^damaged project file: \(file\): unknown key "extra"$/);
    file.workspace.shortlist = ["a", "b", "c", "d", "e", "f", "g"];
    expectError(JSON.stringify(file), /workspace\.shortlist: holds at most 6 parts/);
    const twice = JSON.parse(saveProject(workspace()));
    twice.workspace.lists.push(twice.workspace.lists[0]);
    expectError(JSON.stringify(twice), /workspace\.lists: list ids must be unique/);
  });

  it("openProject(version 0) migrates the earlier shape and says so", () => {
    const v0 = {
      format: PROJECT_FORMAT,
      version: 0,
      name: "Old design",
      spec: { topology: "buck", vin: 12, vout: 3.3, iout: { min: 0.2, max: 3 }, fsw: 500000 },
      lists: [
        { name: "a.csv", text: "Part Number,Inductance (uH)\nA-1,4.7\n", mapping: [] },
        { name: "b.csv", text: "Part Number,Inductance (uH)\nA-1,6.8\n", mapping: [{ header: "Inductance (uH)", quantity: "inductance", unit: "uH" }] },
      ],
      shortlist: ["A-1"],
    };
    const opened = openProject(JSON.stringify(v0));
    expect(opened.ok).toBe(true);
    if (!opened.ok) return;
    expect(opened.migratedFrom).toBe(0);
    const w = opened.workspace;
    expect(w.name).toBe("Old design");
    expect(w.notes).toBe("");
    expect(w.spec.vin).toEqual({ min: 12, nom: 12, max: 12 });
    expect(w.spec.targets.saturationMargin).toBe(0.2);
    expect(w.lists.map((l) => l.id)).toEqual(["list-1", "list-2"]);
    expect(w.lists[0]!.addedAt < w.lists[1]!.addedAt).toBe(true);
    expect(w.lists[1]!.mapping).toEqual(v0.lists[1]!.mapping);
    expect(w.view.screen).toBe("ranking");
    // Saved again it is a current-version file that opens without migration.
    const again = openProject(saveProject(w));
    expect(again).toEqual({ ok: true, workspace: w });
  });

  it("openProject(damaged version 0) names the problem", () => {
    expectError(JSON.stringify({ format: PROJECT_FORMAT, version: 0, name: "x", spec: { topology: "buck" }, lists: [], shortlist: [] }), /^damaged project file: \(version 0\) spec\.vin/);
    expectError(JSON.stringify({ format: PROJECT_FORMAT, version: 0, name: 3 }), /^damaged project file: \(version 0\) name: must be text/);
  });

  it("openProject survives nesting deeper than any file of ours", () => {
    const deep = `${"[".repeat(100000)}${"]".repeat(100000)}`;
    expect(() => openProject(deep)).not.toThrow();
    expect(openProject(deep).ok).toBe(false);
  });
});
