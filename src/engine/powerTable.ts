/**
 * u^k for one fixed exponent k, about ten times faster than Math.exp(k·Math.log(u)) and within
 * a few parts in 1e13 of it. The thermal power law ΔT = ΔTrated·(P/Prated)^k needs it at every
 * Newton step of every corner.
 *
 * u = m·2^e with m in [1, 2) read from the bits of the double, so u^k = m^k·2^(e·k): 2^(e·k)
 * comes from a table over every exponent e, m^k from a cubic Hermite over 512 intervals of
 * [1, 2] with the exact derivative k·m^(k−1) (error ≤ h⁴·max|f''''|/384, below 5e-14 for
 * 0 < k ≤ 2). Zero, subnormal, infinite and NaN inputs take the plain formula.
 */
export class PowerTable {
  private readonly values: Float64Array;
  private readonly slopes: Float64Array;
  /** 2^(e·k) at index e + EXPONENT_BIAS. */
  private readonly scale: Float64Array;
  /** 2^−e at index e + EXPONENT_BIAS (exact: multiplying by it only moves the exponent). */
  private readonly unscale: Float64Array;

  constructor(readonly exponent: number) {
    this.values = new Float64Array(INTERVALS + 1);
    this.slopes = new Float64Array(INTERVALS + 1);
    for (let j = 0; j <= INTERVALS; j++) {
      const m = 1 + j / INTERVALS;
      this.values[j] = Math.pow(m, exponent);
      // Derivative per interval width, as the Hermite basis below takes it.
      this.slopes[j] = (exponent * Math.pow(m, exponent - 1)) / INTERVALS;
    }
    this.scale = new Float64Array(EXPONENT_BIAS + 1024);
    this.unscale = new Float64Array(EXPONENT_BIAS + 1024);
    for (let e = -EXPONENT_BIAS; e < 1024; e++) {
      this.scale[e + EXPONENT_BIAS] = Math.pow(2, e * exponent);
      this.unscale[e + EXPONENT_BIAS] = Math.pow(2, -e);
    }
  }

  pow(u: number): number {
    bits[0] = u;
    const high = words[HIGH]!;
    const biased = (high >>> 20) & 0x7ff;
    // Zero, subnormals (biased exponent 0), infinities and NaN (0x7ff), and negatives.
    if (biased === 0 || biased === 0x7ff || high >= 0x80000000) return Math.exp(this.exponent * Math.log(u));
    const e = biased - 1023 + EXPONENT_BIAS;
    // The mantissa m in [1, 2).
    const position = (u * this.unscale[e]! - 1) * INTERVALS;
    const j = position | 0;
    const s = position - j;
    const s2 = s * s;
    const s3 = s2 * s;
    const v = this.values;
    const d = this.slopes;
    const mk = (2 * s3 - 3 * s2 + 1) * v[j]! + (s3 - 2 * s2 + s) * d[j]! + (-2 * s3 + 3 * s2) * v[j + 1]! + (s3 - s2) * d[j + 1]!;
    return mk * this.scale[e]!;
  }
}

const INTERVALS = 512;
/** Normal doubles have e from −1022 to 1023; the table starts at −1022. */
const EXPONENT_BIAS = 1022;

const bits = new Float64Array(1);
const words = new Uint32Array(bits.buffer);
/** Index of the word holding sign, exponent and the top of the mantissa. */
const HIGH = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;

let lastTable: PowerTable | null = null;

/** The table for exponent k (the last one is kept: a ranking uses one exponent throughout). */
export function powerTable(exponent: number): PowerTable {
  if (lastTable === null || lastTable.exponent !== exponent) lastTable = new PowerTable(exponent);
  return lastTable;
}
