import type { Part } from "../engine/types.ts";

/** What a column of a part list can hold. Keys match the engine Part fields where there is one. */
export type Quantity =
  | "partNumber"
  | "maker"
  | "series"
  | "material"
  | "shielding"
  | "inductance"
  | "tolerance"
  | "dcrTyp"
  | "dcrMax"
  | "isat"
  | "isatDrop"
  | "isatHot"
  | "isatHotTemp"
  | "irms"
  | "irmsRise"
  | "srf"
  | "length"
  | "width"
  | "height"
  | "dimensions"
  | "price"
  | "rollOffExponent"
  | "acFactor"
  | "coreK"
  | "coreAlpha"
  | "coreBeta"
  | "bPerAmp"
  | "coreVolume";

/** Physical kind of a quantity; a unit converts to SI only within its dimension. */
export type Dimension =
  | "text"
  | "inductance"
  | "resistance"
  | "current"
  | "frequency"
  | "length"
  | "fraction"
  | "temperatureRise"
  | "temperature"
  | "currency"
  | "fluxPerCurrent"
  | "volume"
  | "number";

export interface Unit {
  dimension: Dimension;
  /** SI value = value·factor + offset; the offset is non-zero only for kelvin as a temperature. */
  factor: number;
  /** log10(factor) when the factor is a power of ten: "13.3" read as "13.3e-3" gives 0.0133, not 0.013300000000000001. */
  exponent: number | null;
  offset: number;
  /** Display spelling, e.g. "µH". */
  symbol: string;
}

export interface ColumnMapping {
  /** 0-based column index in the file. */
  column: number;
  /** Header text as written (with the unit-row cell appended in brackets when there is one). */
  header: string;
  /** Null when the column is not recognised, duplicated or ignored: its cells are kept in `extra`. */
  quantity: Quantity | null;
  /** Unit the column's bare numbers are read in, null for text columns. */
  unit: string | null;
  status: "mapped" | "unrecognised" | "duplicate" | "ignored";
  /** Where the unit came from. */
  unitSource: "header" | "unit row" | "override" | "default" | "guessed" | null;
  /** Anything the user should know about this column (a header condition, a guess). */
  note: string | null;
}

export interface RejectedRow {
  /** 1-based line number in the file where the record starts. */
  row: number;
  /** Quantity key ("inductance", "partNumber", …) or "row". */
  field: string;
  /** The column header, null when the problem is not one cell (e.g. no inductance column). */
  header: string | null;
  reason: string;
  /** The raw cells, so nothing of a rejected row is lost. */
  cells: string[];
}

export interface RowWarning {
  /** 1-based line number, null for a file-level warning. */
  row: number | null;
  field: string | null;
  message: string;
}

export interface MappingOverride {
  /** Header text to match (case- and space-insensitive). */
  header: string;
  /** "ignore" keeps the column as an unrecognised one. */
  quantity: Quantity | "ignore";
  /** Unit spelling for the column's bare numbers, null to keep the recognised or default unit. */
  unit: string | null;
}

/** Overrides as parsed objects or as "Header=quantity:unit" text (bad text becomes a file-level warning). */
export type MappingOverrides = ReadonlyArray<MappingOverride | string>;

export interface ImportOptions {
  /** Name of the list (file name), echoed in the result and used by mergeLists. */
  name?: string;
  mapping?: MappingOverrides;
  /** Saturation character per series (case-insensitive), ahead of the material column. */
  seriesSaturation?: Record<string, "soft" | "hard">;
}

export interface ImportResult {
  name: string | null;
  parts: Part[];
  rejected: RejectedRow[];
  warnings: RowWarning[];
  mapping: ColumnMapping[];
  /** Records after the header that hold at least one non-empty cell and are not comments. */
  dataRows: number;
  delimiter: string;
  decimalComma: boolean;
  /** 1-based line of the header, null when the file has no content. */
  headerRow: number | null;
  /** A title line found above the header, if any. */
  title: string | null;
  /** Raw cells of unrecognised, duplicate and ignored columns, by part number then header. */
  extra: Record<string, Record<string, string>>;
}
