/**
 * Plain data shapes shared by the whole engine. Every quantity is in SI base units
 * (H, Ω, A, V, Hz, m, s, W) except temperatures, which are in °C (rises in K).
 */

export type Topology = "buck" | "boost" | "buck-boost";

/** diode: current cannot reverse (DCM at light load); synchronous: forced continuous. */
export type Rectifier = "diode" | "synchronous";

export type Mode = "ccm" | "bcm" | "dcm" | "forced-continuous";

/** Hard: ferrite-like sharp knee. Soft: powder / alloy / metal-composite gradual roll-off. */
export type SaturationCharacter = "soft" | "hard";

export interface Range {
  min: number;
  nom: number;
  max: number;
}

export interface LoadRange {
  min: number;
  max: number;
}

export interface Targets {
  /** Ripple ratio r = ΔI/IL window, checked at nominal vin and maximum load. */
  rippleRatio: { min: number; max: number };
  /** m in Isat ≥ (1 + m)·max|i|. */
  saturationMargin: number;
  /** m in Irated ≥ (1 + m)·Irms. */
  heatingMargin: number;
  /** k in SRF ≥ k·fsw. */
  srfFactor: number;
  /** Conduction mode required at minimum load. */
  lightLoadMode: "any" | "ccm";
  /** Temperature rise limit in K. */
  maxTempRise: number;
  /** Hot-spot (ambient + rise) limit in °C, null = not checked. */
  maxTemperature: number | null;
  maxLength: number | null;
  maxWidth: number | null;
  maxHeight: number | null;
  /** Footprint (length × width) limit in m². */
  maxFootprint: number | null;
  maxPrice: number | null;
}

export interface Weights {
  loss: number;
  footprint: number;
  height: number;
  price: number;
  margin: number;
}

export interface Spec {
  topology: Topology;
  rectifier: Rectifier;
  vin: Range;
  /** Output voltage magnitude (an inverting buck-boost's −5 V output is vout = 5). */
  vout: number;
  iout: LoadRange;
  fsw: number;
  /** Switch on-resistance in Ω (drop = R·IL). */
  switchResistance: number;
  /** Fixed switch drop in V (e.g. a BJT's saturation voltage). */
  switchDrop: number;
  /** Rectifier forward voltage in V (diode; 0 for a synchronous rectifier). */
  rectifierDrop: number;
  /** Rectifier on-resistance in Ω (synchronous switch or diode slope resistance). */
  rectifierResistance: number;
  /** Ambient temperature in °C. */
  ambient: number;
  /** Exponent k of ΔT = ΔTrated·(P/Prated)^k. */
  thermalExponent: number;
  /** Tolerance assumed for parts whose list gives none (fraction). */
  assumedTolerance: number;
  targets: Targets;
  weights: Weights;
}

export interface CoreLossData {
  /** Steinmetz Pv = k·f^α·B̂^β; with `volume` Pv is in W/m³, without it k is lumped and P is in W. */
  k: number;
  alpha: number;
  beta: number;
  /** Flux density per ampere at zero bias, T/A (= L0/(N·Ae)). */
  bPerAmp: number;
  /** Effective core volume Ve in m³, null when k is a lumped per-part coefficient. */
  volume: number | null;
}

export interface Part {
  partNumber: string;
  maker: string | null;
  series: string | null;
  material: string | null;
  /** Zero-bias inductance in H. */
  inductance: number;
  /** Tolerance as a fraction (0.2 for ±20 %), null when not given (evaluated at nominal). */
  tolerance: number | null;
  dcrTyp: number | null;
  dcrMax: number | null;
  /** Temperature at which DCR is specified, °C. */
  dcrTemp: number;
  /** Saturation current at 25 °C, A. */
  isat: number | null;
  /** Fraction of inductance lost at Isat (0.3 for "30 % drop"). */
  isatDrop: number;
  /** Saturation current when hot, A, with the temperature it is given at. */
  isatHot: number | null;
  isatHotTemp: number | null;
  /** Rated heating (RMS) current, A, and the temperature rise it is defined at, K. */
  irms: number | null;
  irmsRise: number;
  srf: number | null;
  length: number | null;
  width: number | null;
  height: number | null;
  price: number | null;
  saturation: SaturationCharacter;
  /** n of L(i) = L0/(1 + (|i|/Ik)^n). */
  rollOffExponent: number;
  /** Ratio of AC to DC resistance for the ripple component. */
  acFactor: number;
  coreLoss: CoreLossData | null;
}

/** Which inductance corner: minimum tolerance, nominal or maximum tolerance. */
export type InductanceCorner = "min" | "nom" | "max";

export interface CornerPoint {
  vin: number;
  iout: number;
  /** Label of the vin point. */
  vinCorner: "min" | "nom" | "max" | "peak-ripple";
  ioutCorner: "min" | "max";
  inductanceCorner: InductanceCorner;
  /** Zero-bias inductance at this corner, H. */
  inductance: number;
}

export interface CornerResult extends CornerPoint {
  mode: Mode;
  /** Switch on fraction D. */
  duty: number;
  /** Rectifier conduction fraction D2. */
  d2: number;
  /** Fraction of the period with the inductor current resting at zero (DCM). */
  idle: number;
  /** Fraction of the period with negative inductor current (forced-continuous). */
  negativeFraction: number;
  ipk: number;
  ivalley: number;
  iavg: number;
  irms: number;
  /** Peak-to-peak ripple current, A. */
  ripple: number;
  /** ripple / |iavg|. */
  rippleRatio: number;
  /** Flux-linkage swing in V·s. */
  fluxSwing: number;
  /** Incremental inductance at the peak current, H. */
  inductanceAtPeak: number;
  dcrLoss: number;
  acLoss: number;
  coreLoss: number | null;
  totalLoss: number;
  tempRise: number | null;
  temperature: number;
  /** DCR at the solved temperature, Ω. */
  dcrHot: number | null;
  /** Saturation current at the solved temperature, A. */
  isatAtTemp: number | null;
  /** The solved flux linkage exceeded the modelled curve: the core is driven past saturation. */
  beyondCurve: boolean;
  /** The operating point cannot be reached (e.g. boost output above what the losses allow). */
  unreachable: boolean;
}

export type CheckName =
  | "saturation"
  | "heating"
  | "temperatureRise"
  | "temperature"
  | "rippleRatio"
  | "lightLoadMode"
  | "srf"
  | "length"
  | "width"
  | "height"
  | "footprint"
  | "price"
  | "operatingPoint";

export type CheckStatus = "pass" | "fail" | "unchecked";

export interface Check {
  name: CheckName;
  status: CheckStatus;
  /** Readable reason, naming the corner that decided it. */
  reason: string;
  /** Fractional margin (positive = headroom), null when not applicable. */
  margin: number | null;
  /** Index into the result's corners of the deciding corner, null when none. */
  cornerIndex: number | null;
}

export interface WorstCase {
  value: number;
  cornerIndex: number;
}

export interface Worst {
  ipk: WorstCase;
  ivalley: WorstCase;
  irms: WorstCase;
  ripple: WorstCase;
  totalLoss: WorstCase;
  dcrLoss: WorstCase;
  coreLoss: WorstCase | null;
  tempRise: WorstCase | null;
  /** max(|ipk|, |ivalley|) over corners. */
  peakMagnitude: WorstCase;
}

export type ResultStatus = "pass" | "incomplete" | "fail";

export interface Result {
  partNumber: string;
  rank: number;
  /** True only when every check ran and passed. */
  pass: boolean;
  /** pass; incomplete: nothing failed but some checks could not run for lack of data; fail. */
  status: ResultStatus;
  failures: string[];
  unchecked: string[];
  checks: Check[];
  /** 0–100, higher is better, relative to the best value in the ranked set. */
  score: number;
  /** Not dominated on (worst-case loss, volume) among the ranked parts. */
  pareto: boolean;
  /** Smallest current margin (saturation or heating), fraction, null when neither is known. */
  minMargin: number | null;
  worst: Worst;
  corners: CornerResult[];
}
