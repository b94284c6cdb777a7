import { DEFAULT_TARGETS, DEFAULT_WEIGHTS, SPEC_DEFAULTS } from "../engine/specDefaults.ts";

/** How a field's text is read and shown. Values are stored in SI (fractions for percentages). */
export type FieldKind =
  | { type: "choice"; options: readonly { value: string; label: string }[] }
  /** Engineering notation in a base unit: "500k" Hz, "30m" Ω. */
  | { type: "quantity"; unit: "V" | "A" | "Hz" | "Ω" }
  /** Bare numbers in mm (also mm, cm, m, in, mil); stored in m. */
  | { type: "mm" }
  /** Bare numbers in mm²; stored in m². */
  | { type: "mm2" }
  /** Typed in %, stored as a fraction. */
  | { type: "percent" }
  | { type: "number" }
  | { type: "celsius" }
  | { type: "kelvin" }
  | { type: "price" };

/** What an empty field means: an error, the stated default, or "no limit" (null). */
export type Blank = { type: "required" } | { type: "default"; value: number | string; label?: string } | { type: "none" };

export interface SpecField {
  /** Dotted spec key, as parseSpec names it in its errors. */
  key: string;
  label: string;
  kind: FieldKind;
  blank: Blank;
  hint?: string;
}

export interface FieldGroup {
  id: string;
  title: string;
  fields: SpecField[];
  /** parseSpec keys that concern the group as a whole ("vin": min ≤ nom ≤ max). */
  groupKeys: string[];
  note?: string;
}

const required: Blank = { type: "required" };
const none: Blank = { type: "none" };
const byDefault = (value: number | string, label?: string): Blank => (label === undefined ? { type: "default", value } : { type: "default", value, label });
const volts = { type: "quantity", unit: "V" } as const;
const amps = { type: "quantity", unit: "A" } as const;
const ohms = { type: "quantity", unit: "Ω" } as const;

export const TOPOLOGY_OPTIONS = [
  { value: "buck", label: "Buck (step-down)" },
  { value: "boost", label: "Boost (step-up)" },
  { value: "buck-boost", label: "Inverting buck-boost" },
] as const;

export const RECTIFIER_OPTIONS = [
  { value: "diode", label: "Diode" },
  { value: "synchronous", label: "Synchronous" },
] as const;

export const LIGHT_LOAD_OPTIONS = [
  { value: "any", label: "Any mode" },
  { value: "ccm", label: "Continuous (CCM) required" },
] as const;

/** Every spec key the Design screen edits, grouped as the screen shows them. */
export const FIELD_GROUPS: readonly FieldGroup[] = [
  {
    id: "converter",
    title: "Converter",
    groupKeys: ["(spec)", "topology", "rectifier"],
    fields: [
      { key: "topology", label: "Topology", kind: { type: "choice", options: TOPOLOGY_OPTIONS }, blank: required },
      { key: "rectifier", label: "Rectifier", kind: { type: "choice", options: RECTIFIER_OPTIONS }, blank: byDefault(SPEC_DEFAULTS.rectifier), hint: "diode: DCM at light load; synchronous: the current may reverse" },
      { key: "vout", label: "Output voltage", kind: volts, blank: required, hint: "magnitude: an inverting −5 V output is 5" },
      { key: "fsw", label: "Switching frequency", kind: { type: "quantity", unit: "Hz" }, blank: required, hint: "e.g. 500k" },
    ],
  },
  {
    id: "vin",
    title: "Input voltage",
    groupKeys: ["vin"],
    fields: [
      { key: "vin.min", label: "Minimum", kind: volts, blank: required },
      { key: "vin.nom", label: "Nominal", kind: volts, blank: byDefault("midpoint", "midpoint of min and max") },
      { key: "vin.max", label: "Maximum", kind: volts, blank: required },
    ],
  },
  {
    id: "iout",
    title: "Load current",
    groupKeys: ["iout"],
    fields: [
      { key: "iout.min", label: "Minimum", kind: amps, blank: required, hint: "the light-load corner" },
      { key: "iout.max", label: "Maximum", kind: amps, blank: required },
    ],
  },
  {
    id: "drops",
    title: "Switch and rectifier drops",
    groupKeys: [],
    note: "Taken at the average inductor current; they shift the duty as on the bench.",
    fields: [
      { key: "switchResistance", label: "Switch on-resistance", kind: ohms, blank: byDefault(SPEC_DEFAULTS.switchResistance), hint: "e.g. 30m" },
      { key: "switchDrop", label: "Switch fixed drop", kind: volts, blank: byDefault(SPEC_DEFAULTS.switchDrop) },
      { key: "rectifierDrop", label: "Rectifier forward voltage", kind: volts, blank: byDefault(SPEC_DEFAULTS.rectifierDrop) },
      { key: "rectifierResistance", label: "Rectifier resistance", kind: ohms, blank: byDefault(SPEC_DEFAULTS.rectifierResistance) },
    ],
  },
  {
    id: "thermal",
    title: "Temperature",
    groupKeys: [],
    fields: [
      { key: "ambient", label: "Ambient", kind: { type: "celsius" }, blank: byDefault(SPEC_DEFAULTS.ambient) },
      { key: "targets.maxTempRise", label: "Temperature-rise limit", kind: { type: "kelvin" }, blank: byDefault(DEFAULT_TARGETS.maxTempRise) },
      { key: "targets.maxTemperature", label: "Hot-spot limit", kind: { type: "celsius" }, blank: none, hint: "ambient + rise; blank: not checked" },
      {
        key: "thermalExponent",
        label: "Rise exponent k",
        kind: { type: "number" },
        blank: byDefault(SPEC_DEFAULTS.thermalExponent),
        hint: "ΔT = ΔT rated · (P / P rated)^k",
      },
    ],
  },
  {
    id: "targets",
    title: "Design targets",
    groupKeys: ["targets.rippleRatio", "targets"],
    fields: [
      { key: "targets.rippleRatio.min", label: "Ripple ratio, lowest", kind: { type: "number" }, blank: byDefault(DEFAULT_TARGETS.rippleRatio.min), hint: "ΔI / IL at nominal input, full load" },
      { key: "targets.rippleRatio.max", label: "Ripple ratio, highest", kind: { type: "number" }, blank: byDefault(DEFAULT_TARGETS.rippleRatio.max) },
      { key: "targets.saturationMargin", label: "Saturation margin", kind: { type: "percent" }, blank: byDefault(DEFAULT_TARGETS.saturationMargin), hint: "Isat ≥ (1 + m) · peak" },
      { key: "targets.heatingMargin", label: "Heating-current margin", kind: { type: "percent" }, blank: byDefault(DEFAULT_TARGETS.heatingMargin), hint: "rated ≥ (1 + m) · RMS" },
      { key: "targets.srfFactor", label: "SRF at least", kind: { type: "number" }, blank: byDefault(DEFAULT_TARGETS.srfFactor), hint: "times the switching frequency" },
      { key: "targets.lightLoadMode", label: "Mode at minimum load", kind: { type: "choice", options: LIGHT_LOAD_OPTIONS }, blank: byDefault(DEFAULT_TARGETS.lightLoadMode) },
      { key: "assumedTolerance", label: "Tolerance when the list gives none", kind: { type: "percent" }, blank: byDefault(SPEC_DEFAULTS.assumedTolerance) },
    ],
  },
  {
    id: "limits",
    title: "Size and price limits",
    groupKeys: [],
    note: "Leave blank for no limit.",
    fields: [
      { key: "targets.maxLength", label: "Length", kind: { type: "mm" }, blank: none },
      { key: "targets.maxWidth", label: "Width", kind: { type: "mm" }, blank: none },
      { key: "targets.maxHeight", label: "Height", kind: { type: "mm" }, blank: none },
      { key: "targets.maxFootprint", label: "Footprint", kind: { type: "mm2" }, blank: none, hint: "length × width" },
      { key: "targets.maxPrice", label: "Unit price", kind: { type: "price" }, blank: none, hint: "in the lists' currency" },
    ],
  },
  {
    id: "weights",
    title: "Scoring weights",
    groupKeys: ["weights"],
    note: "Relative: only their ratios matter. Each figure scores against the best passing part.",
    fields: [
      { key: "weights.loss", label: "Worst-case loss", kind: { type: "number" }, blank: byDefault(DEFAULT_WEIGHTS.loss) },
      { key: "weights.footprint", label: "Footprint", kind: { type: "number" }, blank: byDefault(DEFAULT_WEIGHTS.footprint) },
      { key: "weights.height", label: "Height", kind: { type: "number" }, blank: byDefault(DEFAULT_WEIGHTS.height) },
      { key: "weights.price", label: "Price", kind: { type: "number" }, blank: byDefault(DEFAULT_WEIGHTS.price) },
      { key: "weights.margin", label: "Current margin", kind: { type: "number" }, blank: byDefault(DEFAULT_WEIGHTS.margin) },
    ],
  },
];

export const SPEC_FIELDS: readonly SpecField[] = FIELD_GROUPS.flatMap((g) => g.fields);

export function fieldByKey(key: string): SpecField | undefined {
  return SPEC_FIELDS.find((f) => f.key === key);
}
