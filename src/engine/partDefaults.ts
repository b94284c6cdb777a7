import type { CoreLossData, Part, SaturationCharacter } from "./types.ts";

/**
 * Defaults for what part lists often leave out. Each one leans to the conservative side
 * and is stated in the README and the report.
 */
export const PART_DEFAULTS = {
  /** Isat defined at a 30 % drop predicts more roll-off below Isat than 10 % or 20 % would. */
  isatDrop: 0.3,
  /** Common practice: heating current is usually rated for a 40 K rise. */
  irmsRise: 40,
  /** Common practice: makers state DCR at 20–25 °C; 25 °C is the more common. */
  dcrTemp: 25,
  /** Without a construction column, treat Isat as a cliff (sharp ferrite-like knee). */
  saturation: "hard" as SaturationCharacter,
  acFactor: 1,
  /** Hot Isat stated without a temperature is taken at 100 °C (common practice). */
  isatHotTemp: 100,
} as const;

/** n of L0/(1 + (|i|/Ik)^n): hard ≈ 6–10, soft ≈ 1.5–3 (textbook fits, from memory). */
export const ROLL_OFF_EXPONENT: Record<SaturationCharacter, number> = { hard: 8, soft: 2 };

/** Materials whose saturation is gradual; everything else named ferrite is hard. */
const SOFT_MATERIAL = /(powder|iron|alloy|composite|metal|molded|moulded|sendust|kool|mpp|high.?flux|amorphous|nanocrystal|carbonyl)/i;
const HARD_MATERIAL = /(ferrite|mn.?zn|ni.?zn|nizn|mnzn)/i;

/** Saturation character implied by a material/construction text, null when it says nothing. */
export function saturationFromMaterial(material: string | null): SaturationCharacter | null {
  if (material === null) return null;
  // A list repeats a handful of material texts over thousands of rows: remember the answers.
  const known = materialCache.get(material);
  if (known !== undefined) return known;
  const character = HARD_MATERIAL.test(material) ? "hard" : SOFT_MATERIAL.test(material) ? "soft" : null;
  if (materialCache.size >= MATERIAL_CACHE_LIMIT) materialCache.clear();
  materialCache.set(material, character);
  return character;
}

const materialCache = new Map<string, SaturationCharacter | null>();
const MATERIAL_CACHE_LIMIT = 1024;

export type PartInput = Pick<Part, "partNumber" | "inductance"> & Partial<Omit<Part, "partNumber" | "inductance">>;

/** The numeric fields of a Part, in the order of a field table (see partFromFields). */
export const PART_NUMBER_FIELDS = [
  "inductance",
  "tolerance",
  "dcrTyp",
  "dcrMax",
  "dcrTemp",
  "isat",
  "isatDrop",
  "isatHot",
  "isatHotTemp",
  "irms",
  "irmsRise",
  "srf",
  "length",
  "width",
  "height",
  "price",
  "rollOffExponent",
  "acFactor",
] as const satisfies readonly (keyof Part)[];
export type PartNumberField = (typeof PART_NUMBER_FIELDS)[number];
/** Index of each numeric field in a field table. */
export const PART_FIELD_SLOT = Object.fromEntries(PART_NUMBER_FIELDS.map((f, i) => [f, i])) as Record<PartNumberField, number>;
const S = PART_FIELD_SLOT;

/** The fields of a Part that are not numbers; null or undefined where not given. */
export interface PartTexts {
  partNumber: string;
  maker?: string | null;
  series?: string | null;
  material?: string | null;
  saturation?: SaturationCharacter | null;
  coreLoss?: CoreLossData | null;
}

function known(v: number): number | null {
  return Number.isNaN(v) ? null : v;
}

function given(v: number, fallback: number): number {
  return Number.isNaN(v) ? fallback : v;
}

/**
 * Fills every optional field of a part with its stated default, from its texts and a table of its
 * numbers (PART_NUMBER_FIELDS order, NaN where not given). The importer's form: a reused
 * Float64Array holds a row's numbers unboxed, where a reused object would box every one.
 */
export function partFromFields(texts: PartTexts, fields: Float64Array): Part {
  const material = texts.material ?? null;
  const saturation = texts.saturation ?? saturationFromMaterial(material) ?? PART_DEFAULTS.saturation;
  const isatHot = known(fields[S.isatHot] as number);
  return {
    partNumber: texts.partNumber,
    maker: texts.maker ?? null,
    series: texts.series ?? null,
    material,
    inductance: fields[S.inductance] as number,
    tolerance: known(fields[S.tolerance] as number),
    dcrTyp: known(fields[S.dcrTyp] as number),
    dcrMax: known(fields[S.dcrMax] as number),
    dcrTemp: given(fields[S.dcrTemp] as number, PART_DEFAULTS.dcrTemp),
    isat: known(fields[S.isat] as number),
    isatDrop: given(fields[S.isatDrop] as number, PART_DEFAULTS.isatDrop),
    isatHot,
    isatHotTemp: isatHot === null ? known(fields[S.isatHotTemp] as number) : given(fields[S.isatHotTemp] as number, PART_DEFAULTS.isatHotTemp),
    irms: known(fields[S.irms] as number),
    irmsRise: given(fields[S.irmsRise] as number, PART_DEFAULTS.irmsRise),
    srf: known(fields[S.srf] as number),
    length: known(fields[S.length] as number),
    width: known(fields[S.width] as number),
    height: known(fields[S.height] as number),
    price: known(fields[S.price] as number),
    saturation,
    rollOffExponent: given(fields[S.rollOffExponent] as number, ROLL_OFF_EXPONENT[saturation]),
    acFactor: given(fields[S.acFactor] as number, PART_DEFAULTS.acFactor),
    coreLoss: texts.coreLoss ?? null,
  };
}

/** Fills every optional field of a part with its stated default (null or absent: not given). */
export function completePart(input: PartInput): Part {
  const fields = new Float64Array(PART_NUMBER_FIELDS.length);
  for (let k = 0; k < PART_NUMBER_FIELDS.length; k++) fields[k] = input[PART_NUMBER_FIELDS[k] as PartNumberField] ?? NaN;
  return partFromFields(input, fields);
}
