import { QUANTITY_KEYS, QUANTITIES } from "./quantities.ts";
import { parseUnit } from "./parseUnit.ts";
import type { MappingOverride, Quantity } from "./types.ts";

const IGNORE = new Set(["ignore", "none", "unrecognised", "unrecognized", "skip"]);

/**
 * Parses "Header=quantity:unit" (unit optional; "Header=ignore" unmaps a column). The header is
 * everything before the last "=", so headers that contain "=" still work. Returns the override,
 * or a message saying what is wrong.
 */
export function parseMappingOverride(text: string): MappingOverride | string {
  const eq = text.lastIndexOf("=");
  if (eq <= 0) return `expected "Header=quantity:unit", e.g. "L (nH)=inductance:nH"; got "${text}"`;
  const header = text.slice(0, eq).trim();
  const target = text.slice(eq + 1).trim();
  if (header === "") return `no header before "=" in "${text}"`;
  const colon = target.indexOf(":");
  const quantityText = (colon < 0 ? target : target.slice(0, colon)).trim();
  const unitText = colon < 0 ? null : target.slice(colon + 1).trim();
  if (IGNORE.has(quantityText.toLowerCase())) {
    if (unitText !== null && unitText !== "") return `"${quantityText}" takes no unit`;
    return { header, quantity: "ignore", unit: null };
  }
  const quantity = QUANTITY_KEYS.find((q) => q.toLowerCase() === quantityText.toLowerCase()) as Quantity | undefined;
  if (quantity === undefined) {
    return `unknown quantity "${quantityText}"; known: ${QUANTITY_KEYS.join(", ")}, ignore`;
  }
  const spec = QUANTITIES[quantity];
  if (unitText === null || unitText === "") return { header, quantity, unit: null };
  if (spec.dimension === "text" || spec.dimension === "number") return `${quantity} takes no unit (got "${unitText}")`;
  if (spec.dimension === "currency") return { header, quantity, unit: unitText };
  if (parseUnit(unitText, spec.dimension) === null) {
    const other = parseUnit(unitText);
    return other === null
      ? `unknown unit "${unitText}" for ${quantity} (a ${spec.dimension})`
      : `unit "${unitText}" is a ${other.dimension}, but ${quantity} is a ${spec.dimension}`;
  }
  return { header, quantity, unit: unitText };
}
