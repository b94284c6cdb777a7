import { formatPercent, formatQuantity } from "../engine/formatQuantity.ts";
import { engineeringText, parseEngineering, type Parsed } from "./engNotation.ts";
import type { FieldKind, SpecField } from "./specFields.ts";
import { assertNever } from "../engine/assertNever.ts";

/** A field's text read: the value for the spec (undefined = leave the key out) and how it reads back. */
export type FieldReading = { ok: true; value: number | string | null | undefined; shown: string } | { ok: false; message: string };

const LENGTH_UNITS: Readonly<Record<string, number>> = { mm: 1e-3, cm: 1e-2, m: 1, in: 0.0254, inch: 0.0254, mil: 2.54e-5, um: 1e-6, µm: 1e-6 };
const plain = (x: number) => String(Number(x.toPrecision(4)));

function parseLength(text: string): Parsed {
  const m = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([a-zµ"]*)\s*$/i.exec(text.replace(",", "."));
  if (m === null) return { ok: false, message: `"${text.trim()}" is not a length (e.g. 5 or 5 mm)` };
  const unit = (m[2] ?? "").toLowerCase().replace('"', "in");
  const factor = unit === "" ? 1e-3 : LENGTH_UNITS[unit];
  if (factor === undefined) return { ok: false, message: `"${m[2]}" is not a length unit (mm, cm, m, in, mil)` };
  return { ok: true, value: Number(m[1]) * factor };
}

function parseArea(text: string): Parsed {
  const m = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(mm2|mm²|mm\^2)?\s*$/i.exec(text.replace(",", "."));
  if (m === null) return { ok: false, message: `"${text.trim()}" is not an area in mm² (e.g. 25)` };
  return { ok: true, value: Number(m[1]) * 1e-6 };
}

function parseKind(kind: Exclude<FieldKind, { type: "choice" }>, text: string): Parsed {
  switch (kind.type) {
    case "quantity":
      return parseEngineering(text, kind.unit === "Ω" ? "ohm" : kind.unit, kind.unit === "Ω" ? ["R"] : []);
    case "mm":
      return parseLength(text);
    case "mm2":
      return parseArea(text);
    case "percent": {
      const r = parseEngineering(text.replace(/%\s*$/, ""), "");
      return r.ok ? { ok: true, value: r.value / 100 } : r;
    }
    case "number":
      return parseEngineering(text, "");
    case "celsius":
      return parseEngineering(text, "C", ["degC"]);
    case "kelvin":
      return parseEngineering(text, "K");
    case "price":
      return parseEngineering(text.replace(/^\s*[$€£¥]/, "").replace(/\s*(USD|EUR|GBP)\s*$/i, ""), "");
    default:
      return assertNever(kind);
  }
}

/** How a stored value reads back beside the field ("= 500 kHz"). */
export function showValue(kind: FieldKind, value: number | string): string {
  if (typeof value === "string") {
    if (kind.type === "choice") return kind.options.find((o) => o.value === value)?.label ?? value;
    return value;
  }
  switch (kind.type) {
    case "choice":
      return String(value);
    case "quantity":
      return formatQuantity(value, kind.unit, 4);
    case "mm":
      return `${plain(value * 1e3)} mm`;
    case "mm2":
      return `${plain(value * 1e6)} mm²`;
    case "percent":
      return formatPercent(value, 4);
    case "number":
    case "price":
      return plain(value);
    case "celsius":
      return `${plain(value)} °C`;
    case "kelvin":
      return `${plain(value)} K`;
    default:
      return assertNever(kind);
  }
}

/** The text a field starts with for a stored value. */
export function valueText(kind: FieldKind, value: number | string | null | undefined): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "string") return value;
  switch (kind.type) {
    case "quantity": {
      const magnitude = Math.abs(value);
      // Volts and amps read best as plain decimals in the usual range; Hz and Ω with prefixes.
      if ((kind.unit === "V" || kind.unit === "A") && (magnitude === 0 || (magnitude >= 0.01 && magnitude < 1000))) return plain6(value);
      return engineeringText(value);
    }
    case "mm":
      return plain6(value * 1e3);
    case "mm2":
      return plain6(value * 1e6);
    case "percent":
      return plain6(value * 100);
    case "choice":
    case "number":
    case "celsius":
    case "kelvin":
    case "price":
      return plain6(value);
    default:
      return assertNever(kind);
  }
}

function plain6(x: number): string {
  return String(Number(x.toPrecision(6)));
}

/** Reads one field's text, applying what a blank means for it. */
export function readField(field: SpecField, text: string): FieldReading {
  const trimmed = text.trim();
  if (trimmed === "") {
    switch (field.blank.type) {
      case "required":
        return { ok: false, message: "enter a value" };
      case "none":
        return { ok: true, value: null, shown: "no limit" };
      case "default":
        return {
          ok: true,
          value: undefined,
          shown: `default: ${field.blank.label ?? showValue(field.kind, field.blank.value)}`,
        };
      default:
        return assertNever(field.blank);
    }
  }
  if (field.kind.type === "choice") {
    const option = field.kind.options.find((o) => o.value === trimmed);
    return option === undefined
      ? { ok: false, message: `choose one of: ${field.kind.options.map((o) => o.label).join(", ")}` }
      : { ok: true, value: option.value, shown: option.label };
  }
  const parsed = parseKind(field.kind, trimmed);
  return parsed.ok ? { ok: true, value: parsed.value, shown: showValue(field.kind, parsed.value) } : parsed;
}
