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
  /**
   * Flux linkage at the centre of a ramp of swing Δλ whose mean current is i, to second order:
   * mean ≈ i(λc) + i''(λc)·Δλ²/24 (Taylor expansion about the centre).
   */
  rampCentre(current: number, swing: number): number;
  /** Differential inductance dλ/di at current i. */
  inductanceAt(current: number): number;
  /**
   * Evaluates current, currentIntegral and squareIntegral at λ together (one lookup) into the
   * sample fields, with di/dλ (exact for constant L, linear between table nodes for roll-off):
   * the solver's Newton steps need all of them at once.
   */
  sample(lambda: number): void;
  readonly sampleCurrent: number;
  readonly sampleIntegral: number;
  readonly sampleSquare: number;
  readonly sampleSlope: number;
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
  sampleCurrent = 0;
  sampleIntegral = 0;
  sampleSquare = 0;
  sampleSlope = 0;
  private inverseL = 0;
  constructor(inductance: number) {
    this.set(inductance);
  }
  sample(lambda: number): void {
    const i = lambda * this.inverseL;
    this.sampleCurrent = i;
    this.sampleIntegral = 0.5 * lambda * i;
    this.sampleSquare = (lambda * i * i) / 3;
    this.sampleSlope = this.inverseL;
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
  rampCentre(current: number): number {
    return current * this.inductance;
  }
  inductanceAt(): number {
    return this.inductance;
  }
}

/**
 * Normalised tables of one roll-off exponent, on a uniform grid in x. The evaluations read
 * `packed` copies that hold each node's values side by side ([x, dx/dy, g, h] per node;
 * [y, step·dy/dx, dx/dy] for the grid in x), so that a lookup touches one or two cache lines rather than one per array.
 */
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
  /** [x, slope, g, h] of node k at 4k. */
  packed: Float64Array;
  /** [y, step/slope = step·dy/dx, slope] of node k at 3k, for lookups by current. */
  packedInX: Float64Array;
  inverseStep: number;
  yMax: number;
  xMax: number;
  /** bucket[b] = last node with y ≤ b·yMax/buckets, to start the interval search. */
  bucket: Int32Array;
  bucketScale: number;
  /**
   * The same law on a uniform grid in y over [0, uniformMax], where the slope dx/dy stays below
   * UNIFORM_SLOPE_LIMIT: a lookup there is one index computation instead of a search.
   */
  uniform: { packed: Float64Array; step: number; inverseStep: number; yLimit: number };
}

/** Node values side by side: out[stride·k + j] = columns[j][k]. */
function pack(columns: readonly Float64Array[]): Float64Array {
  const stride = columns.length;
  const nodes = columns[0]!.length;
  const out = new Float64Array(stride * nodes);
  for (let k = 0; k < nodes; k++) for (let j = 0; j < stride; j++) out[stride * k + j] = columns[j]![k]!;
  return out;
}

const TABLE_NODES = 4097;
const UNIFORM_NODES = 4097;
/** Up to where dx/dy = 1 + x^n reaches this, the uniform grid's cubic Hermite stays accurate to ~1e-7. */
const UNIFORM_SLOPE_LIMIT = 64;
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
  const base = { n, step, nodes, x, y, slope, g, h, yMax, xMax, bucket, bucketScale: BUCKETS / yMax };
  return { ...base, packed: pack([x, slope, g, h]), packedInX: pack([y, slope.map((m) => step / m), slope]), inverseStep: 1 / step, uniform: buildUniformGrid(base) };
}

/** ∫ from a to b of s^p/(1 + s^n) ds by 5-point Gauss–Legendre (b − a at most one table step). */
function segmentIntegral(a: number, b: number, n: number, p: number): number {
  const mid = (a + b) / 2;
  const half = (b - a) / 2;
  let sum = 0;
  for (let q = 0; q < GL_NODES.length; q++) {
    const s = mid + half * GL_NODES[q]!;
    sum += (GL_WEIGHTS[q]! * Math.pow(s, p)) / (1 + Math.pow(s, n));
  }
  return sum * half;
}

function buildUniformGrid(t: Omit<RollOffTable, "uniform" | "packed" | "packedInX" | "inverseStep">): RollOffTable["uniform"] {
  const xLimit = Math.min(t.xMax, Math.pow(UNIFORM_SLOPE_LIMIT - 1, 1 / t.n));
  // y at xLimit, from the node below it.
  const kLimit = Math.min(t.nodes - 2, Math.floor(xLimit / t.step));
  const yLimit = t.y[kLimit]! + segmentIntegral(t.x[kLimit]!, xLimit, t.n, 0);
  const step = yLimit / (UNIFORM_NODES - 1);
  const x = new Float64Array(UNIFORM_NODES);
  const slope = new Float64Array(UNIFORM_NODES);
  const g = new Float64Array(UNIFORM_NODES);
  const h = new Float64Array(UNIFORM_NODES);
  let k = 0;
  for (let j = 0; j < UNIFORM_NODES; j++) {
    const yj = j * step;
    while (k < t.nodes - 2 && t.y[k + 1]! <= yj) k++;
    // Newton on y(x) = y_k + ∫ ds/(1 + s^n) from the node below, with dy/dx = 1/(1 + x^n).
    let xj = t.x[k]! + (yj - t.y[k]!) * t.slope[k]!;
    for (let iteration = 0; iteration < 6; iteration++) {
      const residual = t.y[k]! + segmentIntegral(t.x[k]!, xj, t.n, 0) - yj;
      xj -= residual * (1 + Math.pow(xj, t.n));
    }
    x[j] = xj;
    slope[j] = 1 + Math.pow(xj, t.n);
    g[j] = t.g[k]! + segmentIntegral(t.x[k]!, xj, t.n, 1);
    h[j] = t.h[k]! + segmentIntegral(t.x[k]!, xj, t.n, 2);
  }
  return { packed: pack([x, slope, g, h]), step, inverseStep: 1 / step, yLimit };
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
  sampleCurrent = 0;
  sampleIntegral = 0;
  sampleSquare = 0;
  sampleSlope = 0;
  private table: RollOffTable;
  private lambdaScale = 0;
  private inverseLambdaScale = 0;
  private gScale = 0;
  private hScale = 0;
  // Interval found by the last lookup, shared by the evaluations at the same λ: the offset of
  // its lower node in the packed grid the lookup used (uniform or searched).
  private lastY = NaN;
  private lastOffset = 0;
  private lastT = 0;
  private lastHy = 0;
  private lastInverseHy = 0;
  private inverseIk = 0;
  private grid: Float64Array;
  // The normalised flux y(I/Ik) (signed) and rampCentre's n·x^(n−1) of the last current asked
  // about. They depend on I, Ik and n only, not on L0, so they outlive set() while Ik and n stay:
  // a part's three inductance corners at one load ask for the same current, and the mode test
  // and the valley's first guess ask for it again.
  private lastFluxCurrent = NaN;
  private lastFluxY = 0;
  private lastCurvature = 0;

  constructor(inductance: number, ik: number, n: number) {
    this.table = rollOffTable(n);
    this.grid = this.table.packed;
    this.set(inductance, ik, n);
  }

  set(inductance: number, ik: number, n: number): this {
    if (n !== this.n || ik !== this.ik) {
      if (n !== this.n) this.table = rollOffTable(n);
      this.ik = ik;
      this.n = n;
      this.inverseIk = 1 / ik;
      this.lastFluxCurrent = NaN;
    }
    this.inductance = inductance;
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
    const u = this.table.uniform;
    if (yAbs < u.yLimit) {
      const position = yAbs * u.inverseStep;
      const k = Math.floor(position);
      this.lastY = yAbs;
      this.lastOffset = 4 * k;
      this.lastHy = u.step;
      this.lastInverseHy = u.inverseStep;
      this.lastT = position - k;
      this.grid = u.packed;
      return;
    }
    // Kept apart so that the common case above stays small enough for V8 to inline.
    this.locateSearched(yAbs);
  }

  /** Past the uniform grid: a bucketed binary search of the grid in x. */
  private locateSearched(yAbs: number): void {
    const t = this.table;
    this.grid = t.packed;
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
    this.lastOffset = 4 * lo;
    this.lastHy = hy;
    this.lastInverseHy = hy > 0 ? 1 / hy : 0;
    this.lastT = (yc - t.y[lo]!) * this.lastInverseHy;
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

  // In the packed grid node k holds x at 4k, dx/dy at 4k + 1, g at 4k + 2 and h at 4k + 3.

  sample(lambda: number): void {
    const y = lambda * this.inverseLambdaScale;
    const negative = y < 0;
    this.locate(negative ? -y : y);
    const o = this.lastOffset;
    const d = this.grid;
    const s = this.lastT;
    const hy = this.lastHy;
    const s2 = s * s;
    const s3 = s2 * s;
    // The cubic Hermite basis, shared by the three quantities (g' = x, h' = x²).
    const b01 = 3 * s2 - 2 * s3;
    const b00 = 1 - b01;
    const b10 = (s3 - 2 * s2 + s) * hy;
    const b11 = (s3 - s2) * hy;
    const x0 = d[o]!;
    const m0 = d[o + 1]!;
    const x1 = d[o + 4]!;
    const m1 = d[o + 5]!;
    const x = b00 * x0 + b10 * m0 + b01 * x1 + b11 * m1;
    const g = b00 * d[o + 2]! + b10 * x0 + b01 * d[o + 6]! + b11 * x1;
    const h = b00 * d[o + 3]! + b10 * x0 * x0 + b01 * d[o + 7]! + b11 * x1 * x1;
    const ik = this.ik;
    // x and h are odd in y, g and dx/dy even.
    this.sampleCurrent = negative ? -x * ik : x * ik;
    this.sampleIntegral = g * this.gScale;
    this.sampleSquare = negative ? -h * this.hScale : h * this.hScale;
    // dx/dy linear between the nodes: only the tangent steps of a converged Newton use it, where
    // its O(h²) error is multiplied by a step under 1e-5 of the flux.
    this.sampleSlope = (m0 + s * (m1 - m0)) * ik * this.inverseLambdaScale;
  }

  current(lambda: number): number {
    const y = lambda * this.inverseLambdaScale;
    this.locate(y < 0 ? -y : y);
    const o = this.lastOffset;
    const d = this.grid;
    const x = this.hermite(d[o]!, d[o + 4]!, d[o + 1]!, d[o + 5]!);
    return (y < 0 ? -x : x) * this.ik;
  }

  rampCentre(current: number, swing: number): number {
    const centre = this.flux(current);
    // i' = (1 + x^n)/L0 and i'' = n·x^(n−1)·(1 + x^n)/(L0²·Ik), so the centre moves by
    // −(i''/i')·Δλ²/24 = −n·x^(n−1)·Δλ²/(24·L0·Ik); flux() left n·x^(n−1) (0 at x = 0 and beyond the table).
    const curvature = this.lastCurvature;
    if (curvature === 0) return centre;
    let shift = curvature * swing * swing * this.inverseLambdaScale * (1 / 24);
    // Far past the knee the expansion overshoots; Newton finishes from within half a swing.
    if (shift > swing / 2) shift = swing / 2;
    return current < 0 ? centre + shift : centre - shift;
  }

  currentIntegral(lambda: number): number {
    const y = lambda * this.inverseLambdaScale;
    this.locate(y < 0 ? -y : y);
    const o = this.lastOffset;
    const d = this.grid;
    // g' = x; g is even in y.
    return this.hermite(d[o + 2]!, d[o + 6]!, d[o]!, d[o + 4]!) * this.gScale;
  }

  squareIntegral(lambda: number): number {
    const y = lambda * this.inverseLambdaScale;
    this.locate(y < 0 ? -y : y);
    const o = this.lastOffset;
    const d = this.grid;
    const x0 = d[o]!;
    const x1 = d[o + 4]!;
    // h' = x²; h is odd in y.
    const v = this.hermite(d[o + 3]!, d[o + 7]!, x0 * x0, x1 * x1) * this.hScale;
    return y < 0 ? -v : v;
  }

  flux(current: number): number {
    if (current !== this.lastFluxCurrent) this.normalisedFlux(current);
    return this.lastFluxY * this.lambdaScale;
  }

  /** y(|I|/Ik) with the sign of I, and n·x^(n−1) for rampCentre, into the last-current fields. */
  private normalisedFlux(current: number): void {
    const x = Math.abs(current) * this.inverseIk;
    const t = this.table;
    this.lastFluxCurrent = current;
    if (x >= t.xMax) {
      this.lastFluxY = Math.sign(current) * t.yMax;
      this.lastCurvature = 0;
      return;
    }
    const position = x * t.inverseStep;
    const k = Math.min(t.nodes - 2, Math.floor(position));
    const s = position - k;
    const d = t.packedInX;
    // Hermite in x with dy/dx = 1/slope (stored times the step).
    const s2 = s * s;
    const s3 = s2 * s;
    const o = 3 * k;
    const y = (2 * s3 - 3 * s2 + 1) * d[o]! + (s3 - 2 * s2 + s) * d[o + 1]! + (-2 * s3 + 3 * s2) * d[o + 3]! + (s3 - s2) * d[o + 4]!;
    this.lastFluxY = Math.sign(current) * y;
    // x^n from the tabulated slope 1 + x^n, linear between the nodes.
    const xn = (1 - s) * d[o + 2]! + s * d[o + 5]! - 1;
    this.lastCurvature = x === 0 ? 0 : (this.n * xn) / x;
  }

  inductanceAt(current: number): number {
    return this.inductance * rollOffRatio(current, this.ik, this.n);
  }
}
