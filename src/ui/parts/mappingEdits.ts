import type { ColumnMapping, MappingOverride, Quantity } from "../../catalog/types.ts";
import { QUANTITIES } from "../../catalog/quantities.ts";
import { parseUnit } from "../../catalog/parseUnit.ts";

/** One column as the editor holds it: the chosen quantity ("ignore" for none) and the unit text. */
export interface ColumnChoice {
  quantity: Quantity | "ignore";
  unit: string;
}

export function choiceOf(m: ColumnMapping): ColumnChoice {
  return { quantity: m.quantity ?? "ignore", unit: m.quantity === null ? "" : (m.unit ?? "") };
}

/** What is wrong with a unit for a quantity, or null. */
export function unitProblem(quantity: Quantity | "ignore", unit: string): string | null {
  if (quantity === "ignore" || unit.trim() === "") return null;
  const dimension = QUANTITIES[quantity].dimension;
  if (dimension === "text" || dimension === "number") return `${QUANTITIES[quantity].label} takes no unit`;
  if (dimension === "currency") return null;
  if (parseUnit(unit.trim(), dimension) !== null) return null;
  const other = parseUnit(unit.trim());
  return other === null ? `"${unit}" is not a unit the importer knows` : `"${unit}" is a ${other.dimension}, not a ${dimension}`;
}

/**
 * The list's overrides after the edits: earlier overrides for untouched columns are kept, every
 * edited column gets one (a column put back to what was detected keeps its edit: that is harmless).
 */
export function overridesAfter(previous: readonly MappingOverride[], mapping: readonly ColumnMapping[], edits: Readonly<Record<number, ColumnChoice>>): MappingOverride[] {
  const edited = mapping.filter((m) => edits[m.column] !== undefined);
  const headers = new Set(edited.map((m) => m.header.trim().toLowerCase()));
  const kept = previous.filter((o) => !headers.has(o.header.trim().toLowerCase()));
  return [
    ...kept,
    ...edited.map((m) => {
      const c = edits[m.column]!;
      return { header: m.header, quantity: c.quantity, unit: c.quantity === "ignore" || c.unit.trim() === "" ? null : c.unit.trim() };
    }),
  ];
}
