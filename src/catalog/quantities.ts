import type { Dimension, Quantity } from "./types.ts";

export interface QuantitySpec {
  dimension: Dimension;
  /** Unit for bare numbers when neither header, unit row nor override gives one. */
  defaultUnit: string | null;
  /**
   * Which end of a range cell ("4.5–5.5") to take: the conservative one for a check that uses it
   * (low for capabilities such as Isat, high for costs such as DCR), the middle for inductance.
   */
  rangePick: "low" | "high" | "mid";
  /** positive: 0 and below are impossible; nonNegative: below 0 is; fraction: in [0, 1). */
  valid: "positive" | "nonNegative" | "fraction" | "none";
  /** Values outside this SI range earn a warning (not a rejection): likely a unit slip. */
  plausible: [number, number] | null;
  label: string;
}

const text = (label: string): QuantitySpec => ({
  dimension: "text",
  defaultUnit: null,
  rangePick: "mid",
  valid: "none",
  plausible: null,
  label,
});

/** Everything the importer knows about each quantity it can map a column to. */
export const QUANTITIES: Readonly<Record<Quantity, QuantitySpec>> = {
  partNumber: text("part number"),
  maker: text("maker"),
  series: text("series"),
  material: text("material"),
  shielding: text("shielding"),
  inductance: { dimension: "inductance", defaultUnit: "uH", rangePick: "mid", valid: "positive", plausible: [1e-9, 0.1], label: "inductance" },
  tolerance: { dimension: "fraction", defaultUnit: "%", rangePick: "high", valid: "fraction", plausible: [0.005, 0.5], label: "tolerance" },
  dcrTyp: { dimension: "resistance", defaultUnit: "mOhm", rangePick: "high", valid: "positive", plausible: [1e-5, 100], label: "DCR typical" },
  dcrMax: { dimension: "resistance", defaultUnit: "mOhm", rangePick: "high", valid: "positive", plausible: [1e-5, 100], label: "DCR maximum" },
  isat: { dimension: "current", defaultUnit: "A", rangePick: "low", valid: "positive", plausible: [1e-3, 500], label: "saturation current" },
  isatDrop: { dimension: "fraction", defaultUnit: "%", rangePick: "low", valid: "fraction", plausible: [0.01, 0.8], label: "inductance drop at Isat" },
  isatHot: { dimension: "current", defaultUnit: "A", rangePick: "low", valid: "positive", plausible: [1e-3, 500], label: "hot saturation current" },
  isatHotTemp: { dimension: "temperature", defaultUnit: "C", rangePick: "low", valid: "none", plausible: [25, 200], label: "hot Isat temperature" },
  irms: { dimension: "current", defaultUnit: "A", rangePick: "low", valid: "positive", plausible: [1e-3, 500], label: "rated (heating) current" },
  irmsRise: { dimension: "temperatureRise", defaultUnit: "K", rangePick: "low", valid: "positive", plausible: [5, 150], label: "temperature rise at rated current" },
  srf: { dimension: "frequency", defaultUnit: "MHz", rangePick: "low", valid: "positive", plausible: [1e4, 1e10], label: "self-resonant frequency" },
  length: { dimension: "length", defaultUnit: "mm", rangePick: "high", valid: "positive", plausible: [1e-4, 0.2], label: "length" },
  width: { dimension: "length", defaultUnit: "mm", rangePick: "high", valid: "positive", plausible: [1e-4, 0.2], label: "width" },
  height: { dimension: "length", defaultUnit: "mm", rangePick: "high", valid: "positive", plausible: [1e-4, 0.2], label: "height" },
  dimensions: { dimension: "length", defaultUnit: "mm", rangePick: "high", valid: "positive", plausible: [1e-4, 0.2], label: "dimensions" },
  price: { dimension: "currency", defaultUnit: null, rangePick: "high", valid: "nonNegative", plausible: [0, 1000], label: "price" },
  rollOffExponent: { dimension: "number", defaultUnit: null, rangePick: "mid", valid: "positive", plausible: [0.5, 30], label: "roll-off exponent" },
  acFactor: { dimension: "number", defaultUnit: null, rangePick: "high", valid: "positive", plausible: [1, 100], label: "AC-resistance factor" },
  coreK: { dimension: "number", defaultUnit: null, rangePick: "high", valid: "positive", plausible: null, label: "Steinmetz k" },
  coreAlpha: { dimension: "number", defaultUnit: null, rangePick: "high", valid: "positive", plausible: [0.5, 3], label: "Steinmetz α" },
  coreBeta: { dimension: "number", defaultUnit: null, rangePick: "high", valid: "positive", plausible: [1, 4], label: "Steinmetz β" },
  bPerAmp: { dimension: "fluxPerCurrent", defaultUnit: "mT/A", rangePick: "high", valid: "positive", plausible: [1e-6, 10], label: "flux density per ampere" },
  coreVolume: { dimension: "volume", defaultUnit: "mm3", rangePick: "high", valid: "positive", plausible: [1e-12, 1e-3], label: "core volume" },
};

export const QUANTITY_KEYS = Object.keys(QUANTITIES) as Quantity[];

export function isQuantity(text: string): text is Quantity {
  return Object.prototype.hasOwnProperty.call(QUANTITIES, text);
}
