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
