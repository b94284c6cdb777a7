import { completePart, saturationFromMaterial, type PartInput } from "../engine/partDefaults.ts";
import type { Part, SaturationCharacter } from "../engine/types.ts";
import type { ColumnPlan } from "./mapColumns.ts";
import { parseDimensionsCell } from "./parseDimensionsCell.ts";
import { parseNumberCell, type CellContext } from "./parseNumberCell.ts";
import { plainDecimalToSi } from "./parseUnit.ts";
import { QUANTITIES, type QuantitySpec } from "./quantities.ts";
import type { Quantity, RowWarning, Unit } from "./types.ts";

/**
 * The converter's one working object: every PartInput field, undefined where not given. It is
 * reused for every row (completePart copies out of it and reads undefined as "not given"), so a
 * 100 000-row list allocates the parts and nothing per row besides.
 */
type Scratch = { [K in keyof PartInput]-?: PartInput[K] | undefined };

function reset(s: Scratch, partNumber: string): void {
  s.partNumber = partNumber;
  s.inductance = NaN;
  s.maker = null;
  s.series = null;
  s.material = null;
  s.tolerance = null;
  s.dcrTyp = null;
  s.dcrMax = null;
  s.dcrTemp = undefined;
  s.isat = null;
  s.isatDrop = undefined;
  s.isatHot = null;
  s.isatHotTemp = null;
  s.irms = null;
  s.irmsRise = undefined;
  s.srf = null;
  s.length = null;
  s.width = null;
  s.height = null;
  s.price = null;
  s.saturation = undefined;
  s.rollOffExponent = undefined;
  s.acFactor = undefined;
  s.coreLoss = null;
}

/** Stores an SI value on its Part field; direct property stores keep the object's shape. */
function assign(input: Scratch, quantity: Quantity, v: number): void {
  switch (quantity) {
    case "inductance":
      input.inductance = v;
      break;
    case "tolerance":
      input.tolerance = v;
      break;
    case "dcrTyp":
      input.dcrTyp = v;
      break;
    case "dcrMax":
      input.dcrMax = v;
      break;
    case "isat":
      input.isat = v;
      break;
    case "isatDrop":
      input.isatDrop = v;
      break;
    case "isatHot":
      input.isatHot = v;
      break;
    case "isatHotTemp":
      input.isatHotTemp = v;
      break;
    case "irms":
      input.irms = v;
      break;
    case "irmsRise":
      input.irmsRise = v;
      break;
    case "srf":
      input.srf = v;
      break;
    case "length":
      input.length = v;
      break;
    case "width":
      input.width = v;
      break;
    case "height":
      input.height = v;
      break;
    case "price":
      input.price = v;
      break;
    case "rollOffExponent":
      input.rollOffExponent = v;
      break;
    case "acFactor":
      input.acFactor = v;
      break;
    default:
      break;
  }
}
const CORE_LOSS: Quantity[] = ["coreK", "coreAlpha", "coreBeta", "bPerAmp", "coreVolume"];

export interface RowRejection {
  field: string;
  header: string | null;
  reason: string;
}

export interface ConverterSetup {
  plans: ColumnPlan[];
  names: string[];
  decimalComma: boolean;
  seriesSaturation: Record<string, "soft" | "hard"> | undefined;
}

interface NumberColumn {
  column: number;
  quantity: Quantity;
  spec: QuantitySpec;
  ctx: CellContext;
  unit: Unit | null;
  header: string;
  /** Index into the row's core-loss figures (k, α, β, B per A, volume), -1 for other quantities. */
  core: number;
}

function contextFor(plan: ColumnPlan, decimalComma: boolean): CellContext {
  const spec = QUANTITIES[plan.quantity];
  return { dimension: spec.dimension, unit: plan.unit, decimalComma, rangePick: spec.rangePick, toleranceLetters: plan.quantity === "tolerance" };
}

function impossible(spec: QuantitySpec, quantity: Quantity, v: number): string | null {
  switch (spec.valid) {
    case "positive":
      return v > 0 ? null : "zero or negative";
    case "nonNegative":
      return v >= 0 ? null : "negative";
    case "fraction":
      return v >= 0 && v < 1 && !(quantity === "isatDrop" && v === 0) ? null : "outside 0 … 100 %";
    case "none":
      return null;
  }
}

/**
 * Builds the function that turns one data row into an engine Part (through completePart, so the
 * stated defaults are filled) or the reason it cannot be one. Built once per list: the per-row
 * work is a loop over precomputed columns, with plain decimal cells read without the full parser.
 */
export function makeRowConverter(setup: ConverterSetup): (cells: string[], line: number, warnings: RowWarning[]) => Part | RowRejection {
  const { plans, names, decimalComma } = setup;
  const byQuantity = new Map<Quantity, ColumnPlan>();
  for (const p of plans) byQuantity.set(p.quantity, p);
  const pnPlan = byQuantity.get("partNumber");
  const lPlan = byQuantity.get("inductance");
  const texts = plans.filter((p) => QUANTITIES[p.quantity].dimension === "text" && p.quantity !== "partNumber" && p.quantity !== "shielding");
  const numbers: NumberColumn[] = plans
    .filter((p) => QUANTITIES[p.quantity].dimension !== "text" && p.quantity !== "dimensions")
    .map((p) => ({
      column: p.column,
      quantity: p.quantity,
      spec: QUANTITIES[p.quantity],
      ctx: contextFor(p, decimalComma),
      unit: p.unit,
      header: names[p.column] as string,
      core: CORE_LOSS.indexOf(p.quantity),
    }));
  const dimsPlan = byQuantity.get("dimensions");
  const dimsCtx = dimsPlan === undefined ? null : contextFor(dimsPlan, decimalComma);
  const headerDrop = byQuantity.get("isat")?.drop ?? byQuantity.get("isatHot")?.drop ?? null;
  const headerRise = byQuantity.get("irms")?.rise ?? null;
  const headerHotTemp = byQuantity.get("isatHot")?.temperature ?? null;
  const hasCore = plans.some((p) => CORE_LOSS.includes(p.quantity));
  const seriesSaturation = new Map<string, "soft" | "hard">();
  for (const [series, character] of Object.entries(setup.seriesSaturation ?? {})) seriesSaturation.set(series.trim().toLowerCase(), character);
  const headerOf = (plan: ColumnPlan) => names[plan.column] ?? null;
  const scratch = {} as Scratch;
  reset(scratch, "");
  const materialSaturation = new Map<string, SaturationCharacter | null>();
  // Shared by all rows (rows are converted one at a time): no closure is made per row.
  const state: { error: RowRejection | null; others: string[] | null } = { error: null, others: null };
  const fail = (field: string, header: string | null, reason: string) => {
    if (state.error === null) state.error = { field, header, reason };
    else (state.others ??= []).push(field);
  };

  return (cells, line, warnings) => {
    if (pnPlan === undefined) {
      return { field: "partNumber", header: null, reason: 'missing part number: no part number column recognised (map one with "Header=partNumber")' };
    }
    const partNumber = (cells[pnPlan.column] ?? "").trim();
    if (partNumber === "") return { field: "partNumber", header: headerOf(pnPlan), reason: "missing part number" };
    if (lPlan === undefined) {
      return { field: "inductance", header: null, reason: 'missing inductance: no inductance column recognised (map one with "Header=inductance:uH")' };
    }
    const input = scratch;
    reset(input, partNumber);
    let notes: RowWarning[] | null = null;
    const core: (number | undefined)[] | null = hasCore ? [undefined, undefined, undefined, undefined, undefined] : null;
    state.error = null;
    state.others = null;

    if (dimsPlan !== undefined && dimsCtx !== null) {
      const raw = cells[dimsPlan.column] ?? "";
      const res = parseDimensionsCell(raw, dimsCtx);
      if (res.kind === "error") fail("dimensions", headerOf(dimsPlan), `unparseable dimensions: ${res.reason}`);
      else if (res.kind === "value") {
        if (res.length <= 0 || res.width <= 0 || (res.height !== null && res.height <= 0)) {
          fail("dimensions", headerOf(dimsPlan), `dimensions "${raw}" include a zero or negative size, which is impossible`);
        } else {
          input.length = res.length;
          input.width = res.width;
          if (res.height !== null) input.height = res.height;
        }
      }
    }
    for (let k = 0; k < numbers.length; k++) {
      const col = numbers[k] as NumberColumn;
      const raw = cells[col.column];
      if (raw === undefined || raw === "") continue;
      // Plain decimals (nearly every cell) are read in one scan; the full parser takes the rest.
      let v = plainDecimalToSi(raw, col.unit, decimalComma);
      if (Number.isNaN(v)) {
        const res = parseNumberCell(raw, col.ctx);
        if (res.kind === "missing") continue;
        if (res.kind === "error") {
          fail(col.quantity, col.header, `unparseable ${col.spec.label}: ${res.reason}`);
          continue;
        }
        v = res.value;
        if (res.note !== null) (notes ??= []).push({ row: line, field: col.quantity, message: `${partNumber}: ${res.note}` });
      }
      const bad = col.spec.valid === "positive" && v > 0 ? null : impossible(col.spec, col.quantity, v);
      if (bad !== null) {
        fail(col.quantity, col.header, `${col.spec.label} "${raw}" is ${bad}, which is impossible`);
        continue;
      }
      if (col.core >= 0) {
        if (core !== null) core[col.core] = v;
      } else assign(input, col.quantity, v);
    }
    const e = state.error as RowRejection | null;
    const more = state.others as string[] | null;
    if (e !== null) return more === null ? e : { ...e, reason: `${e.reason}; also ${more.join(", ")}` };
    if (Number.isNaN(input.inductance)) return { field: "inductance", header: headerOf(lPlan), reason: "missing inductance" };

    for (const plan of texts) {
      const t = (cells[plan.column] ?? "").trim();
      if (t === "") continue;
      if (plan.quantity === "maker") input.maker = t;
      else if (plan.quantity === "series") input.series = t;
      else if (plan.quantity === "material") input.material = t;
    }
    if (input.isatDrop === undefined && headerDrop !== null && headerDrop > 0 && headerDrop < 1) input.isatDrop = headerDrop;
    if (input.irmsRise === undefined && headerRise !== null && headerRise > 0) input.irmsRise = headerRise;
    if (input.isatHotTemp === null && headerHotTemp !== null && input.isatHot !== null) input.isatHotTemp = headerHotTemp;
    if (core !== null) {
      const [k, alpha, beta, bPerAmp, volume] = core;
      if (k !== undefined && alpha !== undefined && beta !== undefined && bPerAmp !== undefined) {
        input.coreLoss = { k, alpha, beta, bPerAmp, volume: volume ?? null };
      } else if (k !== undefined || alpha !== undefined || beta !== undefined || bPerAmp !== undefined) {
        const missing = CORE_LOSS.slice(0, 4)
          .filter((_, i) => core[i] === undefined)
          .map((q) => QUANTITIES[q].label);
        (notes ??= []).push({ row: line, field: "coreLoss", message: `${partNumber}: core-loss data incomplete (no ${missing.join(", ")}): core loss not modelled` });
      }
    }
    if (seriesSaturation.size > 0 && typeof input.series === "string") {
      const character = seriesSaturation.get(input.series.toLowerCase());
      if (character !== undefined) input.saturation = character;
    }
    if (input.saturation === undefined && typeof input.material === "string") {
      // Same answer completePart would give, looked up once per distinct material text.
      let character = materialSaturation.get(input.material);
      if (character === undefined) {
        character = saturationFromMaterial(input.material);
        materialSaturation.set(input.material, character);
      }
      if (character !== null) input.saturation = character;
    }
    if (notes !== null) for (const n of notes) warnings.push(n);
    return completePart(input as PartInput);
  };
}
