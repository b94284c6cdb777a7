import type { Dimension, Unit } from "./types.ts";

type Entry = [spellings: string[], dimension: Dimension, factor: number, symbol: string, offset?: number];

/**
 * Every unit spelling the importer knows, in the normalised form of `normaliseUnitText`
 * (µ and μ → "u", Ω → "ohm", no spaces, ³ → 3). Lookup is exact first, then case-insensitive,
 * so "mhz" still reads as MHz (nobody lists milli-hertz) while "MΩ" stays a megohm.
 * To add a spelling, append it to the right row; the mathjs cross-check test lists one case each.
 */
const ENTRIES: Entry[] = [
  [["H", "henry", "henries", "henrys"], "inductance", 1, "H"],
  [["mH", "millihenry", "millihenries", "millihenrys"], "inductance", 1e-3, "mH"],
  [["uH", "microhenry", "microhenries", "microhenrys"], "inductance", 1e-6, "µH"],
  [["nH", "nanohenry", "nanohenries", "nanohenrys"], "inductance", 1e-9, "nH"],
  [["pH", "picohenry"], "inductance", 1e-12, "pH"],

  [["ohm", "ohms", "Ohm", "Ohms", "R"], "resistance", 1, "Ω"],
  [["mohm", "mOhm", "mohms", "mOhms", "milliohm", "milliohms", "mR"], "resistance", 1e-3, "mΩ"],
  [["uohm", "uOhm", "microohm", "microohms", "micro-ohm"], "resistance", 1e-6, "µΩ"],
  [["kohm", "kOhm", "kiloohm", "kiloohms", "kR"], "resistance", 1e3, "kΩ"],
  [["Mohm", "MOhm", "megohm", "megohms", "megaohm"], "resistance", 1e6, "MΩ"],

  [["A", "amp", "amps", "ampere", "amperes", "Adc", "Arms"], "current", 1, "A"],
  [["mA", "milliamp", "milliamps", "milliampere", "milliamperes", "mAdc", "mArms"], "current", 1e-3, "mA"],
  [["uA", "microamp", "microamps", "microampere"], "current", 1e-6, "µA"],
  [["kA", "kiloamp", "kiloampere"], "current", 1e3, "kA"],

  [["Hz", "hertz"], "frequency", 1, "Hz"],
  [["kHz", "kilohertz"], "frequency", 1e3, "kHz"],
  [["MHz", "megahertz"], "frequency", 1e6, "MHz"],
  [["GHz", "gigahertz"], "frequency", 1e9, "GHz"],

  [["m", "meter", "meters", "metre", "metres"], "length", 1, "m"],
  [["mm", "millimeter", "millimeters", "millimetre", "millimetres"], "length", 1e-3, "mm"],
  [["cm", "centimeter", "centimeters", "centimetre", "centimetres"], "length", 1e-2, "cm"],
  [["um", "micron", "microns", "micrometer", "micrometre"], "length", 1e-6, "µm"],
  // International inch (1959 agreement): exactly 25.4 mm; a mil (thou) is a thousandth of it.
  [["in", "inch", "inches", '"', "''"], "length", 0.0254, "in"],
  [["mil", "mils", "thou"], "length", 2.54e-5, "mil"],

  [["%", "percent", "pct"], "fraction", 0.01, "%"],
  [["fraction", "1"], "fraction", 1, "fraction"],

  // A temperature difference in °C equals one in K; an absolute K is offset by 273.15.
  [["K", "kelvin", "C", "degC", "deg", "degK"], "temperatureRise", 1, "K"],
  [["C", "degC", "celsius"], "temperature", 1, "°C"],
  [["K", "kelvin"], "temperature", 1, "°C", -273.15],

  [["USD", "$", "US$", "usd", "EUR", "€", "GBP", "£", "JPY", "¥", "CNY", "RMB", "CHF"], "currency", 1, ""],

  [["T/A", "TperA", "T/amp", "tesla/A"], "fluxPerCurrent", 1, "T/A"],
  [["mT/A", "mTperA", "mT/amp"], "fluxPerCurrent", 1e-3, "mT/A"],
  [["uT/A", "uTperA"], "fluxPerCurrent", 1e-6, "µT/A"],
  // 1 gauss = 1e-4 tesla (CGS).
  [["G/A", "GperA", "gauss/A"], "fluxPerCurrent", 1e-4, "G/A"],

  [["m3"], "volume", 1, "m³"],
  [["cm3", "cc"], "volume", 1e-6, "cm³"],
  [["mm3"], "volume", 1e-9, "mm³"],
];

function build(): { exact: Map<string, Unit[]>; folded: Map<string, Unit[]> } {
  const exact = new Map<string, Unit[]>();
  const folded = new Map<string, Unit[]>();
  const add = (map: Map<string, Unit[]>, key: string, unit: Unit) => {
    const list = map.get(key);
    if (list === undefined) map.set(key, [unit]);
    else if (!list.some((u) => u.dimension === unit.dimension)) list.push(unit);
  };
  for (const [spellings, dimension, factor, symbol, offset] of ENTRIES) {
    for (const spelling of spellings) {
      const unit: Unit = { dimension, factor, exponent: powerOfTen(factor), offset: offset ?? 0, symbol: symbol === "" ? spelling : symbol };
      add(exact, spelling, unit);
      add(folded, spelling.toLowerCase(), unit);
    }
  }
  return { exact, folded };
}

const TABLE = build();

/** µ/μ → u, Ω/Ω → ohm, ° dropped, ³/^3 → 3, spaces and a trailing dot dropped, brackets stripped. */
export function normaliseUnitText(text: string): string {
  let t = text.trim();
  while (/^[([{].*[)\]}]$/.test(t)) t = t.slice(1, -1).trim();
  return t
    .replace(/[\u00b5\u03bc]/g, "u")
    .replace(/[\u03a9\u2126]/g, "ohm")
    .replace(/\u2103/g, "C")
    .replace(/\u00b0/g, "")
    .replace(/\u00b3|\^3/g, "3")
    .replace(/\s+/g, "")
    .replace(/\.$/, "");
}

/**
 * The unit a text names, in the given dimension when one is asked for, else the first match.
 * Null when the text is no unit we know (or none of that dimension).
 */
export function parseUnit(text: string, dimension?: Dimension): Unit | null {
  const key = normaliseUnitText(text);
  if (key === "") return null;
  const candidates = TABLE.exact.get(key) ?? TABLE.folded.get(key.toLowerCase());
  if (candidates === undefined) return null;
  if (dimension === undefined) return candidates[0] ?? null;
  return candidates.find((u) => u.dimension === dimension) ?? null;
}

export function powerOfTen(factor: number): number | null {
  const e = Math.round(Math.log10(factor));
  return Math.abs(10 ** e / factor - 1) < 1e-12 ? e : null;
}

const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];
const SI: Unit = { dimension: "number", factor: 1, exponent: 0, offset: 0, symbol: "" };

/**
 * A plain decimal text ("13.3", "-4", "0,47" with a decimal comma) in the unit → SI, NaN when the
 * text is anything else. The result is the double nearest the decimal value ("13.3" mΩ is 0.0133,
 * where 13.3 × 0.001 is 0.013300000000000001): the digits are read as an integer and scaled once
 * by an exact power of ten, and with both operands exact (integer < 2^53, 10^k for k ≤ 22) one
 * IEEE operation rounds correctly (Clinger's fast path). Longer texts return NaN.
 */
export function plainDecimalToSi(text: string, unit: Unit | null, decimalComma = false): number {
  return plainDecimalInRange(text, 0, text.length, unit, decimalComma);
}

/** plainDecimalToSi of text.slice(start, end), read in place without the slice. */
export function plainDecimalInRange(text: string, start: number, end: number, unit: Unit | null, decimalComma: boolean): number {
  const u = unit ?? SI;
  const length = end - start;
  if (length <= 0 || length > 15) return NaN;
  const pointChar = decimalComma ? 44 : 46;
  let i = text.charCodeAt(start) === 45 ? start + 1 : start;
  const negative = i !== start;
  if (i === end) return NaN;
  let mantissa = 0;
  let decimals = 0;
  let point = false;
  let digits = 0;
  for (; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      digits++;
      if (point) decimals++;
    } else if (c === pointChar && !point && digits > 0) point = true;
    else return NaN;
  }
  if (point && decimals === 0) return NaN;
  const shift = (u.exponent ?? 0) - decimals;
  if (shift > 22 || shift < -22) return NaN;
  let v = shift >= 0 ? mantissa * (POW10[shift] as number) : mantissa / (POW10[-shift] as number);
  if (negative) v = -v;
  return u.exponent === null ? v * u.factor + u.offset : v + u.offset;
}

/** A decimal text ("4.7", "1.5e3") in the unit → SI, nearest to the decimal value where it can. */
export function toSiText(text: string, unit: Unit): number {
  const plain = plainDecimalToSi(text, unit);
  if (!Number.isNaN(plain)) return plain;
  const e = unit.exponent;
  if (e === null) return Number(text) * unit.factor + unit.offset;
  const at = text.indexOf("e");
  const scaledText = at < 0 ? `${text}e${e}` : `${text.slice(0, at)}e${Number(text.slice(at + 1)) + e}`;
  return Number(scaledText) + unit.offset;
}

/** All dimensions a unit text can belong to ("K" is a rise or an absolute temperature). */
export function unitDimensions(text: string): Dimension[] {
  const key = normaliseUnitText(text);
  const candidates = TABLE.exact.get(key) ?? TABLE.folded.get(key.toLowerCase()) ?? [];
  return candidates.map((u) => u.dimension);
}

/** SI prefixes allowed alone after a number in a cell ("470n", "4.7µ", "2.2m" in an Ω column). */
export const SI_PREFIX: Readonly<Record<string, number>> = {
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  "\u00b5": 1e-6,
  "\u03bc": 1e-6,
  m: 1e-3,
  k: 1e3,
  K: 1e3,
  M: 1e6,
  G: 1e9,
};

/** SI base symbol of each dimension, for messages and the mapping list. */
export const SI_SYMBOL: Readonly<Record<Dimension, string>> = {
  text: "",
  inductance: "H",
  resistance: "Ω",
  current: "A",
  frequency: "Hz",
  length: "m",
  fraction: "fraction",
  temperatureRise: "K",
  temperature: "°C",
  currency: "",
  fluxPerCurrent: "T/A",
  volume: "m³",
  number: "",
};
