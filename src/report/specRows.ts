import type { Spec } from "../engine/types.ts";
import { DEFAULT_TARGETS, DEFAULT_WEIGHTS, SPEC_DEFAULTS } from "../engine/specDefaults.ts";
import { fmt } from "./fmt.ts";
import type { SpecRow } from "./types.ts";

type Value = number | string | null;

interface Row {
  key: string;
  label: string;
  get: (spec: Spec) => Value;
  /** undefined: a required key without default. */
  fallback?: Value;
  show: (value: Value) => string;
}

// Six significant figures: the table must let a reviewer re-enter the spec exactly as used.
const unit = (u: string) => (v: Value) => (typeof v === "number" ? fmt.q(v, u, 6) : "—");
const text = (v: Value) => (v === null ? "—" : String(v));
const plain = (v: Value) => (typeof v === "number" ? fmt.n(v, 6) : "—");
const percent = (v: Value) => (typeof v === "number" ? fmt.pct(v, 6) : "—");
const limit = (u: string, scale: number, suffix: string) => (v: Value) =>
  typeof v === "number" ? `${fmt.n(v * scale, 6)}${suffix === "" ? "" : ` ${suffix}`}` : u;

const ROWS: Row[] = [
  { key: "topology", label: "Topology", get: (s) => s.topology, show: text },
  { key: "rectifier", label: "Rectifier", get: (s) => s.rectifier, fallback: SPEC_DEFAULTS.rectifier, show: text },
  { key: "vin.min", label: "Input voltage, minimum", get: (s) => s.vin.min, show: unit("V") },
  { key: "vin.nom", label: "Input voltage, nominal", get: (s) => s.vin.nom, show: unit("V") },
  { key: "vin.max", label: "Input voltage, maximum", get: (s) => s.vin.max, show: unit("V") },
  { key: "vout", label: "Output voltage (magnitude)", get: (s) => s.vout, show: unit("V") },
  { key: "iout.min", label: "Load current, minimum", get: (s) => s.iout.min, show: unit("A") },
  { key: "iout.max", label: "Load current, maximum", get: (s) => s.iout.max, show: unit("A") },
  { key: "fsw", label: "Switching frequency", get: (s) => s.fsw, show: unit("Hz") },
  { key: "switchResistance", label: "Switch on-resistance", get: (s) => s.switchResistance, fallback: SPEC_DEFAULTS.switchResistance, show: unit("Ω") },
  { key: "switchDrop", label: "Switch fixed drop", get: (s) => s.switchDrop, fallback: SPEC_DEFAULTS.switchDrop, show: unit("V") },
  { key: "rectifierDrop", label: "Rectifier forward voltage", get: (s) => s.rectifierDrop, fallback: SPEC_DEFAULTS.rectifierDrop, show: unit("V") },
  { key: "rectifierResistance", label: "Rectifier resistance", get: (s) => s.rectifierResistance, fallback: SPEC_DEFAULTS.rectifierResistance, show: unit("Ω") },
  { key: "ambient", label: "Ambient temperature", get: (s) => s.ambient, fallback: SPEC_DEFAULTS.ambient, show: (v) => (typeof v === "number" ? `${fmt.n(v, 6)} °C` : "—") },
  { key: "thermalExponent", label: "Temperature-rise exponent k", get: (s) => s.thermalExponent, fallback: SPEC_DEFAULTS.thermalExponent, show: plain },
  { key: "assumedTolerance", label: "Tolerance assumed when a list gives none", get: (s) => s.assumedTolerance, fallback: SPEC_DEFAULTS.assumedTolerance, show: percent },
  { key: "targets.rippleRatio.min", label: "Ripple ratio r, minimum", get: (s) => s.targets.rippleRatio.min, fallback: DEFAULT_TARGETS.rippleRatio.min, show: plain },
  { key: "targets.rippleRatio.max", label: "Ripple ratio r, maximum", get: (s) => s.targets.rippleRatio.max, fallback: DEFAULT_TARGETS.rippleRatio.max, show: plain },
  { key: "targets.saturationMargin", label: "Saturation margin m (Isat ≥ (1 + m)·max|i|)", get: (s) => s.targets.saturationMargin, fallback: DEFAULT_TARGETS.saturationMargin, show: percent },
  { key: "targets.heatingMargin", label: "Heating margin m (Irated ≥ (1 + m)·Irms)", get: (s) => s.targets.heatingMargin, fallback: DEFAULT_TARGETS.heatingMargin, show: percent },
  { key: "targets.srfFactor", label: "SRF factor k (SRF ≥ k·fsw)", get: (s) => s.targets.srfFactor, fallback: DEFAULT_TARGETS.srfFactor, show: plain },
  { key: "targets.lightLoadMode", label: "Conduction mode required at minimum load", get: (s) => s.targets.lightLoadMode, fallback: DEFAULT_TARGETS.lightLoadMode, show: text },
  { key: "targets.maxTempRise", label: "Temperature-rise limit", get: (s) => s.targets.maxTempRise, fallback: DEFAULT_TARGETS.maxTempRise, show: (v) => (typeof v === "number" ? `${fmt.n(v, 6)} K` : "—") },
  { key: "targets.maxTemperature", label: "Hot-spot temperature limit", get: (s) => s.targets.maxTemperature, fallback: DEFAULT_TARGETS.maxTemperature, show: limit("not checked", 1, "°C") },
  { key: "targets.maxLength", label: "Length limit", get: (s) => s.targets.maxLength, fallback: DEFAULT_TARGETS.maxLength, show: limit("none", 1e3, "mm") },
  { key: "targets.maxWidth", label: "Width limit", get: (s) => s.targets.maxWidth, fallback: DEFAULT_TARGETS.maxWidth, show: limit("none", 1e3, "mm") },
  { key: "targets.maxHeight", label: "Height limit", get: (s) => s.targets.maxHeight, fallback: DEFAULT_TARGETS.maxHeight, show: limit("none", 1e3, "mm") },
  { key: "targets.maxFootprint", label: "Footprint limit", get: (s) => s.targets.maxFootprint, fallback: DEFAULT_TARGETS.maxFootprint, show: limit("none", 1e6, "mm²") },
  { key: "targets.maxPrice", label: "Price limit (list currency)", get: (s) => s.targets.maxPrice, fallback: DEFAULT_TARGETS.maxPrice, show: limit("none", 1, "") },
  { key: "weights.loss", label: "Score weight: loss", get: (s) => s.weights.loss, fallback: DEFAULT_WEIGHTS.loss, show: plain },
  { key: "weights.footprint", label: "Score weight: footprint", get: (s) => s.weights.footprint, fallback: DEFAULT_WEIGHTS.footprint, show: plain },
  { key: "weights.height", label: "Score weight: height", get: (s) => s.weights.height, fallback: DEFAULT_WEIGHTS.height, show: plain },
  { key: "weights.price", label: "Score weight: price", get: (s) => s.weights.price, fallback: DEFAULT_WEIGHTS.price, show: plain },
  { key: "weights.margin", label: "Score weight: current margin", get: (s) => s.weights.margin, fallback: DEFAULT_WEIGHTS.margin, show: plain },
];

/** Every spec key with its value and Coilsift's default, so a reviewer sees what was chosen and what was left as is. */
export function specRows(spec: Spec): SpecRow[] {
  return ROWS.map((row) => {
    const value = row.get(spec);
    const hasDefault = row.fallback !== undefined;
    return {
      key: row.key,
      label: row.label,
      value: row.show(value),
      defaultValue: hasDefault ? row.show(row.fallback ?? null) : null,
      isDefault: hasDefault && value === row.fallback,
    };
  });
}
