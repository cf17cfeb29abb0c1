/**
 * Double-double sums of polynomial terms Σ nₖ xᴵᵏ yᴶᵏ and their derivatives, for the compensated IF97
 * kernels (./compensated.ts): the terms' coefficients come from data/if97 unchanged; the powers of x
 * and y come from a short multiplication plan chosen once per term set (each power from two earlier
 * ones, as few rounds deep as possible, so the products overlap instead of forming one long chain).
 *
 * @module
 */
import { ddDiv, ddProduct, ddSet, SPLIT } from './double-double.js';

/**
 * A plan that builds every exponent in `needed` from x¹ (and x⁻¹ when a negative exponent is needed):
 * triples (target, a, b) meaning x^target = x^a · x^b, in order, each a and b built before.
 */
function powerPlan(needed: readonly number[]): Int32Array {
  const depth = new Map<number, number>([[0, 0], [1, 0], [-1, 0]]);
  const steps: number[] = [];
  const ensure = (e: number): void => {
    if (depth.has(e)) return;
    let best: [number, number] | undefined;
    let bestDepth = Infinity;
    for (const [a, da] of depth) {
      if (a === 0 || Math.sign(a) !== Math.sign(e)) continue;
      const db = depth.get(e - a);
      if (db === undefined || e - a === 0) continue;
      const d = Math.max(da, db);
      if (d < bestDepth) [best, bestDepth] = [[a, e - a], d];
    }
    if (!best) {
      const half = Math.trunc(e / 2);
      ensure(half);
      ensure(e - half);
      best = [half, e - half];
      bestDepth = Math.max(depth.get(half)!, depth.get(e - half)!);
    }
    steps.push(e, best[0], best[1]);
    depth.set(e, bestDepth + 1);
  };
  for (const e of [...new Set(needed)].sort((a, b) => Math.abs(a) - Math.abs(b))) ensure(e);
  return Int32Array.from(steps);
}

/**
 * One set of terms Σ nₖ xᴵᵏ yᴶᵏ prepared for double-double evaluation: the coefficients with their
 * Veltkamp halves, the integer weights of the derivative sums, and power tables with their plans.
 */
export class CompensatedTerms {
  readonly count: number;
  readonly I: Int32Array;
  readonly J: Int32Array;
  readonly n: Float64Array;
  readonly n1: Float64Array;
  readonly n2: Float64Array;
  /** Weights I, I(I−1), J, J(J−1), IJ per term (5 per term). */
  readonly weights: Float64Array;
  readonly iMin: number;
  readonly jMin: number;
  /** x^i (hi, lo) at 2(i − iMin), and y^j at 2(j − jMin), for the exponents the terms use. */
  readonly xPowers: Float64Array;
  readonly yPowers: Float64Array;
  readonly xPlan: Int32Array;
  readonly yPlan: Int32Array;
  /** Whether x⁻¹ (y⁻¹) is needed: some exponent is negative. */
  readonly xInverse: boolean;
  readonly yInverse: boolean;
  /** Scratch of {@link fillPowers}. */
  readonly scratch = new Float64Array(6);

  constructor(I: readonly number[], J: readonly number[], n: readonly number[]) {
    this.count = n.length;
    this.I = Int32Array.from(I);
    this.J = Int32Array.from(J);
    this.n = Float64Array.from(n);
    this.n1 = this.n.map((v) => {
      const t = SPLIT * v;
      return t - (t - v);
    });
    this.n2 = this.n.map((v, k) => v - this.n1[k]!);
    this.weights = new Float64Array(5 * this.count);
    for (let k = 0; k < this.count; k++) {
      const i = I[k]!;
      const j = J[k]!;
      this.weights.set([i, i * (i - 1), j, j * (j - 1), i * j], 5 * k);
    }
    this.xInverse = I.some((i) => i < 0);
    this.yInverse = J.some((j) => j < 0);
    this.xPlan = powerPlan(I);
    this.yPlan = powerPlan(J);
    const range = (xs: readonly number[], plan: Int32Array) => [Math.min(-1, ...xs, ...plan), Math.max(1, ...xs, ...plan)] as const;
    const [iMin, iMax] = range(I, this.xPlan);
    const [jMin, jMax] = range(J, this.yPlan);
    this.iMin = iMin;
    this.jMin = jMin;
    this.xPowers = new Float64Array(2 * (iMax - iMin + 1));
    this.yPowers = new Float64Array(2 * (jMax - jMin + 1));
  }
}

/** Fills table[2(e − min)] with base^e for x⁰, x¹, x⁻¹ and every exponent of the plan (double-double). */
function fillPowers(table: Float64Array, plan: Int32Array, min: number, inverse: boolean, bh: number, bl: number, scratch: Float64Array): void {
  table[-2 * min] = 1;
  table[-2 * min + 1] = 0;
  table[2 - 2 * min] = bh;
  table[3 - 2 * min] = bl;
  if (inverse) {
    ddSet(scratch, 0, 1, 0);
    ddSet(scratch, 1, bh, bl);
    ddDiv(scratch, 2, 0, 1);
    table[-2 - 2 * min] = scratch[4]!;
    table[-1 - 2 * min] = scratch[5]!;
  }
  for (let k = 0; k < plan.length; k += 3) {
    const a = 2 * (plan[k + 1]! - min);
    const b = 2 * (plan[k + 2]! - min);
    ddProduct(table, 2 * (plan[k]! - min), table[a]!, table[a + 1]!, table[b]!, table[b + 1]!);
  }
}

/**
 * The six weighted sums of Σ n xᴵ yᴶ at x = slot xs, y = slot ys of `w`, written to slots d … d + 5:
 * [Σt, ΣI·t, ΣI(I−1)·t, ΣJ·t, ΣJ(J−1)·t, ΣIJ·t] with t = n xᴵ yᴶ, that is
 * [S, x·S_x, x²·S_xx, y·S_y, y²·S_yy, xy·S_xy]. Each term is formed in double-double; each sum keeps its
 * high part by TwoSum and carries every rounding error and low part in a second double (Sum2).
 */
export function weightedSums(t: CompensatedTerms, w: Float64Array, xs: number, ys: number, d: number): void {
  fillPowers(t.xPowers, t.xPlan, t.iMin, t.xInverse, w[2 * xs]!, w[2 * xs + 1]!, t.scratch);
  fillPowers(t.yPowers, t.yPlan, t.jMin, t.yInverse, w[2 * ys]!, w[2 * ys + 1]!, t.scratch);
  const X = t.xPowers;
  const Y = t.yPowers;
  const I = t.I;
  const J = t.J;
  const N = t.n;
  const N1 = t.n1;
  const N2 = t.n2;
  const M = t.weights;
  const iMin = t.iMin;
  const jMin = t.jMin;
  let s0 = 0, c0 = 0, s1 = 0, c1 = 0, s2 = 0, c2 = 0, s3 = 0, c3 = 0, s4 = 0, c4 = 0, s5 = 0, c5 = 0;
  for (let k = 0; k < t.count; k++) {
    const xi = 2 * (I[k]! - iMin);
    const yj = 2 * (J[k]! - jMin);
    const xh = X[xi]!;
    const xl = X[xi + 1]!;
    const yh = Y[yj]!;
    const yl = Y[yj + 1]!;
    // P = xᴵ yᴶ
    let c = SPLIT * xh;
    const x1 = c - (c - xh);
    const x2 = xh - x1;
    c = SPLIT * yh;
    const y1 = c - (c - yh);
    const y2 = yh - y1;
    let ph = xh * yh;
    let pl = x1 * y1 - ph + x1 * y2 + x2 * y1 + x2 * y2 + (xh * yl + xl * yh);
    let q = ph + pl;
    pl -= q - ph;
    ph = q;
    // t = n P
    const nh = N[k]!;
    const n1 = N1[k]!;
    const n2 = N2[k]!;
    c = SPLIT * ph;
    const p1 = c - (c - ph);
    const p2 = ph - p1;
    let th = nh * ph;
    let tl = n1 * p1 - th + n1 * p2 + n2 * p1 + n2 * p2 + nh * pl;
    q = th + tl;
    tl -= q - th;
    th = q;
    c = SPLIT * th;
    const t1 = c - (c - th);
    const t2 = th - t1;
    // s0 += t
    q = s0 + th;
    let v = q - s0;
    c0 += s0 - (q - v) + (th - v) + tl;
    s0 = q;
    // s_i += m t for the integer weights m (|m| < 2²⁶: m t.hi = t1 m + t2 m exactly)
    const o = 5 * k;
    let m = M[o]!;
    let mh = th * m;
    let ml = t1 * m - mh + t2 * m + tl * m;
    q = s1 + mh;
    v = q - s1;
    c1 += s1 - (q - v) + (mh - v) + ml;
    s1 = q;
    m = M[o + 1]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s2 + mh;
    v = q - s2;
    c2 += s2 - (q - v) + (mh - v) + ml;
    s2 = q;
    m = M[o + 2]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s3 + mh;
    v = q - s3;
    c3 += s3 - (q - v) + (mh - v) + ml;
    s3 = q;
    m = M[o + 3]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s4 + mh;
    v = q - s4;
    c4 += s4 - (q - v) + (mh - v) + ml;
    s4 = q;
    m = M[o + 4]!;
    mh = th * m;
    ml = t1 * m - mh + t2 * m + tl * m;
    q = s5 + mh;
    v = q - s5;
    c5 += s5 - (q - v) + (mh - v) + ml;
    s5 = q;
  }
  // normalise each (s, c) pair (Fast2Sum after a TwoSum-safe ordering)
  store(w, d, s0, c0);
  store(w, d + 1, s1, c1);
  store(w, d + 2, s2, c2);
  store(w, d + 3, s3, c3);
  store(w, d + 4, s4, c4);
  store(w, d + 5, s5, c5);
}

/** Slot d = s + c, normalised (TwoSum). */
function store(w: Float64Array, d: number, s: number, c: number): void {
  const h = s + c;
  const v = h - s;
  w[2 * d] = h;
  w[2 * d + 1] = s - (h - v) + (c - v);
}

