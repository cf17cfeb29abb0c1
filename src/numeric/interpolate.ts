/**
 * Interpolation kernels (plain numbers, no allocation).
 *
 * @module
 */
import { segmentIndex } from './search.js';

/**
 * Linear interpolation between (x0, y0) and (x1, y1), written as y0·(1−t) + y1·t so that it
 * returns y0 at x0 and y1 at x1 bit for bit.
 */
export function lerp(x0: number, x1: number, y0: number, y1: number, x: number): number {
  const t = (x - x0) / (x1 - x0);
  return y0 * (1 - t) + y1 * t;
}

/** Piecewise-linear value at `x` through nodes (xs, ys), xs strictly increasing. Exact at the nodes. */
export function piecewiseLinear(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number): number {
  const i = segmentIndex(xs, x);
  return lerp(xs[i]!, xs[i + 1]!, ys[i]!, ys[i + 1]!, x);
}

/**
 * ∫ from a to b of the piecewise-linear function through (xs, ys), exactly (trapezoids on each
 * piece, partial pieces at the ends). `weightOverX` integrates y/x instead (y linear on each piece:
 * ∫(α + βx)/x dx = α·ln(x2/x1) + β·(x2 − x1)), for a, b > 0.
 */
export function piecewiseLinearIntegral(xs: ArrayLike<number>, ys: ArrayLike<number>, a: number, b: number, weightOverX = false): number {
  if (a === b) return 0;
  if (a > b) return -piecewiseLinearIntegral(xs, ys, b, a, weightOverX);
  let total = 0;
  let i = segmentIndex(xs, a);
  let left = a;
  for (;;) {
    const x0 = xs[i]!;
    const x1 = xs[i + 1]!;
    const right = Math.min(b, x1);
    const slope = (ys[i + 1]! - ys[i]!) / (x1 - x0);
    const intercept = ys[i]! - slope * x0;
    total += weightOverX
      ? intercept * Math.log(right / left) + slope * (right - left)
      : (intercept + 0.5 * slope * (left + right)) * (right - left);
    if (right >= b || i + 2 >= xs.length) break;
    left = right;
    i++;
  }
  return total;
}

/**
 * Fritsch–Carlson slopes for monotone piecewise-cubic Hermite interpolation through (xs, ys),
 * written to `out` (same length). The interpolant never overshoots the data: on every interval it
 * stays between the two end values, and it is monotone wherever the data are.
 * (F. N. Fritsch and R. E. Carlson, SIAM J. Numer. Anal. 17, 238, 1980.)
 */
export function monotoneSlopes(xs: ArrayLike<number>, ys: ArrayLike<number>, out: Float64Array): Float64Array {
  const n = xs.length;
  if (n === 2) {
    const d = (ys[1]! - ys[0]!) / (xs[1]! - xs[0]!);
    out[0] = d;
    out[1] = d;
    return out;
  }
  const delta = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) delta[i] = (ys[i + 1]! - ys[i]!) / (xs[i + 1]! - xs[i]!);
  out[0] = delta[0]!;
  out[n - 1] = delta[n - 2]!;
  for (let i = 1; i < n - 1; i++) out[i] = delta[i - 1]! * delta[i]! <= 0 ? 0 : (delta[i - 1]! + delta[i]!) / 2;
  for (let i = 0; i < n - 1; i++) {
    const d = delta[i]!;
    if (d === 0) {
      out[i] = 0;
      out[i + 1] = 0;
      continue;
    }
    // α² + β² ≤ 9 with α = m_i/Δ, β = m_{i+1}/Δ, written without dividing by Δ (which may be tiny)
    const mi = out[i]!;
    const mj = out[i + 1]!;
    const norm = Math.sqrt(mi * mi + mj * mj);
    if (norm > 3 * Math.abs(d)) {
      const t = (3 * Math.abs(d)) / norm;
      out[i] = t * mi;
      out[i + 1] = t * mj;
    }
  }
  return out;
}

/**
 * Cubic Hermite value on [x0, x1] with end values y0, y1 and slopes m0, m1. Returns y0 at x0 and y1
 * at x1 bit for bit.
 */
export function hermite(x0: number, x1: number, y0: number, y1: number, m0: number, m1: number, x: number): number {
  const h = x1 - x0;
  const t = (x - x0) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  const h00 = 2 * t3 - 3 * t2 + 1;
  const h10 = t3 - 2 * t2 + t;
  const h01 = -2 * t3 + 3 * t2;
  const h11 = t3 - t2;
  return y0 * h00 + y1 * h01 + h * (m0 * h10 + m1 * h11);
}
