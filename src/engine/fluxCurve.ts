/**
 * Inductor current as a function of flux linkage λ, for the roll-off law
 * L(i) = L0 / (1 + (|i|/Ik)^n) (differential inductance), and for constant L.
 *
 * With a constant voltage across the inductor λ moves linearly in time, so averages over a
 * segment are ratios of the integrals G(λ) = ∫ i dλ and H(λ) = ∫ i² dλ (see DESIGN.md).
 * The roll-off law is tabulated once per exponent n in normalised units
 * x = i/Ik, y = λ/(L0·Ik): dy/dx = 1/(1 + x^n), g(y) = ∫ x dy, h(y) = ∫ x² dy.
 */

export interface FluxCurve {
  /** Inductor current at flux linkage λ (V·s). */
  current(lambda: number): number;
  /** ∫₀^λ i dλ. */
  currentIntegral(lambda: number): number;
  /** ∫₀^λ i² dλ. */
  squareIntegral(lambda: number): number;
  /** Flux linkage at current i. */
  flux(current: number): number;
  /** Differential inductance dλ/di at current i. */
  inductanceAt(current: number): number;
  /** Largest |λ| the curve models; beyond it the core is driven past saturation. */
  readonly lambdaLimit: number;
  /** Zero-bias inductance L0, H. */
  readonly inductance: number;
  /** True when L does not depend on current (closed forms apply). */
  readonly constant: boolean;
}

/** Constant L. Mutable through set() so a hot loop can reuse one instance. */
export class ConstantInductance implements FluxCurve {
  readonly lambdaLimit = Infinity;
  readonly constant = true;
  inductance = 0;
  private inverseL = 0;
  constructor(inductance: number) {
    this.set(inductance);
  }
  set(inductance: number): this {
    this.inductance = inductance;
    this.inverseL = 1 / inductance;
    return this;
  }
  current(lambda: number): number {
    return lambda * this.inverseL;
  }
  currentIntegral(lambda: number): number {
    return 0.5 * lambda * lambda * this.inverseL;
  }
  squareIntegral(lambda: number): number {
    return (lambda * lambda * lambda * this.inverseL * this.inverseL) / 3;
  }
  flux(current: number): number {
    return current * this.inductance;
  }
  inductanceAt(): number {
    return this.inductance;
  }
}

/** Normalised tables of one roll-off exponent, on a uniform grid in x. */
interface RollOffTable {
  n: number;
  step: number;
  nodes: number;
  x: Float64Array;
  y: Float64Array;
  /** dx/dy = 1 + x^n at each node. */
  slope: Float64Array;
  g: Float64Array;
  h: Float64Array;
  yMax: number;
  xMax: number;
  /** bucket[b] = last node with y ≤ b·yMax/buckets, to start the interval search. */
  bucket: Int32Array;
  bucketScale: number;
}

const TABLE_NODES = 4097;
const BUCKETS = 2048;
/** Tabulate until L has fallen to a millionth of L0 (or x = 30): beyond that no real part is usable. */
const SMALLEST_INDUCTANCE_RATIO = 1e-6;
const LARGEST_X = 30;

// 5-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun, Table 25.4).
const GL_NODES = [0, -0.5384693101056831, 0.5384693101056831, -0.906179845938664, 0.906179845938664];
const GL_WEIGHTS = [0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891, 0.2369268850561891];

function buildTable(n: number): RollOffTable {
  const xMax = Math.min(LARGEST_X, Math.pow(1 / SMALLEST_INDUCTANCE_RATIO - 1, 1 / n));
  const nodes = TABLE_NODES;
  const step = xMax / (nodes - 1);
  const x = new Float64Array(nodes);
  const y = new Float64Array(nodes);
  const slope = new Float64Array(nodes);
  const g = new Float64Array(nodes);
  const h = new Float64Array(nodes);
  slope[0] = 1;
  for (let k = 1; k < nodes; k++) {
    const a = (k - 1) * step;
    const mid = a + step / 2;
    let dy = 0;
    let dg = 0;
    let dh = 0;
    for (let q = 0; q < GL_NODES.length; q++) {
      const s = mid + (step / 2) * GL_NODES[q]!;
      const w = (GL_WEIGHTS[q]! * step) / 2 / (1 + Math.pow(s, n));
      dy += w;
      dg += w * s;
      dh += w * s * s;
    }
    x[k] = k * step;
    y[k] = y[k - 1]! + dy;
    g[k] = g[k - 1]! + dg;
    h[k] = h[k - 1]! + dh;
    slope[k] = 1 + Math.pow(k * step, n);
  }
  const yMax = y[nodes - 1]!;
  const bucket = new Int32Array(BUCKETS + 1);
  let k = 0;
  for (let b = 0; b <= BUCKETS; b++) {
    const yb = (b * yMax) / BUCKETS;
    while (k < nodes - 2 && y[k + 1]! <= yb) k++;
    bucket[b] = k;
  }
  return { n, step, nodes, x, y, slope, g, h, yMax, xMax, bucket, bucketScale: BUCKETS / yMax };
}

const tableCache = new Map<number, RollOffTable>();
const TABLE_CACHE_LIMIT = 64;

export function rollOffTable(n: number): RollOffTable {
  let table = tableCache.get(n);
  if (table === undefined) {
    if (tableCache.size >= TABLE_CACHE_LIMIT) tableCache.clear();
    table = buildTable(n);
    tableCache.set(n, table);
  }
  return table;
}

/**
 * Ik of the roll-off law so that L(Isat) = L0·(1 − drop): 1/(1 + (Isat/Ik)^n) = 1 − drop
 * ⇒ Ik = Isat·((1 − drop)/drop)^(1/n).
 */
export function knee(isat: number, drop: number, n: number): number {
  return isat * Math.pow((1 - drop) / drop, 1 / n);
}

/** Differential inductance ratio L(i)/L0 of the roll-off law. */
export function rollOffRatio(current: number, ik: number, n: number): number {
  const x = Math.abs(current) / ik;
  // exp(n·ln x) rather than Math.pow: the same value, about half the time on V8.
  return x === 0 ? 1 : 1 / (1 + Math.exp(n * Math.log(x)));
}

/** The tabulated roll-off law. Mutable through set() so a hot loop can reuse one instance. */
export class RollOffCurve implements FluxCurve {
  lambdaLimit = 0;
  readonly constant = false;
  inductance = 0;
  ik = 0;
  n = 0;
  private table: RollOffTable;
  private lambdaScale = 0;
  private inverseLambdaScale = 0;
  private gScale = 0;
  private hScale = 0;
  // Interval found by the last lookup, shared by the evaluations at the same λ.
  private lastY = NaN;
  private lastK = 0;
  private lastT = 0;
  private lastHy = 0;

  constructor(inductance: number, ik: number, n: number) {
    this.table = rollOffTable(n);
    this.set(inductance, ik, n);
  }

  set(inductance: number, ik: number, n: number): this {
    if (n !== this.n) this.table = rollOffTable(n);
    this.inductance = inductance;
    this.ik = ik;
    this.n = n;
    this.lambdaScale = inductance * ik;
    this.inverseLambdaScale = 1 / this.lambdaScale;
    this.gScale = inductance * ik * ik;
    this.hScale = inductance * ik * ik * ik;
    this.lambdaLimit = this.table.yMax * this.lambdaScale;
    this.lastY = NaN;
    return this;
  }

  /** Locates |y| in the table; y beyond the table is clamped to its end. */
  private locate(yAbs: number): void {
    if (yAbs === this.lastY) return;
    const t = this.table;
    const yc = yAbs >= t.yMax ? t.yMax : yAbs;
    const b = Math.floor(yc * t.bucketScale);
    let lo = t.bucket[b >= BUCKETS ? BUCKETS : b]!;
    let hi = t.bucket[b + 1 >= BUCKETS ? BUCKETS : b + 1]! + 1;
    if (hi > t.nodes - 1) hi = t.nodes - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (t.y[mid]! <= yc) lo = mid;
      else hi = mid;
    }
    const hy = t.y[lo + 1]! - t.y[lo]!;
    this.lastY = yAbs;
    this.lastK = lo;
    this.lastHy = hy;
    this.lastT = hy > 0 ? (yc - t.y[lo]!) / hy : 0;
  }

  /** Cubic Hermite on the interval found by locate(), values f and derivatives d per unit y. */
  private hermite(f0: number, f1: number, d0: number, d1: number): number {
    const s = this.lastT;
    const hy = this.lastHy;
    const s2 = s * s;
    const s3 = s2 * s;
    return (
      (2 * s3 - 3 * s2 + 1) * f0 + (s3 - 2 * s2 + s) * hy * d0 + (-2 * s3 + 3 * s2) * f1 + (s3 - s2) * hy * d1
    );
  }

  private xAt(yAbs: number): number {
    this.locate(yAbs);
    const t = this.table;
    const k = this.lastK;
    return this.hermite(t.x[k]!, t.x[k + 1]!, t.slope[k]!, t.slope[k + 1]!);
  }

  current(lambda: number): number {
    const y = lambda * this.inverseLambdaScale;
    const x = this.xAt(y < 0 ? -y : y);
    return (y < 0 ? -x : x) * this.ik;
  }

  currentIntegral(lambda: number): number {
    const y = lambda * this.inverseLambdaScale;
    const ya = y < 0 ? -y : y;
    this.locate(ya);
    const t = this.table;
    const k = this.lastK;
    // g' = x; g is even in y.
    return this.hermite(t.g[k]!, t.g[k + 1]!, t.x[k]!, t.x[k + 1]!) * this.gScale;
  }

  squareIntegral(lambda: number): number {
    const y = lambda * this.inverseLambdaScale;
    const ya = y < 0 ? -y : y;
    this.locate(ya);
    const t = this.table;
    const k = this.lastK;
    const x0 = t.x[k]!;
    const x1 = t.x[k + 1]!;
    // h' = x²; h is odd in y.
    const v = this.hermite(t.h[k]!, t.h[k + 1]!, x0 * x0, x1 * x1) * this.hScale;
    return y < 0 ? -v : v;
  }

  flux(current: number): number {
    const x = Math.abs(current) / this.ik;
    const t = this.table;
    if (x >= t.xMax) return Math.sign(current) * this.lambdaLimit;
    const k = Math.min(t.nodes - 2, Math.floor(x / t.step));
    const s = (x - t.x[k]!) / t.step;
    // Hermite in x with dy/dx = 1/slope.
    const s2 = s * s;
    const s3 = s2 * s;
    const y =
      (2 * s3 - 3 * s2 + 1) * t.y[k]! +
      (s3 - 2 * s2 + s) * t.step / t.slope[k]! +
      (-2 * s3 + 3 * s2) * t.y[k + 1]! +
      (s3 - s2) * t.step / t.slope[k + 1]!;
    return Math.sign(current) * y * this.lambdaScale;
  }

  inductanceAt(current: number): number {
    return this.inductance * rollOffRatio(current, this.ik, this.n);
  }
}
