import type { Mode, Spec, Worst, WorstCase } from "./types.ts";

/** The waveform figures of a corner that the checks read (a CornerResult or a WaveformSolution). */
export interface CornerWave {
  mode: Mode;
  ipk: number;
  ivalley: number;
  beyondCurve: boolean;
  unreachable: boolean;
}

/**
 * The loss and thermal figures of a corner, as a CornerSolver holds them. The temperature rise and
 * the hot Isat are plain numbers, NaN when missing: read as number | null they would be boxed at
 * every corner of a ranking.
 */
export interface CornerLosses {
  irms: number;
  ripple: number;
  rippleRatio: number;
  totalLoss: number;
  dcrLoss: number;
  coreLoss: number | null;
  /** Temperature rise, K; NaN when not modelled. */
  riseK: number;
  temperature: number;
  /** Isat at the corner's temperature, A; NaN without an Isat. */
  isatHot: number;
}

/**
 * Worst cases and check inputs gathered corner by corner, so that a part can be judged without
 * keeping its corners. Corners that cannot reach the output are counted apart and left out of
 * every worst case.
 */
export class CornerAccumulator {
  // Declared here and set by reset(): a fresh accumulator and a reused one have one shape, and no
  // field starts out undefined (which would make V8 box every number later stored in it).
  declare corners: number;
  declare firstUnreachable: number;
  declare ipk: number;
  declare ipkAt: number;
  declare ivalley: number;
  declare ivalleyAt: number;
  declare irms: number;
  declare irmsAt: number;
  declare ripple: number;
  declare rippleAt: number;
  declare totalLoss: number;
  declare totalLossAt: number;
  declare dcrLoss: number;
  declare dcrLossAt: number;
  declare coreLoss: number;
  declare coreLossAt: number;
  declare tempRise: number;
  declare tempRiseAt: number;
  declare peak: number;
  declare peakAt: number;
  /** Smallest Isat(T)/|i|max − 1 over corners (−1 for a corner past the curve). */
  declare saturationMargin: number;
  declare saturationAt: number;
  declare saturationPeak: number;
  /** Isat(T) at the deciding corner, NaN without an Isat. */
  declare saturationIsat: number;
  declare saturationTemperature: number;
  declare saturationBeyond: boolean;
  /** Ripple ratio over the corners at nominal input and full load. */
  declare windowCorners: number;
  declare windowMin: number;
  declare windowMax: number;
  declare windowFirst: number;
  declare windowOutsideAt: number;
  declare windowOutsideRatio: number;
  /** First corner at minimum load that is not in CCM. */
  declare lightLoadAt: number;
  declare lightLoadMode: Mode;

  constructor(
    private spec: Spec,
    private isat: number | null,
  ) {
    this.reset(isat, spec);
  }

  /** Starts over for another part (ranking a list reuses one accumulator rather than making one per part). */
  reset(isat: number | null, spec: Spec): void {
    this.spec = spec;
    this.isat = isat;
    this.corners = 0;
    this.firstUnreachable = -1;
    this.ipk = -Infinity;
    this.ipkAt = -1;
    this.ivalley = Infinity;
    this.ivalleyAt = -1;
    this.irms = -Infinity;
    this.irmsAt = -1;
    this.ripple = -Infinity;
    this.rippleAt = -1;
    this.totalLoss = -Infinity;
    this.totalLossAt = -1;
    this.dcrLoss = -Infinity;
    this.dcrLossAt = -1;
    this.coreLoss = -Infinity;
    this.coreLossAt = -1;
    this.tempRise = -Infinity;
    this.tempRiseAt = -1;
    this.peak = -Infinity;
    this.peakAt = -1;
    this.saturationMargin = Infinity;
    this.saturationAt = -1;
    this.saturationPeak = 0;
    this.saturationIsat = NaN;
    this.saturationTemperature = 0;
    this.saturationBeyond = false;
    this.windowCorners = 0;
    this.windowMin = Infinity;
    this.windowMax = -Infinity;
    this.windowFirst = -1;
    this.windowOutsideAt = -1;
    this.windowOutsideRatio = 0;
    this.lightLoadAt = -1;
    this.lightLoadMode = "ccm";
  }

  /** One corner's figures; `at` holds its vin and iout (a CornerPoint, or the screener's reused record). */
  add(wave: CornerWave, losses: CornerLosses, at: { vin: number; iout: number }, index: number): void {
    this.corners++;
    const { vin, iout } = at;
    if (wave.unreachable) {
      if (this.firstUnreachable < 0) this.firstUnreachable = index;
      return;
    }
    const peak = wave.ipk > -wave.ivalley ? wave.ipk : -wave.ivalley;
    if (wave.ipk > this.ipk) {
      this.ipk = wave.ipk;
      this.ipkAt = index;
    }
    if (wave.ivalley < this.ivalley) {
      this.ivalley = wave.ivalley;
      this.ivalleyAt = index;
    }
    if (losses.irms > this.irms) {
      this.irms = losses.irms;
      this.irmsAt = index;
    }
    if (losses.ripple > this.ripple) {
      this.ripple = losses.ripple;
      this.rippleAt = index;
    }
    if (losses.totalLoss > this.totalLoss) {
      this.totalLoss = losses.totalLoss;
      this.totalLossAt = index;
    }
    if (losses.dcrLoss > this.dcrLoss) {
      this.dcrLoss = losses.dcrLoss;
      this.dcrLossAt = index;
    }
    if (losses.coreLoss !== null && losses.coreLoss > this.coreLoss) {
      this.coreLoss = losses.coreLoss;
      this.coreLossAt = index;
    }
    // NaN (not modelled) never compares greater.
    if (losses.riseK > this.tempRise) {
      this.tempRise = losses.riseK;
      this.tempRiseAt = index;
    }
    if (peak > this.peak) {
      this.peak = peak;
      this.peakAt = index;
    }
    if (this.isat !== null) {
      const hot = losses.isatHot;
      const isat = hot === hot ? hot : this.isat;
      const margin = wave.beyondCurve ? -1 : isat / peak - 1;
      if (margin < this.saturationMargin) {
        this.saturationMargin = margin;
        this.saturationAt = index;
        this.saturationPeak = peak;
        this.saturationIsat = hot;
        this.saturationTemperature = losses.temperature;
        this.saturationBeyond = wave.beyondCurve;
      }
    }
    const t = this.spec.targets;
    if (vin === this.spec.vin.nom && iout === this.spec.iout.max) {
      const r = losses.rippleRatio;
      if (this.windowCorners === 0) this.windowFirst = index;
      this.windowCorners++;
      if (r < this.windowMin) this.windowMin = r;
      if (r > this.windowMax) this.windowMax = r;
      if (this.windowOutsideAt < 0 && (r < t.rippleRatio.min || r > t.rippleRatio.max)) {
        this.windowOutsideAt = index;
        this.windowOutsideRatio = r;
      }
    }
    if (iout === this.spec.iout.min && this.lightLoadAt < 0 && wave.mode !== "ccm") {
      this.lightLoadAt = index;
      this.lightLoadMode = wave.mode;
    }
  }

  /** Worst value of each figure with the corner that produced it (NaN and −1 when no corner was reachable). */
  worst(): Worst {
    const w = (value: number, at: number): WorstCase => (at < 0 ? { value: NaN, cornerIndex: -1 } : { value, cornerIndex: at });
    return {
      ipk: w(this.ipk, this.ipkAt),
      ivalley: w(this.ivalley, this.ivalleyAt),
      irms: w(this.irms, this.irmsAt),
      ripple: w(this.ripple, this.rippleAt),
      totalLoss: w(this.totalLoss, this.totalLossAt),
      dcrLoss: w(this.dcrLoss, this.dcrLossAt),
      coreLoss: this.coreLossAt < 0 ? null : { value: this.coreLoss, cornerIndex: this.coreLossAt },
      tempRise: this.tempRiseAt < 0 ? null : { value: this.tempRise, cornerIndex: this.tempRiseAt },
      peakMagnitude: w(this.peak, this.peakAt),
    };
  }
}
