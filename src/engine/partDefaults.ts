import type { Part, SaturationCharacter } from "./types.ts";

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

/** Fills every optional field of a part with its stated default. */
export function completePart(input: PartInput): Part {
  const material = input.material ?? null;
  const saturation = input.saturation ?? saturationFromMaterial(material) ?? PART_DEFAULTS.saturation;
  const isatHot = input.isatHot ?? null;
  return {
    partNumber: input.partNumber,
    maker: input.maker ?? null,
    series: input.series ?? null,
    material,
    inductance: input.inductance,
    tolerance: input.tolerance ?? null,
    dcrTyp: input.dcrTyp ?? null,
    dcrMax: input.dcrMax ?? null,
    dcrTemp: input.dcrTemp ?? PART_DEFAULTS.dcrTemp,
    isat: input.isat ?? null,
    isatDrop: input.isatDrop ?? PART_DEFAULTS.isatDrop,
    isatHot,
    isatHotTemp: input.isatHotTemp ?? (isatHot === null ? null : PART_DEFAULTS.isatHotTemp),
    irms: input.irms ?? null,
    irmsRise: input.irmsRise ?? PART_DEFAULTS.irmsRise,
    srf: input.srf ?? null,
    length: input.length ?? null,
    width: input.width ?? null,
    height: input.height ?? null,
    price: input.price ?? null,
    saturation,
    rollOffExponent: input.rollOffExponent ?? ROLL_OFF_EXPONENT[saturation],
    acFactor: input.acFactor ?? PART_DEFAULTS.acFactor,
    coreLoss: input.coreLoss ?? null,
  };
}
