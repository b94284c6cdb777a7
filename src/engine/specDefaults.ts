import type { Spec, Targets, Weights } from "./types.ts";

/** Stated defaults for every optional spec key (README documents each with its unit). */
export const DEFAULT_TARGETS: Targets = {
  // Ripple ratio 0.2–0.4 is the usual design window (Maniktala, Switching Power Supplies A to Z).
  rippleRatio: { min: 0.2, max: 0.4 },
  // Common practice: 20–50 % headroom over the worst-case peak.
  saturationMargin: 0.2,
  heatingMargin: 0,
  // Common practice: SRF at least ten times the switching frequency.
  srfFactor: 10,
  lightLoadMode: "any",
  maxTempRise: 40,
  maxTemperature: null,
  maxLength: null,
  maxWidth: null,
  maxHeight: null,
  maxFootprint: null,
  maxPrice: null,
};

export const DEFAULT_WEIGHTS: Weights = { loss: 0.4, footprint: 0.2, height: 0.1, price: 0.2, margin: 0.1 };

/**
 * k = 0.833 sits between laminar natural convection (h ∝ ΔT^0.25 gives k = 0.8, textbook, from memory)
 * and McLyman's surface-dissipation rule ΔT = 450·ψ^0.826 (Transformer and Inductor Design Handbook, from memory).
 */
export const DEFAULT_THERMAL_EXPONENT = 0.833;

export const SPEC_DEFAULTS = {
  rectifier: "diode",
  switchResistance: 0,
  switchDrop: 0,
  rectifierDrop: 0,
  rectifierResistance: 0,
  ambient: 25,
  thermalExponent: DEFAULT_THERMAL_EXPONENT,
  assumedTolerance: 0.2,
} as const;

export type SpecInput = Pick<Spec, "topology" | "vout" | "fsw"> & {
  vin: Spec["vin"] | number;
  iout: Spec["iout"] | number;
} & Partial<Omit<Spec, "topology" | "vout" | "fsw" | "vin" | "iout" | "targets" | "weights">> & {
    targets?: Partial<Targets>;
    weights?: Partial<Weights>;
  };

/** Builds a full spec from a partial one without validating it (see parseSpec for untrusted input). */
export function makeSpec(input: SpecInput): Spec {
  const vin = typeof input.vin === "number" ? { min: input.vin, nom: input.vin, max: input.vin } : input.vin;
  const iout = typeof input.iout === "number" ? { min: input.iout, max: input.iout } : input.iout;
  return {
    topology: input.topology,
    rectifier: input.rectifier ?? SPEC_DEFAULTS.rectifier,
    vin: { ...vin },
    vout: input.vout,
    iout: { ...iout },
    fsw: input.fsw,
    switchResistance: input.switchResistance ?? SPEC_DEFAULTS.switchResistance,
    switchDrop: input.switchDrop ?? SPEC_DEFAULTS.switchDrop,
    rectifierDrop: input.rectifierDrop ?? SPEC_DEFAULTS.rectifierDrop,
    rectifierResistance: input.rectifierResistance ?? SPEC_DEFAULTS.rectifierResistance,
    ambient: input.ambient ?? SPEC_DEFAULTS.ambient,
    thermalExponent: input.thermalExponent ?? SPEC_DEFAULTS.thermalExponent,
    assumedTolerance: input.assumedTolerance ?? SPEC_DEFAULTS.assumedTolerance,
    targets: { ...DEFAULT_TARGETS, ...input.targets, rippleRatio: { ...DEFAULT_TARGETS.rippleRatio, ...input.targets?.rippleRatio } },
    weights: { ...DEFAULT_WEIGHTS, ...input.weights },
  };
}
