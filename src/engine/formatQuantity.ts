const PREFIXES: [number, string][] = [
  [1e9, "G"],
  [1e6, "M"],
  [1e3, "k"],
  [1, ""],
  [1e-3, "m"],
  [1e-6, "µ"],
  [1e-9, "n"],
  [1e-12, "p"],
];

/** Engineering notation with an SI prefix, e.g. formatQuantity(4.7e-6, "H") = "4.7 µH". */
export function formatQuantity(value: number | null, unit: string, digits = 3): string {
  if (value === null || Number.isNaN(value)) return "—";
  if (!Number.isFinite(value)) return value > 0 ? `∞ ${unit}` : `−∞ ${unit}`;
  if (value === 0) return `0 ${unit}`;
  const magnitude = Math.abs(value);
  for (const [scale, prefix] of PREFIXES) {
    if (magnitude >= scale * 0.9995) {
      return `${trim((value / scale).toPrecision(digits))} ${prefix}${unit}`;
    }
  }
  return `${trim(value.toPrecision(digits))} ${unit}`;
}

/** Percentage with sign, e.g. formatPercent(0.2) = "20 %". */
export function formatPercent(fraction: number | null, digits = 3): string {
  if (fraction === null || !Number.isFinite(fraction)) return "—";
  return `${trim((fraction * 100).toPrecision(digits))} %`;
}

function trim(text: string): string {
  return text.includes("e") ? String(Number(text)) : text.replace(/(\.\d*?)0+$/, "$1").replace(/\.$/, "");
}
