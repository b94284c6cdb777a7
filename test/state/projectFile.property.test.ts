import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { openProject, saveProject, PROJECT_VERSION } from "../../src/state/projectFile.ts";
import type { ViewState, Workspace } from "../../src/state/workspace.ts";
import { makeSpec } from "../../src/engine/specDefaults.ts";
import { parseSpec } from "../../src/engine/parseSpec.ts";
import type { Spec } from "../../src/engine/types.ts";
import { QUANTITY_KEYS } from "../../src/catalog/quantities.ts";

// Any UTF-16 code unit, lone surrogates included: JSON must carry every string through unchanged.
const anyText = fc.string({ unit: fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c)), maxLength: 24 });
/** -0 would come back as 0 (JSON has no negative zero), so the generators make plain zeros. */
const real = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((x) => x + 0);
const limit = (min: number, max: number) => fc.option(real(min, max), { nil: null });

const specArb: fc.Arbitrary<Spec> = fc
  .record({
    topology: fc.constantFrom("buck" as const, "boost" as const, "buck-boost" as const),
    rectifier: fc.constantFrom("diode" as const, "synchronous" as const),
    vinMin: real(1, 60),
    nomStep: real(0, 0.5),
    maxStep: real(0, 0.5),
    voutFactor: real(0.05, 0.95),
    ioutMax: real(0.01, 20),
    ioutMinFactor: real(0, 1),
    fsw: real(1e3, 5e6),
    drops: fc.tuple(real(0, 0.1), real(0, 0.5), real(0, 1), real(0, 0.1)),
    ambient: real(-40, 85),
    thermalExponent: real(0.5, 1.5),
    assumedTolerance: real(0, 0.5),
    ripple: fc.tuple(real(0, 0.4), real(0.01, 1)),
    margins: fc.tuple(real(0, 1), real(0, 1), real(0, 20)),
    lightLoadMode: fc.constantFrom("any" as const, "ccm" as const),
    maxTempRise: real(1, 100),
    limits: fc.tuple(limit(-40, 200), limit(1e-4, 0.05), limit(1e-4, 0.05), limit(1e-4, 0.05), limit(1e-8, 1e-3), limit(0.01, 100)),
    weights: fc.tuple(real(0.01, 1), real(0, 1), real(0, 1), real(0, 1), real(0, 1)),
  })
  .map((r) => {
    const vinNom = r.vinMin * (1 + r.nomStep);
    const vinMax = vinNom * (1 + r.maxStep);
    const vout = r.topology === "buck" ? r.vinMin * r.voutFactor : r.topology === "boost" ? vinMax / r.voutFactor : r.vinMin * r.voutFactor * 2;
    const [maxTemperature, maxLength, maxWidth, maxHeight, maxFootprint, maxPrice] = r.limits;
    return makeSpec({
      topology: r.topology,
      rectifier: r.rectifier,
      vin: { min: r.vinMin, nom: vinNom, max: vinMax },
      vout,
      iout: { min: r.ioutMax * r.ioutMinFactor, max: r.ioutMax },
      fsw: r.fsw,
      switchResistance: r.drops[0],
      switchDrop: r.drops[1],
      rectifierDrop: r.drops[2],
      rectifierResistance: r.drops[3],
      ambient: r.ambient,
      thermalExponent: r.thermalExponent,
      assumedTolerance: r.assumedTolerance,
      targets: {
        rippleRatio: { min: Math.min(r.ripple[0], r.ripple[1]), max: r.ripple[1] },
        saturationMargin: r.margins[0],
        heatingMargin: r.margins[1],
        srfFactor: r.margins[2],
        lightLoadMode: r.lightLoadMode,
        maxTempRise: r.maxTempRise,
        maxTemperature,
        maxLength,
        maxWidth,
        maxHeight,
        maxFootprint,
        maxPrice,
      },
      weights: { loss: r.weights[0], footprint: r.weights[1], height: r.weights[2], price: r.weights[3], margin: r.weights[4] },
    });
  })
  .filter((spec) => parseSpec(spec).ok);

const seriesKey = fc.oneof(anyText, fc.constant("__proto__"), fc.constant("constructor"));

const listArb = fc.record({
  id: anyText.filter((s) => s.length > 0),
  name: anyText,
  text: fc.oneof(anyText, fc.constant("Part Number,Inductance (uH)\r\nA-1,4.7\r\n")),
  mapping: fc.array(
    fc.record({ header: anyText, quantity: fc.constantFrom("ignore" as const, ...QUANTITY_KEYS), unit: fc.option(anyText, { nil: null }) }),
    { maxLength: 3 },
  ),
  seriesSaturation: fc.dictionary(seriesKey, fc.constantFrom("soft" as const, "hard" as const), { maxKeys: 3, noNullPrototype: true }),
  addedAt: fc.date({ min: new Date("1970-01-01T00:00:00Z"), max: new Date("9999-12-31T23:59:59Z"), noInvalidDate: true }).map((d) => d.toISOString()),
});

const viewArb: fc.Arbitrary<ViewState> = fc.record({
  screen: fc.constantFrom("design" as const, "parts" as const, "ranking" as const, "detail" as const, "compare" as const, "sweeps" as const, "tradeoff" as const),
  selectedPart: fc.option(anyText, { nil: null }),
  rankingSort: fc.option(fc.record({ column: anyText, descending: fc.boolean() }), { nil: null }),
  rankingFilter: fc.record({ passOnly: fc.boolean(), text: anyText, maker: fc.option(anyText, { nil: null }), material: fc.option(anyText, { nil: null }) }),
  cautionsAcknowledged: fc.boolean(),
});

const workspaceArb: fc.Arbitrary<Workspace> = fc.record({
  name: anyText,
  notes: anyText,
  spec: specArb,
  lists: fc.uniqueArray(listArb, { maxLength: 3, selector: (l) => l.id }),
  shortlist: fc.array(anyText, { maxLength: 6 }),
  view: viewArb,
});

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

interface Place {
  path: (string | number)[];
  value: Json;
  /** The parent is an object of fixed keys (not an array, not a record of free keys such as seriesSaturation). */
  fixedKeys: boolean;
}

function places(node: Json, path: (string | number)[] = [], fixedKeys = false): Place[] {
  const here: Place[] = path.length > 0 ? [{ path, value: node, fixedKeys }] : [];
  if (Array.isArray(node)) return [...here, ...node.flatMap((v, i) => places(v, [...path, i], false))];
  if (node !== null && typeof node === "object") {
    const record = path[path.length - 1] === "seriesSaturation";
    return [...here, ...Object.entries(node).flatMap(([k, v]) => places(v, [...path, k], !record))];
  }
  return here;
}

function parentOf(root: Json, path: (string | number)[]): Record<string | number, Json> {
  let at: Json = root;
  for (const key of path.slice(0, -1)) at = (at as Record<string | number, Json>)[key] as Json;
  return at as Record<string | number, Json>;
}

/** Sets an own property, even one named "__proto__" (a plain assignment would set the prototype instead). */
function setAt(root: Json, path: (string | number)[], value: Json): void {
  Object.defineProperty(parentOf(root, path), path[path.length - 1]!, { value, enumerable: true, writable: true, configurable: true });
}

const typeOf = (v: Json) => (v === null ? "null" : Array.isArray(v) ? "array" : typeof v);
const OTHER_VALUES: Json[] = [7, "seven", true, [1], { seven: 7 }];

/** Spec and workspace values the schema's types allow but the rules refuse. */
const BAD_VALUES: [string[], Json][] = [
  [["workspace", "spec", "fsw"], 0],
  [["workspace", "spec", "fsw"], -5e5],
  [["workspace", "spec", "iout", "max"], 0],
  [["workspace", "spec", "iout", "min"], -1],
  [["workspace", "spec", "vin", "min"], 1e9],
  [["workspace", "spec", "assumedTolerance"], 1],
  [["workspace", "spec", "thermalExponent"], 0],
  [["workspace", "spec", "topology"], "flyback"],
  [["workspace", "spec", "targets", "lightLoadMode"], "dcm"],
  [["workspace", "spec", "targets", "maxTempRise"], 0],
  [["workspace", "view", "screen"], "home"],
  [["workspace", "shortlist"], ["a", "b", "c", "d", "e", "f", "g"]],
  [["format"], "coilsift-projekt"],
  [["version"], PROJECT_VERSION + 1],
  [["version"], 1.5],
];

const corruptionArb = fc.record({
  kind: fc.constantFrom("truncate", "drop key", "wrong type", "unknown key", "bad value", "not an object"),
  pick: fc.nat(),
  other: fc.nat(),
  key: fc.stringMatching(/^[a-z][a-z0-9]{0,8}$/).map((k) => `x_${k}`),
});

type Corruption = typeof corruptionArb extends fc.Arbitrary<infer T> ? T : never;

/** A saved project made invalid in one of several ways, each of which the format must refuse. */
function corrupt(text: string, c: Corruption): string {
  const file = JSON.parse(text) as Json;
  const all = places(file);
  switch (c.kind) {
    case "truncate":
      // Any proper prefix of a JSON object leaves it unclosed.
      return text.slice(0, c.pick % text.trimEnd().length);
    case "drop key": {
      const keyed = all.filter((p) => p.fixedKeys);
      const p = keyed[c.pick % keyed.length]!;
      delete parentOf(file, p.path)[p.path[p.path.length - 1]!];
      return JSON.stringify(file);
    }
    case "wrong type": {
      // A null stays out: nullable fields would take another type in its place.
      const typed = all.filter((p) => p.value !== null);
      const p = typed[c.pick % typed.length]!;
      const choices = OTHER_VALUES.filter((v) => typeOf(v) !== typeOf(p.value));
      setAt(file, p.path, choices[c.other % choices.length]!);
      return JSON.stringify(file);
    }
    case "unknown key": {
      const objects = [{ path: [] as (string | number)[], value: file }, ...all].filter(
        (p) => typeOf(p.value) === "object" && p.path[p.path.length - 1] !== "seriesSaturation",
      );
      const target = objects[c.pick % objects.length]!.value as Record<string, Json>;
      target[c.key] = 1;
      return JSON.stringify(file);
    }
    case "bad value": {
      const [path, value] = BAD_VALUES[c.pick % BAD_VALUES.length]!;
      setAt(file, path, value);
      return JSON.stringify(file);
    }
    case "not an object":
      return JSON.stringify([file, "trailing"].slice(0, 1 + (c.pick % 2)));
  }
  throw new Error(`unknown corruption ${c.kind}`);
}

describe("projectFile properties", () => {
  it("openProject(saveProject(w)) returns w unchanged, and saving it again gives the same text", () => {
    fc.assert(
      fc.property(workspaceArb, (w) => {
        const text = saveProject(w);
        const opened = openProject(text);
        expect(opened).toEqual({ ok: true, workspace: w });
        if (opened.ok) {
          expect(saveProject(opened.workspace)).toBe(text);
          for (const [i, list] of w.lists.entries()) expect(Object.keys(opened.workspace.lists[i]!.seriesSaturation)).toEqual(Object.keys(list.seriesSaturation));
        }
      }),
      { numRuns: 300 },
    );
  });

  it("openProject refuses 1 000 corrupted project files cleanly: no throw, ok false, a one-line message", () => {
    const kinds = new Map<string, number>();
    fc.assert(
      fc.property(workspaceArb, corruptionArb, (w, c) => {
        const damaged = corrupt(saveProject(w), c);
        let opened: ReturnType<typeof openProject> | undefined;
        expect(() => (opened = openProject(damaged))).not.toThrow();
        expect(opened!.ok).toBe(false);
        if (!opened!.ok) {
          expect(opened!.error.length).toBeGreaterThan(10);
          expect(opened!.error).not.toMatch(/[\r\n]/);
          expect(opened!.error).toMatch(/^(not a Coilsift project file|damaged project file|this project was saved by a newer Coilsift)/);
        }
        kinds.set(c.kind, (kinds.get(c.kind) ?? 0) + 1);
      }),
      { numRuns: 1000 },
    );
    expect(kinds.size).toBe(6);
  });

  it("openProject never throws on arbitrary text or JSON, and whatever it accepts can be saved again", () => {
    fc.assert(
      fc.property(fc.oneof(anyText, fc.json(), fc.jsonValue().map((v) => JSON.stringify({ format: "coilsift-project", version: 1, workspace: v }))), (text) => {
        const opened = openProject(text);
        if (opened.ok) expect(() => saveProject(opened.workspace)).not.toThrow();
      }),
      { numRuns: 500 },
    );
  });
});
