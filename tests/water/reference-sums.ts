/**
 * A plain loop evaluation of IF97 term sums nᵢ·xᴵⁱ·yᴶⁱ and their derivatives: the test oracle for the
 * generated straight-line kernels (src/water/if97/kernels.generated.ts), from power ladders.
 *
 * @module
 */

/** A compiled set of terms nᵢ·xᴵⁱ·yᴶⁱ with the products needed for derivatives precomputed. */
export interface TermSet {
  readonly count: number;
  readonly I: Int32Array;
  readonly J: Int32Array;
  readonly n: Float64Array;
  /** n·I, n·I·(I−1), n·J, n·J·(J−1), n·I·J */
  readonly nI: Float64Array;
  readonly nII: Float64Array;
  readonly nJ: Float64Array;
  readonly nJJ: Float64Array;
  readonly nIJ: Float64Array;
  /** Lowest exponent stored in the ladders, and the ladders. */
  readonly xMin: number;
  readonly yMin: number;
  readonly xLadder: Float64Array;
  readonly yLadder: Float64Array;
}

/** Compiles integer-exponent terms. */
export function compileTerms(I: readonly number[], J: readonly number[], n: readonly number[]): TermSet {
  const count = n.length;
  const xMin = Math.min(0, ...I);
  const yMin = Math.min(0, ...J);
  const xMax = Math.max(0, ...I);
  const yMax = Math.max(0, ...J);
  const t: TermSet = {
    count,
    I: Int32Array.from(I),
    J: Int32Array.from(J),
    n: Float64Array.from(n),
    nI: Float64Array.from(n, (v, i) => v * I[i]!),
    nII: Float64Array.from(n, (v, i) => v * I[i]! * (I[i]! - 1)),
    nJ: Float64Array.from(n, (v, i) => v * J[i]!),
    nJJ: Float64Array.from(n, (v, i) => v * J[i]! * (J[i]! - 1)),
    nIJ: Float64Array.from(n, (v, i) => v * I[i]! * J[i]!),
    xMin,
    yMin,
    xLadder: new Float64Array(xMax - xMin + 1),
    yLadder: new Float64Array(yMax - yMin + 1),
  };
  return t;
}

/** Fills ladder[k − min] = x^k for k = min … min + length − 1 by repeated multiplication. */
export function fillLadder(ladder: Float64Array, min: number, x: number): void {
  const zero = -min;
  ladder[zero] = 1;
  for (let k = zero + 1; k < ladder.length; k++) ladder[k] = ladder[k - 1]! * x;
  const inv = 1 / x;
  for (let k = zero - 1; k >= 0; k--) ladder[k] = ladder[k + 1]! * inv;
}

/**
 * The sums of a term set at (x, y), written to out[0..5]:
 * S = Σ n xᴵ yᴶ, Sx = ∂S/∂x, Sxx, Sy, Syy, Sxy.
 * Each term's xᴵ·yᴶ is formed once; the derivative sums use n·I, n·I·(I−1), … and are divided by
 * x, x², y, y², x·y at the end (x, y ≠ 0 everywhere IF97 uses them).
 */
export function sumTerms(t: TermSet, x: number, y: number, out: Float64Array): void {
  const xl = t.xLadder;
  const yl = t.yLadder;
  fillLadder(xl, t.xMin, x);
  fillLadder(yl, t.yMin, y);
  let s = 0;
  let sx = 0;
  let sxx = 0;
  let sy = 0;
  let syy = 0;
  let sxy = 0;
  const xo = -t.xMin;
  const yo = -t.yMin;
  const I = t.I;
  const J = t.J;
  for (let i = 0; i < t.count; i++) {
    const v = xl[xo + I[i]!]! * yl[yo + J[i]!]!;
    s += t.n[i]! * v;
    sx += t.nI[i]! * v;
    sxx += t.nII[i]! * v;
    sy += t.nJ[i]! * v;
    syy += t.nJJ[i]! * v;
    sxy += t.nIJ[i]! * v;
  }
  const ix = 1 / x;
  const iy = 1 / y;
  out[0] = s;
  out[1] = sx * ix;
  out[2] = sxx * ix * ix;
  out[3] = sy * iy;
  out[4] = syy * iy * iy;
  out[5] = sxy * ix * iy;
}

/** Σ n xᴵ yᴶ only (for backward equations). */
export function sumValue(t: TermSet, x: number, y: number): number {
  const xl = t.xLadder;
  const yl = t.yLadder;
  fillLadder(xl, t.xMin, x);
  fillLadder(yl, t.yMin, y);
  const xo = -t.xMin;
  const yo = -t.yMin;
  let s = 0;
  for (let i = 0; i < t.count; i++) s += t.n[i]! * xl[xo + t.I[i]!]! * yl[yo + t.J[i]!]!;
  return s;
}
