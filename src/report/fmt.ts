import { formatPercent, formatQuantity } from "../engine/formatQuantity.ts";

/**
 * Number formats of the report. Fixed rules, no locale: the browser and the CLI must write the
 * same characters for the same numbers.
 */
export const fmt = {
  q: (value: number | null, unit: string, digits = 3): string => formatQuantity(value, unit, digits),
  pct: (fraction: number | null, digits = 3): string => formatPercent(fraction, digits),
  /** Plain number to `digits` significant figures, "—" when unknown. */
  n: (value: number | null, digits = 3): string => (value === null || !Number.isFinite(value) ? "—" : String(Number(value.toPrecision(digits)))),
  /** Fixed decimals, "—" when unknown; the unicode minus sign reads better in tables. */
  fixed: (value: number | null, decimals: number): string =>
    value === null || !Number.isFinite(value) ? "—" : value.toFixed(decimals).replace(/^-(?=.*[1-9])/, "−").replace(/^-/, ""),
  kelvin: (value: number | null): string => (value === null || !Number.isFinite(value) ? "—" : `${value.toFixed(1)} K`),
  celsius: (value: number | null): string => (value === null || !Number.isFinite(value) ? "—" : `${value.toFixed(1)} °C`),
  mm: (metres: number | null): string => (metres === null ? "—" : `${Number((metres * 1e3).toPrecision(4))} mm`),
};
