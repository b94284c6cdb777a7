import { QUANTITIES } from "./quantities.ts";
import { parseUnit } from "./parseUnit.ts";
import type { Dimension, Quantity, Unit } from "./types.ts";

/** "dcr" is a DCR column that says neither typical nor maximum; the caller resolves it. */
export type HeaderQuantity = Quantity | "dcr";

export interface HeaderGuess {
  quantity: HeaderQuantity | null;
  unit: Unit | null;
  unitSource: "header" | "unit row" | null;
  /** Conditions written into the header: "Isat (100 °C)", "Isat (ΔL = 30 %)", "Irms (ΔT = 40 K)". */
  temperature: number | null;
  drop: number | null;
  rise: number | null;
  /** Set when the unit did not fit the recognised quantity, or the name was recognised by its unit. */
  note: string | null;
}

/**
 * Base names after normalisation (lower case, ASCII, single spaces, qualifiers such as "typ",
 * "max", "hot" removed). Order matters only where a name could mean two things: the unit then
 * decides ("L (uH)" is inductance, "L (mm)" is length). To add a spelling, add it to its row and a
 * case to test/catalog/recogniseHeader.test.ts.
 */
const NAMES: [RegExp, HeaderQuantity[]][] = [
  [/^(?:part(?: (?:number|no|num|nr|#|id|name|code))?|p ?n|mpn|mfr (?:part number|pn|part no)|manufacturer part (?:number|no)|item(?: (?:number|no|code))?|article(?: (?:number|no|code))?|order(?:ing)? (?:code|number|no)|model(?: (?:number|no))?|catalog(?:ue)? (?:number|no)|type (?:number|no|code)|sku|product (?:number|code|no)|part #)$/, ["partNumber"]],
  [/^(?:maker|manufacturer|mfr|mfg|mfgr|manuf|vendor|brand|make|supplier|producer|(?:manufacturer|mfr|maker) name)$/, ["maker"]],
  [/^(?:series|family|product (?:line|family|series|range)|line|series name|range|group|product group)$/, ["series"]],
  [/^(?:material|core material|core|construction|technology|core type|type|construction type|core construction|magnetic material|material type|build|core material type|winding type)$/, ["material"]],
  [/^(?:shield|shielded|shielding|magnetic shielding|shield type|shielding type|screened|screening)$/, ["shielding"]],
  [/^(?:inductance|l|l0|lo|l 0|ind|l nom|lnom|nominal inductance|inductance value|value|l value|inductance l|inductance l0|inductance l 0|zero bias inductance|l at 0 a|open circuit inductance|ocl)$/, ["inductance", "length"]],
  [/^(?:tol|tolerance|l tol|inductance tolerance|tol l|l tolerance|tolerance l|tol of l)$/, ["tolerance"]],
  [/^(?:dcr|rdc|r dc|dc r|dc resistance|resistance|dc res|winding resistance|r|dcr value|resistance dc)$/, ["dcr"]],
  [/^(?:isat hot temp(?:erature)?|hot isat temp(?:erature)?|isat temp(?:erature)?|temperature (?:for|of) hot isat|isat hot t)$/, ["isatHotTemp"]],
  [/^(?:isat|i sat|saturation current|sat current|saturation|i saturation|current saturation|isat current|saturation current isat|isat dc)$/, ["isat"]],
  [/^(?:isat drop|drop at isat|l drop|l drop at isat|inductance drop|inductance drop at isat|delta l|delta l at isat|dl|dl at isat|isat condition|isat definition|saturation drop|sat drop|drop|isat delta l|isat l drop|l roll off at isat|saturation condition)$/, ["isatDrop"]],
  [/^(?:irms|i rms|rms current|rated current|i rated|irated|ir|i r|idc|i dc|dc current|heating current|i heat|iheat|thermal current|i temp|itemp|temp rise current|temperature rise current|current rating|rated dc current|heat rating current|current|i rise|irise)$/, ["irms"]],
  [/^(?:irms rise|rise|temperature rise|temp rise|delta t|dt|rise at irms|irms delta t|heating rise|delta t at i ?rated|delta t at irms|irms condition|i ?rated condition|rated current condition|i ?rated delta t|rise at rated current|temperature rise at irms|temp rise at irms)$/, ["irmsRise"]],
  [/^(?:srf|self resonant frequency|self resonance frequency|self resonant freq|resonant frequency|resonance frequency|f res|fres|fsr|res freq|f0|self resonance|srf frequency|frequency self resonant)$/, ["srf"]],
  [/^(?:length|len|size l|dimension l|dim l|l dim|l length|length l|a)$/, ["length"]],
  [/^(?:width|w|wid|size w|dimension w|dim w|width w|b)$/, ["width"]],
  [/^(?:height|h|ht|thickness|t|profile|size h|dimension h|dim h|height h|seated height|c)$/, ["height"]],
  [/^(?:l x w x h|lxwxh|l w h|lwh|size|dimensions|dimension|dims|case size|package size|body size|l x w|lxw|size l x w x h|dimensions l x w x h|outline|outline dimensions)$/, ["dimensions"]],
  [/^(?:price|unit price|cost|price each|price per unit|unit cost|price 1k|price usd|budget price|list price|price qty|price per 1000|price 1000)$/, ["price"]],
  [/^(?:roll off exponent|rolloff exponent|roll off n|saturation exponent|knee exponent|roll off|n roll off|bias exponent|rolloff)$/, ["rollOffExponent"]],
  [/^(?:ac factor|rac rdc|rac over rdc|ac resistance factor|kac|ac resistance ratio|rac factor|fr|ac dc resistance ratio)$/, ["acFactor"]],
  [/^(?:steinmetz k|k steinmetz|core loss k|kc|k core|steinmetz coefficient|k)$/, ["coreK"]],
  [/^(?:steinmetz alpha|alpha steinmetz|alpha|core loss alpha)$/, ["coreAlpha"]],
  [/^(?:steinmetz beta|beta steinmetz|beta|core loss beta)$/, ["coreBeta"]],
  [/^(?:b per amp|b per a|b per ampere|flux density per amp(?:ere)?|flux per amp|b i|b a|b over i|bpk per a|b per current|b per amp at zero bias)$/, ["bPerAmp"]],
  [/^(?:core volume|ve|effective volume|volume|v e|effective core volume|core ve)$/, ["coreVolume"]],
];

const HAS_LETTER = /[A-Za-zα-ωΑ-Ω]/;
const FLAG_WORDS = /\b(typ|typical|nom|nominal|max|maximum|min|minimum|hot)\b/g;
const BRACKETS = /\(([^()]*)\)|\[([^[\]]*)\]|\{([^{}]*)\}/g;
const TEMPERATURE = /(-?\d+(?:[.,]\d+)?)\s*(?:°\s*C|℃|deg\.?\s*C)/i;
const BARE_TEMPERATURE = /(?:@|\(|\bat\s)\s*(-?\d+(?:[.,]\d+)?)\s*C\b/;
const DROP = /(\d+(?:[.,]\d+)?)\s*%/;
const RISE = /(?:Δ|δ|delta\s*|\bd)T\s*[=:]?\s*(\d+(?:[.,]\d+)?)|(\d+(?:[.,]\d+)?)\s*(?:K|°\s*C)\s*rise|rise\s*(?:of\s*)?(\d+(?:[.,]\d+)?)\s*(?:K|°\s*C)/i;

function num(text: string | undefined): number | null {
  if (text === undefined) return null;
  const v = Number(text.replace(",", "."));
  return Number.isFinite(v) ? v : null;
}

/** Lower-case ASCII words: α → alpha, Δ → delta, µ → u, Ω → ohm, × → x. */
export function normaliseHeaderName(text: string): string {
  return text
    .toLowerCase()
    .replace(/α/g, " alpha ")
    .replace(/β/g, " beta ")
    .replace(/[δΔ]/g, " delta ")
    .replace(/[\u00b5\u03bc]/g, "u")
    .replace(/[\u03a9\u2126]/g, "ohm")
    .replace(/×/g, " x ")
    .replace(/[^a-z0-9#]+/g, " ")
    .trim();
}

function candidatesFor(name: string): HeaderQuantity[] {
  for (const [pattern, quantities] of NAMES) if (pattern.test(name)) return quantities;
  return [];
}

function dimensionOf(q: HeaderQuantity): Dimension {
  return q === "dcr" ? "resistance" : QUANTITIES[q].dimension;
}

function isUnitless(q: HeaderQuantity): boolean {
  const d = dimensionOf(q);
  return d === "text" || d === "number";
}

/** Unit named by a bracket's content: the whole ("mΩ"), or one word of it ("mΩ, max"). */
function unitIn(content: string): { unitText: string; rest: string } | null {
  if (parseUnit(content) !== null) return { unitText: content, rest: "" };
  const words = content.split(/[,;\s]+/).filter((w) => w !== "");
  for (let i = 0; i < words.length; i++) {
    const word = words[i] as string;
    // Single letters and "in" inside a bracket are more often words than units.
    if (parseUnit(word) !== null && !/^(?:[a-z]|in)$/i.test(word)) {
      return { unitText: word, rest: words.filter((_, j) => j !== i).join(" ") };
    }
  }
  return null;
}

function analyse(text: string): { base: string; flags: Set<string>; candidates: HeaderQuantity[] } {
  const flags = new Set<string>();
  const base = normaliseHeaderName(text)
    .replace(FLAG_WORDS, (w) => {
      flags.add(w);
      return " ";
    })
    .replace(/\s+/g, " ")
    .trim();
  return { base, flags, candidates: candidatesFor(base) };
}

function resolve(base: HeaderQuantity[], flags: Set<string>, temperature: number | null): HeaderQuantity[] {
  return base.map((q) => {
    if (q === "dcr") {
      if (flags.has("typ") || flags.has("typical") || flags.has("nom") || flags.has("nominal")) return "dcrTyp";
      return flags.has("max") || flags.has("maximum") ? "dcrMax" : "dcr";
    }
    // Isat stated hot ("Isat hot", "Isat (100 °C)") is a separate figure from Isat at 25 °C.
    if (q === "isat" && (flags.has("hot") || (temperature !== null && temperature >= 50))) return "isatHot";
    return q;
  });
}

function fits(q: HeaderQuantity, unitText: string): boolean {
  return !isUnitless(q) && parseUnit(unitText, dimensionOf(q) as Dimension) !== null;
}

/**
 * Recognises one column header: the quantity it names, the unit of its bare numbers and any
 * condition written into it. `unitRowCell` is the cell of a unit row above or below the header.
 */
export function recogniseHeader(header: string, unitRowCell = ""): HeaderGuess {
  const guess: HeaderGuess = { quantity: null, unit: null, unitSource: null, temperature: null, drop: null, rise: null, note: null };
  // Every known name has a letter and none is long; data cells ("4.7", long notes) leave early.
  if (header.length > 80 || !HAS_LETTER.test(header)) return guess;
  guess.temperature = num(TEMPERATURE.exec(header)?.[1] ?? BARE_TEMPERATURE.exec(header)?.[1]);
  const rise = RISE.exec(header);
  guess.rise = rise === null ? null : num(rise[1] ?? rise[2] ?? rise[3]);
  const drop = DROP.exec(header);
  guess.drop = drop === null ? null : (num(drop[1]) ?? 0) / 100;

  let unitText: string | null = null;
  let bare = "";
  let named = header.replace(BRACKETS, (_m, a?: string, b?: string, c?: string) => {
    const content = (a ?? b ?? c ?? "").trim();
    const found = unitText === null ? unitIn(content) : null;
    if (found !== null) {
      unitText = found.unitText;
      return ` ${found.rest} `;
    }
    // Conditions (anything with a figure) are read above; other words ("typ") may be part of the name.
    return /\d/.test(content) ? " " : ` ${content} `;
  });
  bare = header.replace(BRACKETS, " ");
  const cut = (t: string) => (t.includes("@") ? t.slice(0, t.indexOf("@")) : t);
  named = cut(named);
  bare = cut(bare);
  let found = analyse(named);
  if (found.candidates.length === 0) found = analyse(bare);
  if (unitText === null && found.candidates.length === 0) {
    // "L / µH", "DCR mOhm", "Length in mm", "Isat A": a unit after a slash or as the last word.
    const slash = /^(.*\S)\s*\/\s*([^/]+)$/.exec(named.trim());
    const words = named.trim().split(/\s+/);
    const tries: [string, string][] = [];
    if (slash !== null) tries.push([slash[1] as string, (slash[2] as string).trim()]);
    if (words.length > 1) {
      const shorter = words.slice(0, -1);
      if (shorter.length > 1 && shorter[shorter.length - 1]?.toLowerCase() === "in") shorter.pop();
      tries.push([shorter.join(" "), words[words.length - 1] as string]);
    }
    for (const [text, candidateUnit] of tries) {
      const a = analyse(text);
      if (a.candidates.some((q) => fits(q, candidateUnit))) {
        unitText = candidateUnit;
        found = a;
        break;
      }
    }
  }
  if (unitText !== null) guess.unitSource = "header";
  else if (unitRowCell.trim() !== "" && parseUnit(unitRowCell) !== null) {
    unitText = unitRowCell.trim();
    guess.unitSource = "unit row";
  }
  const resolved = resolve(found.candidates, found.flags, guess.temperature);
  const text = unitText as string | null;
  if (text === null) {
    guess.quantity = resolved[0] ?? null;
    return guess;
  }
  const fitting = resolved.find((q) => fits(q, text));
  if (fitting !== undefined) {
    guess.quantity = fitting;
    guess.unit = parseUnit(text, dimensionOf(fitting) as Dimension);
    return guess;
  }
  if (resolved.length > 0) {
    const q = resolved[0] as HeaderQuantity;
    guess.quantity = q;
    guess.unitSource = null;
    if (!isUnitless(q)) guess.note = `unit "${text}" does not fit a ${dimensionOf(q)}; ignored`;
    return guess;
  }
  // An unknown name with an unmistakable unit: "Lx (µH)" is an inductance, "Fr (MHz)" an SRF.
  const byUnit: Partial<Record<Dimension, HeaderQuantity>> = { inductance: "inductance", frequency: "srf", resistance: "dcr" };
  const unit = parseUnit(text);
  const q = unit === null ? undefined : byUnit[unit.dimension];
  if (q !== undefined && unit !== null && found.base !== "") {
    guess.quantity = q;
    guess.unit = unit;
    guess.note = `recognised by its unit (${unit.symbol})`;
  } else guess.unitSource = null;
  return guess;
}
