/**
 * Numbers as engineers type them: "4.7u", "500k", "30m", "2.2 µH", "1e-6", "4R7", "3,3".
 * SI prefixes are case-sensitive where it matters: m is milli, M (or "meg") is mega.
 */
export type Parsed = { ok: true; value: number } | { ok: false; message: string };

const PREFIX: Readonly<Record<string, number>> = {
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  µ: 1e-6,
  μ: 1e-6,
  m: 1e-3,
  k: 1e3,
  K: 1e3,
  M: 1e6,
  meg: 1e6,
  MEG: 1e6,
  Meg: 1e6,
  G: 1e9,
};

const NUMBER = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;
/** "4R7" = 4.7, "R033" = 0.033 (resistor and inductor marking). */
const R_NOTATION = /^(\d*)[Rr](\d+)$/;

function normaliseUnit(text: string): string {
  return text.replace(/Ω/g, "ohm").replace(/Ohm|OHM/g, "ohm").replace(/ohms$/, "ohm").replace(/°/g, "").trim();
}

/**
 * Parses `text` as a quantity in `unit` (a base unit such as "V", "A", "Hz", "ohm", "H").
 * Accepts an SI prefix, the unit itself, both or neither; anything else is refused with a
 * message that says what was expected.
 */
export function parseEngineering(text: string, unit: string, aliases: readonly string[] = []): Parsed {
  const raw = text.trim();
  if (raw === "") return { ok: false, message: "enter a value" };
  const r = R_NOTATION.exec(raw);
  if (r !== null) return { ok: true, value: Number(`${r[1] === "" ? "0" : r[1]}.${r[2]}`) };
  let source = raw;
  if (/^[+-]?\d*,\d+/.test(source) && !source.includes(".")) {
    // A lone decimal comma ("3,3") is read as a point; "1,000" is ambiguous and refused.
    if (/^[+-]?\d{1,3},\d{3}(?!\d)/.test(source)) return { ok: false, message: `"${raw}" is ambiguous: write 1000 or 1k, or 1.000 for one` };
    source = source.replace(",", ".");
  }
  const m = NUMBER.exec(source);
  if (m === null) return { ok: false, message: `"${raw}" is not a number (e.g. 4.7, 500k, 30m)` };
  const value = Number(m[1]);
  const rest = normaliseUnit(m[2] ?? "");
  const units = [normaliseUnit(unit), ...aliases.map(normaliseUnit)].filter((u) => u !== "");
  if (rest === "") return finite(value, raw);
  for (const u of units) {
    if (rest === u || rest.toLowerCase() === u.toLowerCase()) return finite(value, raw);
  }
  for (const [prefix, factor] of Object.entries(PREFIX).sort((a, b) => b[0].length - a[0].length)) {
    if (!rest.startsWith(prefix)) continue;
    const after = rest.slice(prefix.length).trim();
    if (after === "" || units.some((u) => after === u || after.toLowerCase() === u.toLowerCase())) return finite(value * factor, raw);
  }
  const expected = units.length > 0 ? ` or ${units[0]}` : "";
  return { ok: false, message: `"${m[2]?.trim()}" is not a unit here: use an SI prefix (p n u m k M G)${expected}` };
}

function finite(value: number, raw: string): Parsed {
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `"${raw}" is out of range` };
}

const INPUT_PREFIXES: [number, string][] = [
  [1e9, "G"],
  [1e6, "M"],
  [1e3, "k"],
  [1, ""],
  [1e-3, "m"],
  [1e-6, "u"],
  [1e-9, "n"],
  [1e-12, "p"],
];

/** The short text a field starts with for a value, e.g. 500000 → "500k", 0.03 → "30m", 12 → "12". */
export function engineeringText(value: number): string {
  if (value === 0 || !Number.isFinite(value)) return String(value);
  const magnitude = Math.abs(value);
  for (const [scale, prefix] of INPUT_PREFIXES) {
    if (magnitude >= scale * 0.9995) return `${Number((value / scale).toPrecision(6))}${prefix}`;
  }
  return String(Number(value.toPrecision(6)));
}
