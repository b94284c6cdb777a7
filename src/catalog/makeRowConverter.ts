import { PART_FIELD_SLOT, PART_NUMBER_FIELDS, partFromFields, type PartTexts } from "../engine/partDefaults.ts";
import type { Part } from "../engine/types.ts";
import type { ColumnPlan } from "./mapColumns.ts";
import { parseDimensionsCell } from "./parseDimensionsCell.ts";
import { parseNumberCell, type CellContext } from "./parseNumberCell.ts";
import type { RecordCells } from "./RecordCells.ts";
import { QUANTITIES, type QuantitySpec } from "./quantities.ts";
import type { Quantity, RowWarning, Unit } from "./types.ts";

/** Where each numeric quantity goes in the row's field table (the Part field of the same name). */
const FIELD_SLOT: Partial<Record<Quantity, number>> = PART_FIELD_SLOT;

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
  /** Index into the row's field table, -1 for core-loss figures. */
  slot: number;
}

/** A text column with the last cell read from it: lists repeat a maker or series row after row. */
interface TextColumn {
  column: number;
  quantity: "maker" | "series" | "material";
  lastRaw: string;
  lastTrimmed: string;
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
 * Builds the function that turns one data row into an engine Part (through partFromFields, so the
 * stated defaults are filled) or the reason it cannot be one. Built once per list: the per-row
 * work is a loop over precomputed columns, with plain decimal cells read without the full parser.
 */
export function makeRowConverter(setup: ConverterSetup): (cells: RecordCells, warnings: RowWarning[]) => Part | RowRejection {
  const { plans, names, decimalComma } = setup;
  const byQuantity = new Map<Quantity, ColumnPlan>();
  for (const p of plans) byQuantity.set(p.quantity, p);
  const pnPlan = byQuantity.get("partNumber");
  const lPlan = byQuantity.get("inductance");
  const textColumns: TextColumn[] = plans
    .filter((p) => p.quantity === "maker" || p.quantity === "series" || p.quantity === "material")
    .map((p) => ({ column: p.column, quantity: p.quantity as TextColumn["quantity"], lastRaw: "", lastTrimmed: "" }));
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
      slot: FIELD_SLOT[p.quantity] ?? -1,
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
  // The row's numbers and texts, reused for every row: partFromFields copies out of them.
  const fields = new Float64Array(PART_NUMBER_FIELDS.length);
  const texts: PartTexts = { partNumber: "", maker: null, series: null, material: null, saturation: null, coreLoss: null };
  const inductanceSlot = PART_FIELD_SLOT.inductance;
  // Shared by all rows (rows are converted one at a time): no closure is made per row.
  const state: { error: RowRejection | null; others: string[] | null } = { error: null, others: null };
  const fail = (field: string, header: string | null, reason: string) => {
    if (state.error === null) state.error = { field, header, reason };
    else (state.others ??= []).push(field);
  };

  return (cells, warnings) => {
    const line = cells.line;
    if (pnPlan === undefined) {
      return { field: "partNumber", header: null, reason: 'missing part number: no part number column recognised (map one with "Header=partNumber")' };
    }
    const partNumber = cells.cell(pnPlan.column).trim();
    if (partNumber === "") return { field: "partNumber", header: headerOf(pnPlan), reason: "missing part number" };
    if (lPlan === undefined) {
      return { field: "inductance", header: null, reason: 'missing inductance: no inductance column recognised (map one with "Header=inductance:uH")' };
    }
    fields.fill(NaN);
    const input = texts;
    input.partNumber = partNumber;
    input.maker = null;
    input.series = null;
    input.material = null;
    input.saturation = null;
    input.coreLoss = null;
    let notes: RowWarning[] | null = null;
    const core: (number | undefined)[] | null = hasCore ? [undefined, undefined, undefined, undefined, undefined] : null;
    state.error = null;
    state.others = null;

    if (dimsPlan !== undefined && dimsCtx !== null) {
      const raw = cells.cell(dimsPlan.column);
      const res = parseDimensionsCell(raw, dimsCtx);
      if (res.kind === "error") fail("dimensions", headerOf(dimsPlan), `unparseable dimensions: ${res.reason}`);
      else if (res.kind === "value") {
        if (res.length <= 0 || res.width <= 0 || (res.height !== null && res.height <= 0)) {
          fail("dimensions", headerOf(dimsPlan), `dimensions "${raw}" include a zero or negative size, which is impossible`);
        } else {
          fields[PART_FIELD_SLOT.length] = res.length;
          fields[PART_FIELD_SLOT.width] = res.width;
          if (res.height !== null) fields[PART_FIELD_SLOT.height] = res.height;
        }
      }
    }
    for (let k = 0; k < numbers.length; k++) {
      const col = numbers[k] as NumberColumn;
      // Plain decimals (nearly every cell) are read in place in one scan; the full parser takes the rest.
      let v = cells.plainNumber(col.column, col.unit, decimalComma);
      let raw: string | null = null;
      if (Number.isNaN(v)) {
        if (cells.cellLength(col.column) === 0) continue;
        raw = cells.cell(col.column);
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
        fail(col.quantity, col.header, `${col.spec.label} "${raw ?? cells.cell(col.column)}" is ${bad}, which is impossible`);
        continue;
      }
      if (col.slot >= 0) fields[col.slot] = v;
      else if (core !== null && col.core >= 0) core[col.core] = v;
    }
    const e = state.error as RowRejection | null;
    const more = state.others as string[] | null;
    if (e !== null) return more === null ? e : { ...e, reason: `${e.reason}; also ${more.join(", ")}` };
    if (Number.isNaN(fields[inductanceSlot])) return { field: "inductance", header: headerOf(lPlan), reason: "missing inductance" };

    for (const col of textColumns) {
      let t = col.lastTrimmed;
      if (!cells.cellIs(col.column, col.lastRaw)) {
        col.lastRaw = cells.cell(col.column);
        col.lastTrimmed = t = col.lastRaw.trim();
      }
      if (t === "") continue;
      if (col.quantity === "maker") input.maker = t;
      else if (col.quantity === "series") input.series = t;
      else input.material = t;
    }
    const S = PART_FIELD_SLOT;
    if (Number.isNaN(fields[S.isatDrop]) && headerDrop !== null && headerDrop > 0 && headerDrop < 1) fields[S.isatDrop] = headerDrop;
    if (Number.isNaN(fields[S.irmsRise]) && headerRise !== null && headerRise > 0) fields[S.irmsRise] = headerRise;
    if (Number.isNaN(fields[S.isatHotTemp]) && headerHotTemp !== null && !Number.isNaN(fields[S.isatHot])) fields[S.isatHotTemp] = headerHotTemp;
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
    // A per-series choice comes first; without one partFromFields reads the material (cached there).
    if (seriesSaturation.size > 0 && typeof input.series === "string") {
      const character = seriesSaturation.get(input.series.toLowerCase());
      if (character !== undefined) input.saturation = character;
    }
    if (notes !== null) for (const n of notes) warnings.push(n);
    return partFromFields(input, fields);
  };
}
