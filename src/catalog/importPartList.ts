import type { Part } from "../engine/types.ts";
import { PlausibilityCheck } from "./checkPlausibility.ts";
import { detectDecimalComma } from "./detectDecimalComma.ts";
import { detectDelimiter } from "./detectDelimiter.ts";
import { findHeaderRow, isBlank } from "./findHeaderRow.ts";
import { KeyIndex } from "./KeyIndex.ts";
import { mapColumns, type ColumnPlan } from "./mapColumns.ts";
import { parseMappingOverride } from "./parseMappingOverride.ts";
import { makeRowConverter } from "./makeRowConverter.ts";
import { parseUnit } from "./parseUnit.ts";
import { QUANTITIES } from "./quantities.ts";
import { blankComments, previewRecords, readRecords, recordsAtLines, type RecordProblem } from "./readRecords.ts";
import { RecordCells } from "./RecordCells.ts";
import { scanRecords } from "./scanRecords.ts";
import type { ColumnMapping, Dimension, ImportOptions, ImportResult, MappingOverride, RejectedRow, RowWarning } from "./types.ts";

export { decodeText } from "./decodeText.ts";
export { parseMappingOverride } from "./parseMappingOverride.ts";
export type { ColumnMapping, ImportOptions, ImportResult, MappingOverride, MappingOverrides, RejectedRow, RowWarning } from "./types.ts";

const SIMPLE_NUMBER = /^\d+(?:[.,]\d+)?$/;
/** Records read ahead to find the header, the unit row, the decimal sign and missing units. */
const PREVIEW_RECORDS = 600;

function contentRows(rows: string[][]): number {
  let n = 0;
  for (const row of rows) if (!isBlank(row)) n++;
  return n;
}

const GUESS_SAMPLE = 200;

/**
 * Lists rarely omit the unit, but when they do the decades barely overlap: DCR in Ω sits below 1
 * and in mΩ above, currents in mA above 100, SRF in kHz above 2000. Anything else keeps the
 * stated default (µH, mΩ, A, MHz, mm) and the plausibility check flags a slip.
 */
function guessUnit(dimension: Dimension, median: number): string | null {
  switch (dimension) {
    case "inductance":
      return median < 1e-3 ? "H" : median >= 2000 ? "nH" : null;
    case "resistance":
      return median < 1 ? "ohm" : null;
    case "current":
      return median >= 100 ? "mA" : null;
    case "frequency":
      return median >= 1e6 ? "Hz" : median >= 2000 ? "kHz" : null;
    default:
      return null;
  }
}

function emptyResult(options: ImportOptions, delimiter: string, warnings: RowWarning[]): ImportResult {
  return {
    name: options.name ?? null,
    parts: [],
    rejected: [],
    warnings,
    mapping: [],
    dataRows: 0,
    delimiter,
    decimalComma: false,
    headerRow: null,
    title: null,
    extra: {},
  };
}

function guessUnits(rows: string[][], dataIdx: number[], plans: ColumnPlan[], mapping: ColumnMapping[], decimalComma: boolean): void {
  for (const plan of plans) {
    const m = mapping[plan.column];
    if (m === undefined || m.unitSource !== "default") continue;
    const dimension = QUANTITIES[plan.quantity].dimension;
    const sample: number[] = [];
    for (const r of dataIdx) {
      if (sample.length >= GUESS_SAMPLE) break;
      const cell = (rows[r] as string[])[plan.column];
      if (cell !== undefined && SIMPLE_NUMBER.test(cell)) {
        const v = Number(decimalComma ? cell.replace(",", ".") : cell.replace(",", ""));
        if (v > 0) sample.push(v);
      }
    }
    if (sample.length === 0) continue;
    sample.sort((a, b) => a - b);
    const guessed = guessUnit(dimension, sample[sample.length >> 1] as number);
    const unit = guessed === null ? null : parseUnit(guessed, dimension);
    if (unit === null) continue;
    plan.unit = unit;
    m.unit = unit.symbol;
    m.unitSource = "guessed";
    m.note = `no unit given: the values look like ${unit.symbol}`;
  }
}

type RowConverter = ReturnType<typeof makeRowConverter>;

/** What the data rows of one list come to, row by row: kept parts, rejected rows, replaced duplicates. */
function collectRows(names: readonly string[], pnColumn: number, extraColumns: readonly number[]) {
  const columnCount = names.length;
  const kept: (Part | null)[] = [];
  const keptRows: number[] = [];
  /** The kept rows' cells of unread columns, by index in `kept` (most rows have none). */
  const keptExtra: { at: number; cells: Record<string, string> }[] = [];
  // A replaced duplicate's cells are read again from the text at the end rather than every row's
  // cells being held until then (100 000 rows of them in memory, for the few that need them).
  const cellsToRead: { rejected: number; line: number }[] = [];
  const seen = new KeyIndex();
  const rejected: RejectedRow[] = [];
  const warnings: RowWarning[] = [];
  const plausibility = new PlausibilityCheck();
  const state = { kept, keptRows, keptExtra, cellsToRead, rejected, warnings, plausibility, dataRows: 0, add };
  function add(cells: RecordCells, convert: RowConverter): void {
    state.dataRows++;
    const line = cells.line;
    const result = convert(cells, warnings);
    if (!("partNumber" in result)) {
      rejected.push({ row: line, field: result.field, header: result.header, reason: result.reason, cells: cells.cells() });
      return;
    }
    let extra: Record<string, string> | null = null;
    for (const c of extraColumns) {
      const cell = cells.cell(c);
      if (cell.trim() !== "") (extra ??= Object.create(null) as Record<string, string>)[names[c] as string] = cell;
    }
    for (let c = columnCount; c < cells.count; c++) {
      const cell = cells.cell(c);
      if (cell.trim() !== "") (extra ??= Object.create(null) as Record<string, string>)[`column ${c + 1}`] = cell;
    }
    const earlier = seen.put(result.partNumber, kept.length);
    if (earlier !== undefined) {
      const earlierRow = keptRows[earlier] as number;
      kept[earlier] = null;
      rejected.push({
        row: earlierRow,
        field: "partNumber",
        header: names[pnColumn] ?? null,
        reason: `duplicate part number "${result.partNumber}": replaced by line ${line}, later in the list`,
        cells: [],
      });
      cellsToRead.push({ rejected: rejected.length - 1, line: earlierRow });
      warnings.push({ row: line, field: "partNumber", message: `${result.partNumber}: duplicate part number; this later row replaces line ${earlierRow}` });
    }
    kept.push(result);
    keptRows.push(line);
    plausibility.add(result, line);
    if (extra !== null) keptExtra.push({ at: kept.length - 1, cells: extra });
  }
  return state;
}

/**
 * Imports one vendor part list (CSV, TSV, semicolon or pipe separated) into engine Parts in SI.
 * Never throws: every data row ends as a part or a rejected row with its line, field and reason
 * (parts.length + rejected.length === dataRows), and doubtful values come back as warnings.
 */
export function importPartList(text: string, options: ImportOptions = {}): ImportResult {
  const warnings: RowWarning[] = [];
  const overrides: MappingOverride[] = [];
  for (const o of options.mapping ?? []) {
    if (typeof o !== "string") overrides.push(o);
    else {
      const parsed = parseMappingOverride(o);
      if (typeof parsed === "string") warnings.push({ row: null, field: null, message: `mapping override "${o}": ${parsed}` });
      else overrides.push(parsed);
    }
  }
  const delimiter = detectDelimiter(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  const input = blankComments(text, delimiter);
  // The header, unit row, decimal sign and guessed units come from the first records; the whole
  // file is then read in chunks and each row converted as it comes.
  let previewSize = PREVIEW_RECORDS;
  let preview = previewRecords(input, delimiter, previewSize);
  while (preview.truncated && contentRows(preview.chunk.rows) < 40) {
    previewSize *= 8;
    preview = previewRecords(input, delimiter, previewSize);
  }
  const head = preview.chunk;
  const { header, unitRow } = findHeaderRow(head.rows);
  if (header < 0) {
    warnings.push({ row: null, field: null, message: "the file holds no rows" });
    return emptyResult(options, delimiter, warnings);
  }

  let title: string | null = null;
  for (let i = 0; i < header; i++) {
    const row = head.rows[i] as string[];
    if (i === unitRow || isBlank(row)) continue;
    const content = row.map((c) => c.trim()).filter((c) => c !== "").join(" ");
    if (title === null) title = content;
    else warnings.push({ row: head.lines[i] ?? null, field: null, message: `line above the header not read as data: "${content.slice(0, 80)}"` });
  }
  const sampleIdx: number[] = [];
  for (let i = header + 1; i < head.rows.length; i++) if (i !== unitRow && !isBlank(head.rows[i] as string[])) sampleIdx.push(i);

  const map = mapColumns(head.rows[header] as string[], unitRow >= 0 ? (head.rows[unitRow] as string[]) : null, overrides);
  warnings.push(...map.warnings);
  const numericPlans = map.plans.filter((p) => QUANTITIES[p.quantity].dimension !== "text");
  const decimalComma = detectDecimalComma(
    head.rows,
    sampleIdx,
    numericPlans.map((p) => p.column),
  );
  guessUnits(head.rows, sampleIdx, numericPlans, map.mapping, decimalComma);

  const convert = makeRowConverter({ plans: map.plans, names: map.names, decimalComma, seriesSaturation: options.seriesSaturation });
  const pnColumn = map.plans.find((p) => p.quantity === "partNumber")?.column ?? -1;
  const extraColumns = map.mapping.filter((m) => m.status !== "mapped" || m.quantity === "shielding").map((m) => m.column);

  // Rows become parts as they are read. The text is split in place (scanRecords); a quote
  // papaparse would have to recover from sends the whole text through papaparse instead, so its
  // recovery and problem reports apply, with everything collected so far thrown away.
  const cells = new RecordCells();
  let collected = collectRows(map.names, pnColumn, extraColumns);
  const take = (index: number) => {
    if (index > header && index !== unitRow && !cells.isBlank()) collected.add(cells, convert);
  };
  const problems: RecordProblem[] = [];
  if (!scanRecords(input, delimiter, preview.linebreak, cells, take)) {
    collected = collectRows(map.names, pnColumn, extraColumns);
    const read = readRecords(input, delimiter, ({ rows, start, lines }) => {
      for (let i = 0; i < rows.length; i++) {
        cells.setCells(rows[i] as string[], lines[i] as number);
        take(start + i);
      }
    }, preview.linebreak);
    problems.push(...read);
  }
  const { kept, keptRows, keptExtra, rejected, cellsToRead, dataRows, plausibility } = collected;
  warnings.push(...collected.warnings);
  const reread = recordsAtLines(input, delimiter, cellsToRead.map((c) => c.line), preview.linebreak);
  for (const c of cellsToRead) (rejected[c.rejected] as RejectedRow).cells = reread.get(c.line) ?? [];
  for (const p of problems) warnings.push({ row: p.line, field: null, message: p.message });

  // Without replaced duplicates every kept row is a part, in order.
  const complete = cellsToRead.length === 0;
  const parts: Part[] = complete ? (kept as Part[]) : [];
  const partRows: number[] = complete ? keptRows : [];
  if (!complete) {
    for (let i = 0; i < kept.length; i++) {
      const p = kept[i] as Part | null;
      if (p === null) continue;
      parts.push(p);
      partRows.push(keptRows[i] as number);
    }
  }
  const extra: Record<string, Record<string, string>> = Object.create(null) as Record<string, Record<string, string>>;
  for (const { at, cells: e } of keptExtra) {
    const p = kept[at];
    if (p !== null && p !== undefined) extra[p.partNumber] = e;
  }
  warnings.push(...plausibility.warnings(parts, partRows));
  rejected.sort((a, b) => a.row - b.row);
  // File-level warnings (row null) first, then by line; the sort is stable within a line.
  warnings.sort((a, b) => (a.row ?? 0) - (b.row ?? 0));
  return {
    name: options.name ?? null,
    parts,
    rejected,
    warnings,
    mapping: map.mapping,
    dataRows,
    delimiter,
    decimalComma,
    headerRow: head.lines[header] ?? null,
    title,
    extra,
  };
}
